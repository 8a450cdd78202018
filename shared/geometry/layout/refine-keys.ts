import type { Point2 } from './footprint';
import type { Spacing } from './key-region';
import type { PointSet } from './point-set';

/** Passes over all keys; each pass moves each key at most once. */
const PASSES = 6;

/**
 * Spreads keys further apart: each key in turn moves to the candidate farthest from its nearest
 * other key, among candidates that keep the required wall to every other key, when that is
 * farther than where it is. The smallest distance between keys never shrinks. Keeps, per
 * candidate, its two nearest keys and how many keys it clashes with, so a pass costs about
 * candidates × keys operations rather than candidates × keys².
 *
 * @param keys - starting key centres (mm); not mutated
 * @param cands - centres the keys may move to (mm)
 * @param spacing - whether two pockets (dx, dy) apart (mm) keep the required wall, and the
 *   centre distance beyond which they always do
 * @returns the moved key centres (mm), same count and order
 * @example
 * refineKeys([[0, 0], [1, 0]], pointSet([-5, 0, 5], [0, 0, 0]), region); // [[-5, 0], [5, 0]]
 */
export function refineKeys(keys: Point2[], cands: PointSet, spacing: Spacing): Point2[] {
  const k = keys.length;
  if (k < 2 || cands.n === 0) return keys.map(([x, y]): Point2 => [x, y]);
  const state = nearState(keys, cands, spacing);
  for (let pass = 0; pass < PASSES; pass++) {
    let moved = false;
    for (let i = 0; i < k; i++) {
      const target = bestMove(state, i);
      if (target >= 0) {
        moveKey(state, i, target);
        moved = true;
      }
    }
    if (!moved) break;
  }
  return Array.from({ length: k }, (_, i): Point2 => [state.kx[i]!, state.ky[i]!]);
}

type NearState = {
  kx: Float64Array;
  ky: Float64Array;
  cands: PointSet;
  spaced: (dx: number, dy: number) => boolean;
  /** Squared centre distance beyond which two pockets never clash (mm²). */
  clash2: number;
  /** Per candidate: nearest key, its squared distance, second nearest key, its squared distance. */
  near1: Int32Array;
  d1: Float64Array;
  near2: Int32Array;
  d2: Float64Array;
  /** Per candidate: how many keys it is too close to. */
  clash: Int32Array;
};

function nearState(keys: Point2[], cands: PointSet, { spaced, clashDistance }: Spacing): NearState {
  const n = cands.n;
  const state: NearState = {
    kx: Float64Array.from(keys, (p) => p[0]),
    ky: Float64Array.from(keys, (p) => p[1]),
    cands,
    spaced,
    clash2: clashDistance * clashDistance,
    near1: new Int32Array(n),
    d1: new Float64Array(n),
    near2: new Int32Array(n),
    d2: new Float64Array(n),
    clash: new Int32Array(n),
  };
  for (let c = 0; c < n; c++) {
    recomputeNear(state, c);
    for (let j = 0; j < keys.length; j++) {
      if (!spaced(cands.xs[c]! - state.kx[j]!, cands.ys[c]! - state.ky[j]!)) state.clash[c]!++;
    }
  }
  return state;
}

function recomputeNear(s: NearState, c: number): void {
  let n1 = -1;
  let n2 = -1;
  let a = Infinity;
  let b = Infinity;
  for (let j = 0; j < s.kx.length; j++) {
    const dx = s.cands.xs[c]! - s.kx[j]!;
    const dy = s.cands.ys[c]! - s.ky[j]!;
    const d = dx * dx + dy * dy;
    if (d < a) [n2, b, n1, a] = [n1, a, j, d];
    else if (d < b) [n2, b] = [j, d];
  }
  [s.near1[c], s.d1[c], s.near2[c], s.d2[c]] = [n1, a, n2, b];
}

/** The candidate key i should move to, or -1 when no candidate beats its current spot. */
function bestMove(s: NearState, i: number): number {
  let current = Infinity;
  for (let j = 0; j < s.kx.length; j++) {
    if (j === i) continue;
    const dx = s.kx[i]! - s.kx[j]!;
    const dy = s.ky[i]! - s.ky[j]!;
    current = Math.min(current, dx * dx + dy * dy);
  }
  // Only a clear gain counts, so rounding noise cannot make keys swap back and forth.
  let best = current * (1 + 1e-9) + 1e-12;
  let target = -1;
  const { xs, ys, n } = s.cands;
  for (let c = 0; c < n; c++) {
    const d = s.near1[c] === i ? s.d2[c]! : s.d1[c]!;
    if (d <= best) continue;
    const clashesWithSelf = s.spaced(xs[c]! - s.kx[i]!, ys[c]! - s.ky[i]!) ? 0 : 1;
    if (s.clash[c]! - clashesWithSelf > 0) continue;
    best = d;
    target = c;
  }
  return target;
}

function moveKey(s: NearState, i: number, target: number): void {
  const { xs, ys, n } = s.cands;
  const ox = s.kx[i]!;
  const oy = s.ky[i]!;
  s.kx[i] = xs[target]!;
  s.ky[i] = ys[target]!;
  for (let c = 0; c < n; c++) {
    const dx = xs[c]! - s.kx[i]!;
    const dy = ys[c]! - s.ky[i]!;
    const d = dx * dx + dy * dy;
    const dOld = (xs[c]! - ox) ** 2 + (ys[c]! - oy) ** 2;
    // Clashes only change near the old or the new spot; far away the spacing test is skipped.
    if (d <= s.clash2 || dOld <= s.clash2) {
      const wasClash = s.spaced(xs[c]! - ox, ys[c]! - oy) ? 0 : 1;
      const isClash = s.spaced(dx, dy) ? 0 : 1;
      s.clash[c] = s.clash[c]! + isClash - wasClash;
    }
    if (s.near1[c] === i || s.near2[c] === i) recomputeNear(s, c);
    else if (d < s.d1[c]!) [s.near2[c], s.d2[c], s.near1[c], s.d1[c]] = [s.near1[c]!, s.d1[c]!, i, d];
    else if (d < s.d2[c]!) [s.near2[c], s.d2[c]] = [i, d];
  }
}
