import type { Bounds } from './footprint';
import type { PointSet } from './point-set';

/** Most buckets per side; a coarser bucket is used beyond that. */
const MAX_SIDE = 512;

/**
 * A coarse occupancy map of candidate centres: `near(x, y)` tells whether some candidate lies
 * within `size` mm (it checks the 3 × 3 buckets around the point; buckets are `size` wide or wider).
 * Used to skip lattice points far from anywhere a pocket was found to fit.
 *
 * @param points - candidate centres (mm), at least one
 * @param size - the search radius and smallest bucket size (mm), > 0
 * @returns the box of the candidates grown by `size`, and the lookup
 * @example
 * candidateBuckets(pointSet([0], [0]), 2).near(1.5, 0); // true
 */
export function candidateBuckets(
  points: PointSet,
  size: number,
): { box: Bounds; near: (x: number, y: number) => boolean } {
  let [minX, minY, maxX, maxY] = [Infinity, Infinity, -Infinity, -Infinity];
  for (let c = 0; c < points.n; c++) {
    [minX, maxX] = [Math.min(minX, points.xs[c]!), Math.max(maxX, points.xs[c]!)];
    [minY, maxY] = [Math.min(minY, points.ys[c]!), Math.max(maxY, points.ys[c]!)];
  }
  const box = { minX: minX - size, minY: minY - size, maxX: maxX + size, maxY: maxY + size };
  const cell = Math.max(size, (box.maxX - box.minX) / MAX_SIDE, (box.maxY - box.minY) / MAX_SIDE);
  const gx = Math.max(1, Math.ceil((box.maxX - box.minX) / cell));
  const gy = Math.max(1, Math.ceil((box.maxY - box.minY) / cell));
  const full = new Uint8Array(gx * gy);
  const at = (v: number, lo: number, n: number) => Math.min(n - 1, Math.max(0, Math.floor((v - lo) / cell)));
  for (let c = 0; c < points.n; c++) full[at(points.ys[c]!, box.minY, gy) * gx + at(points.xs[c]!, box.minX, gx)] = 1;
  const near = (x: number, y: number) => {
    if (x < box.minX || x > box.maxX || y < box.minY || y > box.maxY) return false;
    const i = at(x, box.minX, gx);
    const j = at(y, box.minY, gy);
    for (let dj = -1; dj <= 1; dj++) {
      for (let di = -1; di <= 1; di++) {
        const [ii, jj] = [i + di, j + dj];
        if (ii >= 0 && jj >= 0 && ii < gx && jj < gy && full[jj * gx + ii] === 1) return true;
      }
    }
    return false;
  };
  return { box, near };
}
