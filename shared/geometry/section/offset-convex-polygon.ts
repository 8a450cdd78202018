import type { Vec2 } from '../units';

/**
 * Moves every edge of a convex, counter-clockwise polygon outward along its normal (a mitred offset) and
 * returns the new corners in the same order. Each edge keeps its direction, so a solid lofted between a
 * polygon and its offset has planar side faces, and the perpendicular gap between the two is exactly
 * the offset on every edge: a pocket grown by `clearance` leaves that clearance on every flat.
 *
 * @param points - convex polygon, counter-clockwise, in mm; edge i runs from point i to point i + 1
 * @param distances - offset in mm, one number for all edges or one per edge (positive grows, negative
 *   shrinks); edge i's offset is `distances[i]`
 * @returns the offset polygon, counter-clockwise, with the same number of corners
 * @example
 * offsetConvexPolygon([[0, 0], [10, 0], [10, 10], [0, 10]], 0.2); // [[-0.2, -0.2], [10.2, -0.2], …]
 */
export function offsetConvexPolygon(points: readonly Vec2[], distances: number | readonly number[]): Vec2[] {
  const n = points.length;
  const lines = points.map((p, i) => {
    const q = points[(i + 1) % n] as Vec2;
    const len = Math.hypot(q[0] - p[0], q[1] - p[1]);
    // Outward normal of a counter-clockwise edge is the edge direction turned clockwise.
    const nx = (q[1] - p[1]) / len;
    const ny = -(q[0] - p[0]) / len;
    const d = typeof distances === 'number' ? distances : (distances[i] ?? 0);
    return { nx, ny, c: nx * p[0] + ny * p[1] + d };
  });
  return points.map((_, i) => {
    const a = lines[(i + n - 1) % n]!;
    const b = lines[i]!;
    // Corner i is where the offset lines of its two edges meet (Cramer's rule).
    const det = a.nx * b.ny - a.ny * b.nx;
    return [(a.c * b.ny - a.ny * b.c) / det, (a.nx * b.c - a.c * b.nx) / det] as const;
  });
}
