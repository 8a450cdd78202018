import { farthestPointKeys } from './farthest-point-keys';
import type { Point2 } from './footprint';
import { gridSeedKeys } from './grid-seed-keys';
import type { KeyRegion } from './key-region';
import { latticeKeys } from './lattice-keys';
import { minKeyDistance } from './min-key-distance';
import type { PointSet } from './point-set';
import { refineKeys } from './refine-keys';
import type { CandidateSearch } from './search-candidates';

/**
 * Places up to `want` keys as far apart as the candidates allow. Farthest-point selection first;
 * when it runs out of room before `want`, a dense lattice packing is tried and, if it holds more,
 * the keys are picked from it (farthest-point again, so they still spread). Then refinement
 * passes push the keys further apart, and the best regular grid layout (rows × columns = want),
 * spread the same way, competes with the result: the largest smallest distance between keys
 * wins. Every step keeps the walls, so the result is always legal.
 *
 * @param region - the layout problem
 * @param search - the candidate centres
 * @param want - keys wanted, 1 or more
 * @returns the keys (mm); fewer than `want` when no more fit (that count is the most found)
 * @example
 * arrangeKeys(region, searchCandidates(region), 4).length; // 4 on a roomy face
 */
export function arrangeKeys(region: KeyRegion, search: CandidateSearch, want: number): Point2[] {
  let source: PointSet = search.points;
  let picks = farthestPointKeys(source, want, region);
  if (picks.length < want) {
    const lattice = latticeKeys(region, search, want);
    if (lattice.n > picks.length) {
      source = lattice;
      picks = farthestPointKeys(lattice, want, region);
    }
  }
  const keys = refineKeys(
    picks.map((i): Point2 => [source.xs[i]!, source.ys[i]!]),
    search.points,
    region,
  );
  if (source !== search.points || keys.length < 4) return keys;
  // The best regular grid, spread further, is the rival; it must win by more than rounding.
  let seed: Point2[] | null = null;
  for (const grid of gridSeedKeys(search.points, keys.length, region.spaced)) {
    if (!seed || minKeyDistance(grid) > minKeyDistance(seed)) seed = grid;
  }
  if (!seed) return keys;
  const rival = refineKeys(seed, search.points, region);
  return minKeyDistance(rival) > minKeyDistance(keys) * (1 + 1e-9) ? rival : keys;
}
