import { pointSegmentDistance2 } from './point-segment-distance2';

/**
 * Squared distance between the rectangle [-a, a] × [-b, b] and the segment (px, py)–(qx, qy), in mm².
 * Zero when the segment touches or enters the rectangle.
 *
 * @param a - half width of the rectangle (mm)
 * @param b - half height of the rectangle (mm)
 * @returns the squared distance in mm²
 * @example
 * rectSegmentDistance2(1, 1, 4, -5, 4, 5); // 9
 */
export function rectSegmentDistance2(a: number, b: number, px: number, py: number, qx: number, qy: number): number {
  if (segmentEntersRect(a, b, px, py, qx, qy)) return 0;
  // Two disjoint convex shapes are closest at a vertex of one of them.
  let best = Math.min(pointRect2(a, b, px, py), pointRect2(a, b, qx, qy));
  best = Math.min(best, pointSegmentDistance2(a, b, px, py, qx, qy));
  best = Math.min(best, pointSegmentDistance2(-a, b, px, py, qx, qy));
  best = Math.min(best, pointSegmentDistance2(a, -b, px, py, qx, qy));
  return Math.min(best, pointSegmentDistance2(-a, -b, px, py, qx, qy));
}

function pointRect2(a: number, b: number, x: number, y: number): number {
  const ox = Math.max(0, Math.abs(x) - a);
  const oy = Math.max(0, Math.abs(y) - b);
  return ox * ox + oy * oy;
}

/** Liang–Barsky clipping: does any part of the segment lie in the closed rectangle? */
function segmentEntersRect(a: number, b: number, px: number, py: number, qx: number, qy: number): boolean {
  const dx = qx - px;
  const dy = qy - py;
  const ps = [-dx, dx, -dy, dy];
  const qs = [px + a, a - px, py + b, b - py];
  let t0 = 0;
  let t1 = 1;
  for (let k = 0; k < 4; k++) {
    const p = ps[k]!;
    const q = qs[k]!;
    if (p === 0) {
      if (q < 0) return false;
      continue;
    }
    const r = q / p;
    if (p < 0) {
      if (r > t1) return false;
      if (r > t0) t0 = r;
    } else {
      if (r < t0) return false;
      if (r < t1) t1 = r;
    }
  }
  return t0 <= t1;
}
