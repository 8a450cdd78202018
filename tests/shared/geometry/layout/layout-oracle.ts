// Independent checks for key layouts, written differently from shared/geometry/layout on purpose:
// winding numbers instead of crossing parity, segment-pair distances instead of clipping.
import type { Face } from '../../../../shared/schemas/face';
import type { Footprint } from '../../../../shared/geometry/layout';

type P = readonly [number, number];

/** Distance from p to segment a–b by projection, mm. */
export function segDist(p: P, a: P, b: P): number {
  const ex = b[0] - a[0];
  const ey = b[1] - a[1];
  const len2 = ex * ex + ey * ey;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * ex + (p[1] - a[1]) * ey) / len2));
  return Math.hypot(a[0] + t * ex - p[0], a[1] + t * ey - p[1]);
}

function cross(o: P, a: P, b: P): number {
  return (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
}

/** Do segments a–b and c–d share a point? */
export function segsMeet(a: P, b: P, c: P, d: P): boolean {
  const d1 = cross(c, d, a);
  const d2 = cross(c, d, b);
  const d3 = cross(a, b, c);
  const d4 = cross(a, b, d);
  if (d1 * d2 < 0 && d3 * d4 < 0) return true;
  const eps = 1e-12;
  return segDist(a, c, d) < eps || segDist(b, c, d) < eps || segDist(c, a, b) < eps || segDist(d, a, b) < eps;
}

/** Distance between two segments, mm (0 when they meet). */
export function segSegDist(a: P, b: P, c: P, d: P): number {
  if (segsMeet(a, b, c, d)) return 0;
  return Math.min(segDist(a, c, d), segDist(b, c, d), segDist(c, a, b), segDist(d, a, b));
}

/** Winding number of the polygon around p (non-zero: inside). */
export function winding(points: ReadonlyArray<P>, p: P): number {
  let w = 0;
  for (let i = 0; i < points.length; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % points.length]!;
    if (a[1] <= p[1]) {
      if (b[1] > p[1] && cross(a, b, p) > 0) w++;
    } else if (b[1] <= p[1] && cross(a, b, p) < 0) {
      w--;
    }
  }
  return w;
}

function rectCorners(c: P, w: number, h: number): P[] {
  return [
    [c[0] - w / 2, c[1] - h / 2],
    [c[0] + w / 2, c[1] - h / 2],
    [c[0] + w / 2, c[1] + h / 2],
    [c[0] - w / 2, c[1] + h / 2],
  ];
}

function polygonEdges(points: ReadonlyArray<P>): Array<[P, P]> {
  return points.map((p, i): [P, P] => [p, points[(i + 1) % points.length]!]);
}

/**
 * The wall between a pocket centred at c and the face edge, mm; -Infinity when the pocket is not
 * wholly inside the face.
 */
export function oracleWall(face: Face, fp: Footprint, c: P): number {
  const w = fp.kind === 'rect' ? fp.width : fp.diameter;
  const h = fp.kind === 'rect' ? fp.height : fp.diameter;
  if (face.shape === 'rect') {
    const sides = [
      face.width / 2 + (c[0] - w / 2),
      face.width / 2 - (c[0] + w / 2),
      face.height / 2 + (c[1] - h / 2),
      face.height / 2 - (c[1] + h / 2),
    ];
    if (fp.kind === 'rect') return Math.min(...sides);
    const [l, r, b, t] = [face.width / 2 + c[0], face.width / 2 - c[0], face.height / 2 + c[1], face.height / 2 - c[1]];
    return Math.min(l, r, b, t) - w / 2;
  }
  if (face.shape === 'circle') {
    if (fp.kind === 'circle') return face.diameter / 2 - Math.hypot(c[0], c[1]) - w / 2;
    return face.diameter / 2 - Math.max(...rectCorners(c, w, h).map((q) => Math.hypot(q[0], q[1])));
  }
  const pts = face.points as P[];
  const edges = polygonEdges(pts);
  if (fp.kind === 'circle') {
    if (winding(pts, c) === 0) return -Infinity;
    return Math.min(...edges.map(([a, b]) => segDist(c, a, b))) - w / 2;
  }
  const corners = rectCorners(c, w, h);
  if (corners.some((q) => winding(pts, q) === 0)) return -Infinity;
  const sides = polygonEdges(corners);
  let best = Infinity;
  for (const [a, b] of edges) for (const [p, q] of sides) best = Math.min(best, segSegDist(a, b, p, q));
  return best === 0 ? -Infinity : best;
}

/** The wall between two pockets centred at p and q, mm; negative when they overlap. */
export function oracleGap(fp: Footprint, p: P, q: P): number {
  if (fp.kind === 'circle') return Math.hypot(p[0] - q[0], p[1] - q[1]) - fp.diameter;
  const a = rectCorners(p, fp.width, fp.height);
  const b = rectCorners(q, fp.width, fp.height);
  // Overlap: the intersection of the two boxes has positive area.
  const ox = Math.min(a[2]![0], b[2]![0]) - Math.max(a[0]![0], b[0]![0]);
  const oy = Math.min(a[2]![1], b[2]![1]) - Math.max(a[0]![1], b[0]![1]);
  if (ox > 1e-12 && oy > 1e-12) return -Math.min(ox, oy);
  let best = Infinity;
  for (const [s, t] of polygonEdges(a))
    for (const [u, v] of polygonEdges(b)) best = Math.min(best, segSegDist(s, t, u, v));
  return best;
}

/** Narrowest strip holding all points, by brute force over every pair's direction; mm. */
export function oracleWidth(points: ReadonlyArray<P>): number {
  let width = Infinity;
  for (let i = 0; i < points.length; i++) {
    for (let j = i + 1; j < points.length; j++) {
      const a = points[i]!;
      const b = points[j]!;
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
      if (len === 0) continue;
      // The strip's direction is along a–b; its width is the spread of signed distances across it.
      let lo = 0;
      let hi = 0;
      for (const p of points) {
        lo = Math.min(lo, cross(a, b, p) / len);
        hi = Math.max(hi, cross(a, b, p) / len);
      }
      width = Math.min(width, hi - lo);
    }
  }
  return width === Infinity ? 0 : width;
}
