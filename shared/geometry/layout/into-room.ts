import type { CentreRoom } from './centre-room';
import type { Point2 } from './footprint';
/**
 * Moves a point into the room: clamped to the box, or pulled in towards the centre.
 *
 * @param room - the room (mm)
 * @param x - point x (mm)
 * @param y - point y (mm)
 * @returns the point itself when inside, else the box's nearest point or the rim point on the way
 *   to the centre (mm)
 * @example
 * intoRoom({ kind: 'box', minX: -1, minY: -1, maxX: 1, maxY: 1 }, 3, 0); // [1, 0]
 */
export function intoRoom(room: CentreRoom, x: number, y: number): Point2 {
  if (room.kind === 'box') {
    return [Math.min(room.maxX, Math.max(room.minX, x)), Math.min(room.maxY, Math.max(room.minY, y))];
  }
  const len = Math.sqrt(x * x + y * y);
  if (len === 0) return [0, 0];
  const r = room.reach(x / len, y / len);
  return len <= r ? [x, y] : [(x / len) * r, (y / len) * r];
}
