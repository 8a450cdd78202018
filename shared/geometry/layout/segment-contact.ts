/** Where and how two segments meet. */
export type SegmentContact = { x: number; y: number; kind: 'cross' | 'touch' };

/**
 * Whether the segments (a–b) and (c–d) meet, and where. `cross` when they pass through each other,
 * `touch` when an end of one lies on the other (including collinear overlap).
 *
 * @returns the meeting point in mm and its kind, or null when the segments are apart
 * @example
 * segmentContact(0, 0, 2, 2, 0, 2, 2, 0); // { x: 1, y: 1, kind: 'cross' }
 */
export function segmentContact(
  ax: number,
  ay: number,
  bx: number,
  by: number,
  cx: number,
  cy: number,
  dx: number,
  dy: number,
): SegmentContact | null {
  const o1 = orient(ax, ay, bx, by, cx, cy);
  const o2 = orient(ax, ay, bx, by, dx, dy);
  const o3 = orient(cx, cy, dx, dy, ax, ay);
  const o4 = orient(cx, cy, dx, dy, bx, by);
  if (((o1 > 0 && o2 < 0) || (o1 < 0 && o2 > 0)) && ((o3 > 0 && o4 < 0) || (o3 < 0 && o4 > 0))) {
    const t = o3 / (o3 - o4);
    return { x: ax + t * (bx - ax), y: ay + t * (by - ay), kind: 'cross' };
  }
  if (o1 === 0 && within(cx, cy, ax, ay, bx, by)) return { x: cx, y: cy, kind: 'touch' };
  if (o2 === 0 && within(dx, dy, ax, ay, bx, by)) return { x: dx, y: dy, kind: 'touch' };
  if (o3 === 0 && within(ax, ay, cx, cy, dx, dy)) return { x: ax, y: ay, kind: 'touch' };
  if (o4 === 0 && within(bx, by, cx, cy, dx, dy)) return { x: bx, y: by, kind: 'touch' };
  return null;
}

/** Twice the signed area of the triangle p, q, r: > 0 when r lies left of p→q. */
function orient(px: number, py: number, qx: number, qy: number, rx: number, ry: number): number {
  return (qx - px) * (ry - py) - (qy - py) * (rx - px);
}

/** For a point already known to be collinear with a–b: does it lie between them? */
function within(px: number, py: number, ax: number, ay: number, bx: number, by: number): boolean {
  return px >= Math.min(ax, bx) && px <= Math.max(ax, bx) && py >= Math.min(ay, by) && py <= Math.max(ay, by);
}
