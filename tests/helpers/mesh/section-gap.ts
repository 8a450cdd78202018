import jscad from '@jscad/modeling';
import type { TriangleMesh } from '../../../shared/geometry/mesh';
import type { Geom3 } from '../../../shared/geometry/solid/jscad-types';
import { sliceMesh } from './slice-mesh';

/** A point of a section, [u, v] in mm. */
export type Point = [number, number];

/**
 * A solid's faces as float64 triangles (a fan over each convex polygon) before the STL writers snap any
 * corner to JSCAD's grid: the exact geometry a kit file is written from. The float32, snapped file moves
 * corners by up to half a grid step (see {@link snapStep}), too much for a check to 1e-6 mm.
 */
export function solidTriangles(solid: Geom3): { positions: Float64Array } {
  const out: number[] = [];
  for (const polygon of jscad.geometries.geom3.toPolygons(solid)) {
    const v = polygon.vertices;
    for (let i = 1; i + 1 < v.length; i++) out.push(...v[0]!, ...v[i]!, ...v[i + 1]!);
  }
  return { positions: Float64Array.from(out) };
}

/**
 * JSCAD's snapping grid for a written mesh, 1e-5 × its mean bounding-box side (measureEpsilon, as in
 * `snapPolygons`): every corner of the file is within half a step of the solid's, per axis.
 */
export function snapStep(mesh: TriangleMesh): number {
  const p = mesh.positions;
  let total = 0;
  for (let a = 0; a < 3; a++) {
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = a; i < p.length; i += 3) {
      lo = Math.min(lo, p[i]!);
      hi = Math.max(hi, p[i]!);
    }
    total += hi - lo;
  }
  return (1e-5 * total) / 3;
}

const cross = (o: Point, a: Point, b: Point) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);

/**
 * The corners of a convex section from a slice's crossing points, counter-clockwise. Every crossing lies on
 * the section's boundary, so sorting them by angle about their mean (a point inside) puts them in boundary
 * order; then any point less than `flatness` mm from the line through its neighbours is dropped, again
 * until none is, which leaves one point per real corner (the crossings on a flat's diagonals and repeated
 * points go). Sorting by angle, not by x as a monotone chain does, keeps a near-vertical flat's points in
 * order along it when rounding makes their x differ in the last bits.
 */
export function convexHull(points: ReadonlyArray<readonly [number, number]>, flatness = 1e-9): Point[] {
  const cx = points.reduce((sum, p) => sum + p[0], 0) / points.length;
  const cy = points.reduce((sum, p) => sum + p[1], 0) / points.length;
  let ring = points
    .map(([u, v]) => [u, v] as Point)
    .sort((a, b) => Math.atan2(a[1] - cy, a[0] - cx) - Math.atan2(b[1] - cy, b[0] - cx));
  for (let dropped = true; dropped && ring.length > 3;) {
    dropped = false;
    const kept: Point[] = [];
    ring.forEach((b, i) => {
      const a = kept[kept.length - 1] ?? ring[ring.length - 1]!;
      const c = ring[(i + 1) % ring.length]!;
      // Height of b over the line a–c is cross / |c − a|; at most `flatness` (or on the wrong side): drop b.
      if (cross(a, b, c) <= flatness * Math.hypot(c[0] - a[0], c[1] - a[1])) dropped = true;
      else kept.push(b);
    });
    ring = kept;
  }
  return ring;
}

/** Distance in mm from p to the segment a–b. */
export function pointSegmentDistance(p: Point, a: Point, b: Point): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const t = Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / (dx * dx + dy * dy)));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}

/** Distance in mm from p to the nearest point of a closed polygon's boundary (its edges as segments). */
export function distanceToBoundary(polygon: readonly Point[], p: Point): number {
  let best = Infinity;
  polygon.forEach((a, i) => (best = Math.min(best, pointSegmentDistance(p, a, polygon[(i + 1) % polygon.length]!))));
  return best;
}

/** True when p lies inside a convex, counter-clockwise polygon or on its boundary. */
export function insideConvex(polygon: readonly Point[], p: Point): boolean {
  return polygon.every((a, i) => cross(a, polygon[(i + 1) % polygon.length]!, p) >= 0);
}

/**
 * The smallest gap in mm between the boundary of `inner` (a key's section) and the boundary of `outer` (its
 * pocket's), both convex and counter-clockwise: the least distance from any corner of one to any edge of
 * the other. Between two boundaries that do not cross, the nearest pair of points always has a corner of
 * one of them on an edge of the other (elementary geometry: the distance between two segments is reached at
 * an endpoint of one), so corners against edges both ways is the true smallest gap. Negative (minus the
 * distance) when a corner of `inner` lies outside `outer`: the key would not fit.
 */
export function boundaryGap(inner: readonly Point[], outer: readonly Point[]): number {
  let gap = Infinity;
  for (const p of inner) {
    const d = distanceToBoundary(outer, p);
    gap = Math.min(gap, insideConvex(outer, p) ? d : -d);
  }
  for (const p of outer) gap = Math.min(gap, distanceToBoundary(inner, p));
  return gap;
}

/** Distance in mm from the origin to the line through each edge of a polygon, edge i from corner i. */
export function edgeDistances(polygon: readonly Point[]): number[] {
  return polygon.map((a, i) => {
    const b = polygon[(i + 1) % polygon.length]!;
    return Math.abs(a[0] * b[1] - a[1] * b[0]) / Math.hypot(b[0] - a[0], b[1] - a[1]);
  });
}

/**
 * A key file's cross-section at bed x = `at`, in the face frame of its pocket: keyOnBed maps the joint frame
 * (x, y, z) to the bed's (z, −y, x − min x), so with the key's axis at bed z = `axisZ` a slice point
 * (bed y, bed z) is the face point (bed z − axisZ, −bed y). Returns the slice's hull, counter-clockwise.
 */
export function keyInFace(
  mesh: TriangleMesh | { readonly positions: Float64Array },
  at: number,
  axisZ: number,
  flatness?: number,
): Point[] {
  return convexHull(
    sliceMesh(mesh, 0, at).map(([y, z]) => [z - axisZ, -y] as Point),
    flatness,
  );
}
