import type { WallFunction } from './pocket-wall-function';

/**
 * Compass search for a thicker wall: from (x, y), step to the best of the 8 neighbours `step`
 * away while that improves the wall, else halve the step. Stops at `goal`, below 1 nm steps or
 * after 200 rounds (at most 1,600 wall evaluations). Plain arithmetic only, so the result is the
 * same on every JavaScript engine.
 *
 * @param wall - the wall function (mm)
 * @param x - start x (mm)
 * @param y - start y (mm)
 * @param step - first step (mm)
 * @param goal - stop once the wall reaches this (mm); Infinity to climb as far as possible
 * @returns the end point and its wall, in mm
 * @example
 * climbWall(region.wall, 0, 0, 1, Infinity); // the most interior spot near the origin
 */
export function climbWall(
  wall: WallFunction,
  x: number,
  y: number,
  step: number,
  goal: number,
): { x: number; y: number; wall: number } {
  let w = wall(x, y);
  let s = step;
  for (let round = 0; round < 200 && s > 1e-9 && w < goal; round++) {
    let bx = x;
    let by = y;
    let bw = w;
    for (let dy = -1; dy <= 1; dy++) {
      for (let dx = -1; dx <= 1; dx++) {
        if (dx === 0 && dy === 0) continue;
        const c = wall(x + dx * s, y + dy * s);
        if (c > bw) {
          bx = x + dx * s;
          by = y + dy * s;
          bw = c;
        }
      }
    }
    if (bw > w) {
      x = bx;
      y = by;
      w = bw;
    } else {
      s /= 2;
    }
  }
  return { x, y, wall: w };
}
