import type { Point2 } from './footprint';
import type { PointSet } from './point-set';
import { pointSetWidth } from './point-set-width';

/** Width tests per key: the best-spread candidates are tried first, so few are ever needed. */
const MAX_TESTS_PER_KEY = 200;
/** Keys tried for the move (spread evenly over the list); bounds the work for long rows. */
const MAX_KEYS_TRIED = 16;

/**
 * Takes 3 or more keys that (nearly) lie on one line and moves one of them so they span at least
 * `minWidth` across any line. Of all moves (up to 16 keys tried, every candidate), it keeps the
 * one that leaves the keys farthest apart: the largest distance from the moved key to its nearest
 * other key. Candidates must keep the required wall to the other keys.
 *
 * @param keys - key centres (mm), 3 or more; not mutated
 * @param cands - centres a key may move to (mm)
 * @param spaced - whether two pockets (dx, dy) apart (mm) keep the required wall
 * @param minWidth - how far off one line the keys must reach (mm)
 * @returns the staggered keys (mm), or null when no single move staggers them enough
 * @example
 * staggerKeys([[-90, -6], [0, 0], [90, 6]], cands, spaced, 0.5); // e.g. [[-90, 6], [0, 0], [90, 6]]
 */
export function staggerKeys(
  keys: Point2[],
  cands: PointSet,
  spaced: (dx: number, dy: number) => boolean,
  minWidth: number,
): Point2[] | null {
  let best: Point2[] | null = null;
  let bestSpread = -1;
  const step = Math.max(1, Math.ceil(keys.length / MAX_KEYS_TRIED));
  for (let i = 0; i < keys.length; i += step) {
    const others = keys.filter((_, j) => j !== i);
    const ranked = rankMoves(others, cands, spaced);
    for (const { c, spread } of ranked.slice(0, MAX_TESTS_PER_KEY)) {
      if (spread <= bestSpread) break;
      const moved = keys.map((p, j): Point2 => (j === i ? [cands.xs[c]!, cands.ys[c]!] : [p[0], p[1]]));
      if (pointSetWidth(moved) < minWidth) continue;
      [best, bestSpread] = [moved, spread];
      break;
    }
  }
  return best;
}

/** Candidates that keep the wall to every other key, farthest from their nearest other key first. */
function rankMoves(others: Point2[], cands: PointSet, spaced: (dx: number, dy: number) => boolean) {
  const ranked: Array<{ c: number; spread: number }> = [];
  for (let c = 0; c < cands.n; c++) {
    const x = cands.xs[c]!;
    const y = cands.ys[c]!;
    let near = Infinity;
    let ok = true;
    for (const [ox, oy] of others) {
      if (!spaced(x - ox, y - oy)) {
        ok = false;
        break;
      }
      near = Math.min(near, (x - ox) ** 2 + (y - oy) ** 2);
    }
    if (ok) ranked.push({ c, spread: Math.sqrt(near) });
  }
  return ranked.sort((p, q) => q.spread - p.spread || p.c - q.c);
}
