import type { Spacing } from './key-region';
import type { PointSet } from './point-set';

/**
 * Farthest-point selection: the first pick is the candidate farthest from the face centre (the
 * origin), each next pick the candidate farthest from every pick so far, among those that keep
 * the required wall to all picks. Stops at `want` picks or when no candidate is far enough.
 * Ties go to the lower index, so the result is deterministic.
 *
 * @param cands - candidate centres (mm)
 * @param want - most picks wanted
 * @param spacing - whether two pockets (dx, dy) apart (mm) keep the required wall, and the
 *   centre distance beyond which they always do
 * @returns indices into `cands`, in pick order
 * @example
 * farthestPointKeys(pointSet([-1, 0, 1], [0, 0, 0]), 2, region); // [0, 2]
 */
export function farthestPointKeys(cands: PointSet, want: number, spacing: Spacing): number[] {
  const { xs, ys, n } = cands;
  const clash2 = spacing.clashDistance * spacing.clashDistance;
  const picks: number[] = [];
  if (n === 0 || want < 1) return picks;
  const minD2 = new Float64Array(n);
  const blocked = new Uint8Array(n);
  for (let c = 0; c < n; c++) minD2[c] = xs[c]! * xs[c]! + ys[c]! * ys[c]!;
  // With no pick yet, "distance to the picks" is the distance to the centre: that picks the first.
  let next = argMax(minD2, blocked, -1);
  while (next >= 0 && picks.length < want) {
    picks.push(next);
    const px = xs[next]!;
    const py = ys[next]!;
    for (let c = 0; c < n; c++) {
      const dx = xs[c]! - px;
      const dy = ys[c]! - py;
      const d2 = dx * dx + dy * dy;
      if (picks.length === 1 || d2 < minD2[c]!) minD2[c] = d2;
      if (blocked[c] === 0 && d2 <= clash2 && !spacing.spaced(dx, dy)) blocked[c] = 1;
    }
    next = argMax(minD2, blocked, 0);
  }
  return picks;
}

function argMax(values: Float64Array, blocked: Uint8Array, above: number): number {
  let best = -1;
  let bestValue = above;
  for (let c = 0; c < values.length; c++) {
    if (blocked[c] === 0 && values[c]! > bestValue) {
      best = c;
      bestValue = values[c]!;
    }
  }
  return best;
}
