import { boundaryPoints } from './boundary-points';
import { climbWall } from './climb-wall';
import { evaluateLevel } from './evaluate-level';
import { gridLevel, type GridLevel } from './grid-level';
import type { KeyRegion } from './key-region';
import { LAYOUT_EPS_MM } from './layout-tolerance';
import { pointSet, type PointSet } from './point-set';
import { refineCells } from './refine-cells';

/** Nodes on the first, uniform grid. */
const FIRST_LEVEL_NODES = 4096;
/** Refine adaptively when fewer first-grid nodes than this fit. */
const ENOUGH_VALID = 1024;
/** Wall evaluations the adaptive refinement may spend. */
const REFINE_BUDGET = 8192;
/** Most candidates handed on (a deterministic stride thins a larger set). */
const MAX_CANDIDATES = 5000;

/** Where pockets fit on a face, as a finite, deterministic set of candidate centres. */
export type CandidateSearch = {
  /** Centres where a pocket fits (mm). */
  readonly points: PointSet;
  /** The wall at each of those centres (mm). */
  readonly walls: Float64Array;
  /** The thickest wall found anywhere (mm), for the message when nothing fits. */
  readonly bestWall: number;
  /** Half-diagonal of a first-grid cell (mm): every fitting spot the grid resolved is this close to a candidate. */
  readonly reach: number;
};

/**
 * Finds candidate pocket centres: a uniform grid over the box of possible centres, points
 * bisected onto the edge of the region where pockets fit, and, when the grid resolves that region
 * poorly, adaptive refinement around the most promising cells. At most about 19,000 wall
 * evaluations and 5,000 candidates, whatever the face. A region thinner than the refinement can
 * resolve within that budget may be missed; the result is then a (numbered) "does not fit".
 *
 * @param region - the layout problem
 * @returns the candidates (empty when no pocket fits anywhere that was searched)
 * @example
 * searchCandidates(region).points.n; // e.g. 4096 on a rectangular face
 */
export function searchCandidates(region: KeyRegion): CandidateSearch {
  const level = firstLevel(region);
  const least = region.margin - LAYOUT_EPS_MM;
  const reach = Math.sqrt(level.stepX ** 2 + level.stepY ** 2) / 2;
  const fitting = level.wall.filter((w) => w >= least).length;
  const cells = refineCells(region, level, fitting >= ENOUGH_VALID ? 0 : REFINE_BUDGET);
  const fit = cells.wall.flatMap((w, i) => (w >= least ? [i] : []));
  const edge = boundaryPoints(region, level);
  // Thin a large set evenly (every stride-th cell), keeping all the edge points.
  const stride = Math.max(1, Math.ceil(fit.length / (MAX_CANDIDATES - edge.xs.length)));
  const kept = fit.filter((_, n) => n % stride === 0);
  const xs = [...kept.map((i) => cells.x[i]!), ...edge.xs];
  const ys = [...kept.map((i) => cells.y[i]!), ...edge.ys];
  const walls = [...kept.map((i) => cells.wall[i]!), ...edge.walls];
  let best = { x: 0, y: 0, wall: -Infinity };
  cells.wall.forEach((w, i) => {
    if (w > best.wall) best = { x: cells.x[i]!, y: cells.y[i]!, wall: w };
  });
  if (xs.length === 0 && best.wall > -Infinity) {
    // Room thinner than the finest cells: climb from the best sample towards a spot that fits.
    best = climbWall(region.wall, best.x, best.y, Math.max(reach, 1e-3), region.margin);
    if (best.wall >= least) [xs[0], ys[0], walls[0]] = [best.x, best.y, best.wall];
  }
  return { points: pointSet(xs, ys), walls: Float64Array.from(walls), bestWall: best.wall, reach };
}

function firstLevel(region: KeyRegion): GridLevel {
  const { minX, minY, maxX, maxY } = region.bounds;
  const w = maxX - minX;
  const h = maxY - minY;
  let nx = 1;
  let ny = 1;
  if (w > 1e-6 && h > 1e-6) {
    // Square-ish cells: split the node budget in proportion to the sides.
    nx = Math.min(FIRST_LEVEL_NODES / 2, Math.max(2, Math.round(Math.sqrt((FIRST_LEVEL_NODES * w) / h))));
    ny = Math.max(2, Math.floor(FIRST_LEVEL_NODES / nx));
  } else if (w > 1e-6) {
    nx = FIRST_LEVEL_NODES;
  } else if (h > 1e-6) {
    ny = FIRST_LEVEL_NODES;
  }
  const level = gridLevel(region.bounds, nx, ny);
  evaluateLevel(level, region);
  return level;
}
