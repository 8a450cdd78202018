import type { CentreRoom } from './centre-room';
import type { Point2 } from './footprint';
import { intoRoom } from './into-room';
import type { Spacing } from './key-region';
import { minKeyDistance } from './min-key-distance';

/** Eight compass directions as flat (dx, dy) pairs, unit length. */
const H = Math.SQRT1_2;
const DIRS = [1, 0, H, H, 0, 1, -H, H, -1, 0, -H, -H, 0, -1, H, -H];
/** Rounds over all keys; each round moves each key at most once, or halves the step. */
const MAX_ROUNDS = 80;

/**
 * Spreads keys further apart in the continuous room (no candidate grid): each key in turn steps
 * to the best of 8 compass moves (pulled back into the room) when that puts it farther from its
 * nearest other key while keeping the required wall to every other key; when no key moves, the
 * step halves, down to `finest`. The smallest distance between keys never shrinks, and every key
 * stays in the room, so a legal start gives a legal result.
 *
 * @param start - legal, well-spaced key centres (mm); not mutated
 * @param room - where centres may go (mm)
 * @param spacing - whether two pockets (dx, dy) apart (mm) keep the required wall
 * @param finest - smallest step (mm)
 * @param first - first step (mm); a quarter of the closest two keys' distance by default
 * @returns the moved keys (mm), same count and order
 * @example
 * spreadKeys([[0, 0], [1, 0]], { kind: 'box', minX: -5, minY: 0, maxX: 5, maxY: 0 }, region, 1e-3); // [[-5, 0], [5, 0]]
 */
export function spreadKeys(
  start: Point2[],
  room: CentreRoom,
  spacing: Spacing,
  finest: number,
  first = minKeyDistance(start) / 4,
): Point2[] {
  const k = start.length;
  const keys = { xs: Float64Array.from(start, (p) => p[0]), ys: Float64Array.from(start, (p) => p[1]) };
  const near = new Int32Array(k);
  let step = Math.max(finest, first);
  for (let round = 0; round < MAX_ROUNDS && step >= finest && k >= 2; round++) {
    let moved = false;
    for (let i = 0; i < k; i++) moved = moveKey(keys, i, step, room, spacing, near) || moved;
    if (!moved) step /= 2;
  }
  return Array.from({ length: k }, (_, i): Point2 => [keys.xs[i]!, keys.ys[i]!]);
}

type Keys = { xs: Float64Array; ys: Float64Array };

/** Moves key i to its best compass move `step` away, if that clearly gains; true when it moved. */
function moveKey(keys: Keys, i: number, step: number, room: CentreRoom, spacing: Spacing, near: Int32Array): boolean {
  const { xs, ys } = keys;
  const x = xs[i]!;
  const y = ys[i]!;
  const all = -1;
  const current = nearestOther(keys, i, x, y, spacing, near, all);
  // Moves of up to `bound` can only meet (or clash with) keys within reach + 2 × bound now, so
  // only those are checked; a longer move (a pull-in on a round rim) checks every key.
  const bound = 1.5 * step;
  const r = Math.max(Math.sqrt(current), spacing.clashDistance) + 2 * bound;
  let m = 0;
  for (let j = 0; j < xs.length; j++) if (j !== i && (xs[j]! - x) ** 2 + (ys[j]! - y) ** 2 <= r * r) near[m++] = j;
  // Only a clear gain counts, so rounding noise cannot make keys swap back and forth.
  let best = current * (1 + 1e-9) + 1e-12;
  let bx = Number.NaN;
  let by = Number.NaN;
  for (let d = 0; d < DIRS.length; d += 2) {
    const p = intoRoom(room, x + DIRS[d]! * step, y + DIRS[d + 1]! * step);
    const short = (p[0] - x) ** 2 + (p[1] - y) ** 2 <= bound * bound;
    const to = nearestOther(keys, i, p[0], p[1], spacing, near, short ? m : all);
    if (to > best) {
      best = to;
      bx = p[0];
      by = p[1];
    }
  }
  if (Number.isNaN(bx)) return false;
  xs[i] = bx;
  ys[i] = by;
  return true;
}

/**
 * Squared distance from (x, y) to the nearest key other than i (the first `m` keys listed in
 * `near`, or all keys when m is -1); -1 when a pocket there would clash with one of them.
 */
function nearestOther(keys: Keys, i: number, x: number, y: number, spacing: Spacing, near: Int32Array, m: number) {
  const clash2 = spacing.clashDistance * spacing.clashDistance;
  const n = m < 0 ? keys.xs.length : m;
  let best = Infinity;
  for (let t = 0; t < n; t++) {
    const j = m < 0 ? t : near[t]!;
    if (j === i) continue;
    const dx = x - keys.xs[j]!;
    const dy = y - keys.ys[j]!;
    const d = dx * dx + dy * dy;
    if (d <= clash2 && !spacing.spaced(dx, dy)) return -1;
    if (d < best) best = d;
  }
  return best;
}
