/**
 * Squared distance from point (px, py) to the segment (ax, ay)–(bx, by), in mm².
 * Squared so hot loops can compare without a square root.
 *
 * @returns the squared distance in mm²
 * @example
 * pointSegmentDistance2(0, 5, -1, 0, 1, 0); // 25
 */
export function pointSegmentDistance2(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const ex = bx - ax;
  const ey = by - ay;
  const len2 = ex * ex + ey * ey;
  let t = len2 > 0 ? ((px - ax) * ex + (py - ay) * ey) / len2 : 0;
  t = t < 0 ? 0 : t > 1 ? 1 : t;
  const dx = ax + t * ex - px;
  const dy = ay + t * ey - py;
  return dx * dx + dy * dy;
}
