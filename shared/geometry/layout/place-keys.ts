import type { Face } from '../../schemas/face';
import { GeometryError } from '../geometry-error';
import { arrangeKeys } from './arrange-keys';
import { climbWall } from './climb-wall';
import { fastKeys } from './fast-keys';
import type { Footprint, Point2 } from './footprint';
import { keyLayoutError } from './key-layout-error';
import { keyRegion, type KeyRegion } from './key-region';
import { minKeyDistance } from './min-key-distance';
import { pointSetWidth } from './point-set-width';
import { refineKeys } from './refine-keys';
import { searchCandidates, type CandidateSearch } from './search-candidates';
import { staggerKeys } from './stagger-keys';
import { validatePolygon } from './validate-polygon';

/** Most keys placed on one face (the cap when `count` is omitted, and the most one may ask for). */
export const MAX_KEYS = 64;
/**
 * Three or more keys must reach at least this far off any one line, in mm. Half a millimetre is
 * well above what FDM and resin printers resolve, so the stagger is real, not rounding.
 */
export const MIN_STAGGER_MM = 0.5;

/** Parameters of {@link placeKeys}; lengths in mm. */
export type PlaceKeysParams = {
  face: Face;
  footprint: Footprint;
  /** Minimum wall (mm): pocket to face edge and pocket to pocket. 0 or more. */
  margin: number;
  /** Keys wanted, 1–64; omitted: as many as fit, at most 64. */
  count?: number;
  /** How messages name the key, e.g. "a 10 mm key". */
  keyLabel: string;
};

/**
 * Places registration-key pockets on a cut face (plane z = 0, centred on the origin), as far
 * apart as the face allows while keeping `margin` of wall between every pocket and the face edge
 * and between every two pockets. One key goes at the centre (or the most interior spot when the
 * centre does not fit); 3 or more never all sit on one line (see {@link MIN_STAGGER_MM}).
 * Deterministic: plain arithmetic (no trigonometry, no randomness) and bounded work (at most
 * about 5,000 candidate centres and 40,000 wall evaluations, each against nearby polygon edges
 * only), so the same parameters give exactly the same positions in the browser and on the server.
 *
 * @param params - face, footprint, margin (mm), optional count, key label
 * @returns key centres [x, y] in mm, sorted by x then y
 * @throws GeometryError `FACE_TOO_SMALL` when no pocket fits, e.g. "a 10 mm key with 3 mm walls
 *   needs a face at least 16.4 mm wide; this one is 12 mm"; `TOO_MANY_KEYS` when fewer than
 *   `count` fit or `count` > 64; `NO_ROOM_FOR_KEYS` when 3+ keys would sit on one line;
 *   `POLYGON_INVALID` / `WORK_LIMIT` from {@link validatePolygon}
 * @throws RangeError for sizes that are not positive finite numbers (the schema rules those out)
 * @example
 * placeKeys({ face: { shape: 'rect', width: 80, height: 60 }, footprint: { kind: 'rect', width: 10.4, height: 10.4 },
 *   margin: 3, count: 2, keyLabel: 'a 10 mm key' }); // [[-31.8, -21.8], [31.8, 21.8]]
 */
export function placeKeys(params: PlaceKeysParams): Array<[number, number]> {
  checkParams(params);
  const { face, footprint, margin, count, keyLabel } = params;
  if (count !== undefined && count > MAX_KEYS) throw keyLayoutError({ kind: 'over-cap', cap: MAX_KEYS, asked: count });
  if (face.shape === 'polygon') validatePolygon(face.points);
  const region = keyRegion(face, footprint, margin, keyLabel);
  // Rect and round faces with a count: regular layouts built directly. When they are spread so
  // far apart that no two pockets come near each other's wall, spacing never limited them and
  // they are final; crowded ones compete with the search, which handles tight packings better.
  const fast = count === undefined ? null : fastKeys(face, region, count, MIN_STAGGER_MM);
  if (fast && (fast.length < 2 || minKeyDistance(fast) >= region.clashDistance)) return tidied(fast);
  let searched: Point2[];
  try {
    searched = searchedKeys(params, region);
  } catch (e) {
    if (fast && e instanceof GeometryError) return tidied(fast);
    throw e;
  }
  return fast && minKeyDistance(fast) > minKeyDistance(searched) ? tidied(fast) : searched;
}

/** The general layout: candidate search, farthest-point selection, refinement, stagger. */
function searchedKeys(params: PlaceKeysParams, region: KeyRegion): Point2[] {
  const { footprint, margin, count, keyLabel } = params;
  const search = searchCandidates(region);
  if (search.points.n === 0) {
    throw keyLayoutError({ kind: 'no-spot', keyLabel, margin, footprint, bestWall: search.bestWall });
  }
  const want = count ?? MAX_KEYS;
  let keys = want === 1 ? [] : arrangeKeys(region, search, want);
  if (count !== undefined && count > 1 && keys.length < count) {
    throw keyLayoutError({ kind: 'too-many', keyLabel, margin, footprint, fit: keys.length, asked: count });
  }
  if (keys.length <= 1) keys = [singleKey(region, search)];
  if (keys.length >= 3 && pointSetWidth(keys) < MIN_STAGGER_MM) keys = staggered(keys, region, search, params);
  return tidied(keys);
}

/** The keys rounded by {@link tidy}, sorted by x then y. */
function tidied(keys: Point2[]): Array<[number, number]> {
  return keys.map(([x, y]): Point2 => [tidy(x), tidy(y)]).sort((p, q) => p[0] - q[0] || p[1] - q[1]);
}

/**
 * Rounds to 1e-9 mm, so 31.799999999999997 reads 31.8, and turns -0 into 0. Moves a key by at
 * most 1e-9 mm: far inside the 1e-7 mm slack the walls were checked with.
 */
function tidy(v: number): number {
  const r = Math.round(v * 1e9) / 1e9;
  return r === 0 ? 0 : r;
}

/** The centre when a pocket fits there, else the most interior candidate, climbed further in. */
function singleKey(region: KeyRegion, search: CandidateSearch): Point2 {
  if (region.fits(0, 0)) return [0, 0];
  let best = 0;
  for (let c = 1; c < search.points.n; c++) if (search.walls[c]! > search.walls[best]!) best = c;
  const top = climbWall(
    region.wall,
    search.points.xs[best]!,
    search.points.ys[best]!,
    Math.max(search.reach, 1e-3),
    Infinity,
  );
  return [top.x, top.y];
}

function staggered(keys: Point2[], region: KeyRegion, search: CandidateSearch, params: PlaceKeysParams): Point2[] {
  const { xs, ys, n } = search.points;
  const room = pointSetWidth(Array.from({ length: n }, (_, c): Point2 => [xs[c]!, ys[c]!]));
  // When all the room is one narrow strip, no move can stagger the keys: skip the search.
  const moved = room < MIN_STAGGER_MM ? null : staggerKeys(keys, search.points, region.spaced, MIN_STAGGER_MM);
  if (moved) {
    // Spread them again, unless that pulls them back onto one line.
    const spread = refineKeys(moved, search.points, region);
    return pointSetWidth(spread) >= MIN_STAGGER_MM ? spread : moved;
  }
  if (params.count === undefined) return arrangeKeys(region, search, 2);
  const { keyLabel, margin, count } = params;
  throw keyLayoutError({ kind: 'one-line', keyLabel, margin, asked: count, room, needed: MIN_STAGGER_MM });
}

function checkParams({ face, footprint, margin, count }: PlaceKeysParams): void {
  const sizes = footprint.kind === 'rect' ? [footprint.width, footprint.height] : [footprint.diameter];
  if (face.shape === 'rect') sizes.push(face.width, face.height);
  if (face.shape === 'circle') sizes.push(face.diameter);
  if (!sizes.every((s) => Number.isFinite(s) && s > 0))
    throw new RangeError('face and pocket sizes must be finite and greater than 0 mm');
  if (!(Number.isFinite(margin) && margin >= 0))
    throw new RangeError('margin must be a finite number of mm, 0 or more');
  if (count !== undefined && !(Number.isInteger(count) && count >= 1))
    throw new RangeError('count must be a whole number, 1 or more');
}
