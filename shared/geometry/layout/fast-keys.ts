import type { Face } from '../../schemas/face';
import { centreRoom } from './centre-room';
import type { Point2 } from './footprint';
import { intoRoom } from './into-room';
import type { KeyRegion } from './key-region';
import { minKeyDistance } from './min-key-distance';
import { pointSetWidth } from './point-set-width';
import { ringLayouts } from './ring-layouts';
import { rowLayouts } from './row-layouts';
import { spreadKeys } from './spread-keys';

/** Regular layouts refined (the best-spread ones); the rest are rarely better after refinement. */
const REFINED = 4;
/** Refinement steps (mm): the rivals are spread down to COARSE_MM, the winner on to FINEST_MM, far below print resolution. */
const COARSE_MM = 0.05;
const FINEST_MM = 4e-3;

/**
 * The fast path of the key layout for rect and round faces, where the legal centres form a box
 * or a star-shaped round room known in closed form: regular row or ring layouts of exactly
 * `count` keys are built there directly, the best few spread further by a short continuous
 * refinement, and the one whose closest two keys are farthest apart wins. No candidate search:
 * a few hundred wall and spacing checks instead of tens of thousands. Every key of the result is
 * checked against the region (walls, spacing, and the stagger of 3 or more keys), so a null
 * answer only means "use the general search", never a wrong layout.
 *
 * @param face - the cut face (mm)
 * @param region - the layout problem on it
 * @param count - keys wanted, 1 or more
 * @param minWidth - how far off one line 3 or more keys must reach (mm)
 * @returns `count` legal keys (mm), or null when the face is a polygon or no regular layout works
 * @example
 * fastKeys({ shape: 'rect', width: 60, height: 60 }, region, 4, 0.5); // the 4 corners of the room
 */
export function fastKeys(face: Face, region: KeyRegion, count: number, minWidth: number): Point2[] | null {
  const room = centreRoom(face, region);
  if (!room) return null;
  if (count === 1) return region.fits(0, 0) ? [[0, 0]] : null;
  // Round rooms also try the row layouts of their box, pulled in: rims that are far from circular.
  const starts =
    room.kind === 'box'
      ? rowLayouts(room, count)
      : [
          ...ringLayouts(room.reach, count),
          ...rowLayouts(region.bounds, count).map((keys) => keys.map(([x, y]) => intoRoom(room, x, y))),
        ];
  const ranked = starts
    .filter((keys) => legal(keys, region))
    .map((keys, order) => ({ keys, order, gap: minKeyDistance(keys) }))
    .sort((p, q) => q.gap - p.gap || p.order - q.order);
  let best: Point2[] | null = null;
  let bestGap = -1;
  for (const { keys } of ranked.slice(0, REFINED)) {
    const spread = spreadKeys(keys, room, region, COARSE_MM);
    const gap = minKeyDistance(spread);
    if (gap > bestGap && final(spread, region, minWidth)) [best, bestGap] = [spread, gap];
  }
  if (!best) return null;
  const finer = spreadKeys(best, room, region, FINEST_MM, 2 * COARSE_MM);
  return final(finer, region, minWidth) ? finer : best;
}

/** Legal, and 3 or more keys off one line (keys on one line need the general search's stagger step). */
function final(keys: Point2[], region: KeyRegion, minWidth: number): boolean {
  return (keys.length < 3 || pointSetWidth(keys) >= minWidth) && legal(keys, region);
}

/** Every pocket inside the face with its wall, and every two pockets spaced. */
function legal(keys: Point2[], region: KeyRegion): boolean {
  for (let i = 0; i < keys.length; i++) {
    if (!region.fits(keys[i]![0], keys[i]![1])) return false;
    for (let j = i + 1; j < keys.length; j++) {
      if (!region.spaced(keys[i]![0] - keys[j]![0], keys[i]![1] - keys[j]![1])) return false;
    }
  }
  return true;
}
