import type { PolygonRing } from './polygon-ring';
import { pointSegmentDistance2 } from './point-segment-distance2';

/**
 * Signed distance from (x, y) to a polygon outline, in mm: positive inside, negative outside,
 * zero on the edge. Inside is decided by the crossing number, so either winding works and
 * non-convex outlines are fine.
 *
 * @param ring - the prepared polygon (see `polygonRing`)
 * @returns the signed distance in mm
 * @example
 * ringSignedDistance(polygonRing([[-5, -5], [5, -5], [5, 5], [-5, 5]]), 0, 0); // 5
 */
export function ringSignedDistance(ring: PolygonRing, x: number, y: number): number {
  const { xs, ys, n } = ring;
  let inside = false;
  let best2 = Infinity;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const xi = xs[i]!;
    const yi = ys[i]!;
    const xj = xs[j]!;
    const yj = ys[j]!;
    if (yi > y !== yj > y && x < xj + ((y - yj) * (xi - xj)) / (yi - yj)) inside = !inside;
    // Cheap reject: the edge's bounding box is already farther than the best edge so far.
    const sx = Math.max(0, Math.min(xi, xj) - x, x - Math.max(xi, xj));
    const sy = Math.max(0, Math.min(yi, yj) - y, y - Math.max(yi, yj));
    if (sx * sx + sy * sy >= best2) continue;
    const d2 = pointSegmentDistance2(x, y, xj, yj, xi, yi);
    if (d2 < best2) best2 = d2;
  }
  const d = Math.sqrt(best2);
  return inside ? d : -d;
}
