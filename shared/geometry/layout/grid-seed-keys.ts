import type { Point2 } from './footprint';
import type { PointSet } from './point-set';

/**
 * Regular starting layouts for `want` keys: for every way to write want = rows × columns with at
 * least 2 of each, that grid stretched over the box of the candidates, each node moved to its
 * nearest candidate. On rectangular room these are the symmetric layouts farthest-point
 * selection tends to miss (6 keys as 2 × 3 rather than a quincunx plus one). Layouts whose
 * pockets would come too close, or that snap two nodes to one candidate, are left out.
 *
 * @param cands - candidate centres (mm)
 * @param want - keys wanted
 * @param spaced - whether two pockets (dx, dy) apart (mm) keep the required wall
 * @returns zero or more layouts, each of `want` keys (mm)
 * @example
 * gridSeedKeys(cands, 6, spaced); // a 2 × 3 and a 3 × 2 layout
 */
export function gridSeedKeys(cands: PointSet, want: number, spaced: (dx: number, dy: number) => boolean): Point2[][] {
  const { xs, ys, n } = cands;
  if (n === 0) return [];
  let [minX, minY, maxX, maxY] = [Infinity, Infinity, -Infinity, -Infinity];
  for (let c = 0; c < n; c++) {
    [minX, maxX] = [Math.min(minX, xs[c]!), Math.max(maxX, xs[c]!)];
    [minY, maxY] = [Math.min(minY, ys[c]!), Math.max(maxY, ys[c]!)];
  }
  const seeds: Point2[][] = [];
  for (let cols = 2; cols <= want / 2; cols++) {
    if (want % cols !== 0) continue;
    const rows = want / cols;
    const picks = new Set<number>();
    for (let j = 0; j < rows; j++) {
      for (let i = 0; i < cols; i++) {
        picks.add(nearest(cands, minX + ((maxX - minX) * i) / (cols - 1), minY + ((maxY - minY) * j) / (rows - 1)));
      }
    }
    const keys = [...picks].map((c): Point2 => [xs[c]!, ys[c]!]);
    if (keys.length === want && allSpaced(keys, spaced)) seeds.push(keys);
  }
  return seeds;
}

function nearest(cands: PointSet, x: number, y: number): number {
  let best = 0;
  let bestD = Infinity;
  for (let c = 0; c < cands.n; c++) {
    const d = (cands.xs[c]! - x) ** 2 + (cands.ys[c]! - y) ** 2;
    if (d < bestD) [best, bestD] = [c, d];
  }
  return best;
}

function allSpaced(keys: Point2[], spaced: (dx: number, dy: number) => boolean): boolean {
  for (let i = 0; i < keys.length; i++) {
    for (let j = i + 1; j < keys.length; j++) {
      if (!spaced(keys[i]![0] - keys[j]![0], keys[i]![1] - keys[j]![1])) return false;
    }
  }
  return true;
}
