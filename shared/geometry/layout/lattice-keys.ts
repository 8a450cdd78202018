import { candidateBuckets } from './candidate-buckets';
import type { Bounds } from './footprint';
import type { KeyRegion } from './key-region';
import { LAYOUT_EPS_MM } from './layout-tolerance';
import { pointSet, type PointSet } from './point-set';
import type { CandidateSearch } from './search-candidates';

/** A lattice with rows along x: u = (ux, 0), v = (vx, vy); `transposed` swaps x and y. */
type Basis = { ux: number; vx: number; vy: number; transposed: boolean };

/**
 * Phase shifts tried, as fractions of the lattice vectors: 16 from the low corner of the box
 * (best for rectangular room), 4 from its centre (a point, or a 2 × 2 block, in the middle: best
 * for round room).
 */
const CORNER_PHASES = [0, 0.25, 0.5, 0.75];
const CENTRE_PHASES = [0, 0.5];
/** Work caps: lattice points visited per basis and phase, and wall evaluations overall. */
const MAX_VISITS = 100_000;
const MAX_EVALS = 20_000;

/**
 * Packs pockets on regular lattices at the tightest legal pitch (pocket + margin): square and
 * staggered rows for rectangles, square and hexagonal for circles, each at 20 phase shifts.
 * Returns the lattice that fits the most pockets (the first one reaching `want` wins; ties go to
 * the earlier lattice). Farthest-point selection spreads keys well but packs loosely; this is the
 * dense answer to "as many as fit". Every pair of lattice points keeps the margin by construction.
 *
 * Lattice points are only tested near the search's candidates (within its grid's reach), which
 * keeps the work small on faces where pockets fit in a small part of a large outline.
 *
 * @param region - the layout problem
 * @param search - the candidate centres (at least one)
 * @param want - stop once a lattice holds this many
 * @returns the best lattice's fitting points (mm)
 * @example
 * latticeKeys(region, search, 64).n; // 20 for 10.4 mm pockets, 3 mm walls, an 80 × 60 face
 */
export function latticeKeys(region: KeyRegion, search: CandidateSearch, want: number): PointSet {
  let best = pointSet([], []);
  const buckets = candidateBuckets(search.points, Math.max(search.reach, 1e-6));
  const b = region.bounds;
  const box: Bounds = {
    minX: Math.max(b.minX, buckets.box.minX),
    minY: Math.max(b.minY, buckets.box.minY),
    maxX: Math.min(b.maxX, buckets.box.maxX),
    maxY: Math.min(b.maxY, buckets.box.maxY),
  };
  const near = { box, test: buckets.near, evals: MAX_EVALS };
  const corner: [number, number] = [box.minX, box.minY];
  const centre: [number, number] = [(box.minX + box.maxX) / 2, (box.minY + box.maxY) / 2];
  for (const basis of latticeBases(region)) {
    for (const [anchor, phases] of [
      [corner, CORNER_PHASES],
      [centre, CENTRE_PHASES],
    ] as const) {
      for (const s of phases) {
        for (const t of phases) {
          const origin: [number, number] = basis.transposed ? [anchor[1], anchor[0]] : [anchor[0], anchor[1]];
          const found = fillLattice(region, near, basis, origin, s, t, want);
          if (found.n > best.n) best = found;
          if (best.n >= want) return best;
        }
      }
    }
  }
  return best;
}

function latticeBases(region: KeyRegion): Basis[] {
  const fp = region.footprint;
  const m = region.margin;
  if (fp.kind === 'rect') {
    const px = fp.width + m;
    const py = fp.height + m;
    return [
      { ux: px, vx: 0, vy: py, transposed: false },
      { ux: px, vx: px / 2, vy: py, transposed: false },
      { ux: py, vx: py / 2, vy: px, transposed: true },
    ];
  }
  const d = fp.diameter + m;
  const row = (d * Math.sqrt(3)) / 2;
  return [
    { ux: d, vx: 0, vy: d, transposed: false },
    { ux: d, vx: d / 2, vy: row, transposed: false },
    { ux: d, vx: d / 2, vy: row, transposed: true },
  ];
}

/** Where lattice points are worth testing, and the wall evaluations left for all lattices. */
type Near = { box: Bounds; test: (x: number, y: number) => boolean; evals: number };

/** The lattice points origin + (s + i)·u + (t + j)·v inside the box that pass `near` and fit. */
function fillLattice(
  region: KeyRegion,
  near: Near,
  basis: Basis,
  origin: [number, number],
  s: number,
  t: number,
  want: number,
): PointSet {
  const b = near.box;
  const [lox, hix, loy, hiy] = basis.transposed ? [b.minY, b.maxY, b.minX, b.maxX] : [b.minX, b.maxX, b.minY, b.maxY];
  const { ux, vx, vy } = basis;
  const xs: number[] = [];
  const ys: number[] = [];
  let visits = 0;
  const firstRow = Math.ceil((loy - LAYOUT_EPS_MM - origin[1]) / vy - t);
  for (let j = firstRow; origin[1] + (t + j) * vy <= hiy + LAYOUT_EPS_MM; j++) {
    const v = origin[1] + (t + j) * vy;
    // Row start: the phase point shifted by whole steps to the first one inside the box.
    const raw = origin[0] + s * ux + (t + j) * vx;
    const first = raw - Math.floor((raw - lox + LAYOUT_EPS_MM) / ux) * ux;
    for (let i = 0; first + i * ux <= hix + LAYOUT_EPS_MM; i++) {
      const u = first + i * ux;
      if (++visits > MAX_VISITS || xs.length >= want) return pointSet(xs, ys);
      const [x, y] = basis.transposed ? [v, u] : [u, v];
      if (near.evals <= 0 || !near.test(x, y)) continue;
      near.evals--;
      if (region.fits(x, y)) {
        xs.push(x);
        ys.push(y);
      }
    }
  }
  return pointSet(xs, ys);
}
