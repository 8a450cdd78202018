import type { GridLevel } from './grid-level';
import type { KeyRegion } from './key-region';
import { LAYOUT_EPS_MM } from './layout-tolerance';

/** Cells (centre, half width, half height, wall at the centre) as parallel lists, in mm. */
export type CellSet = { x: number[]; y: number[]; hx: number[]; hy: number[]; wall: number[] };

/** Stop densifying cells that fit once this many do. */
const ENOUGH_VALID = 1024;
/** Cells split per round, highest wall first. */
const BATCH = 256;
/** Cells smaller than this (half-diagonal, mm) are not split further. */
const MIN_REACH_MM = 1e-6;

/**
 * Adaptive refinement for regions the first grid barely resolves (thin arms, small pockets of
 * room): each round splits the most promising cells (thickest wall first) into 3 × 3, keeping
 * the parent's sample as the middle child. A cell is worth splitting only while its wall plus
 * its half-diagonal could still reach the margin (the wall moves by at most the distance moved).
 * Stops once 1,024 cells fit, or the budget is spent.
 *
 * @param region - the layout problem
 * @param level - the evaluated first grid; one cell per node
 * @param budget - most wall evaluations to spend
 * @returns every cell after refinement (the first nx × ny keep their grid order)
 * @example
 * const cells = refineCells(region, level, 8000); // cells.x.length ≥ level.nx * level.ny
 */
export function refineCells(region: KeyRegion, level: GridLevel, budget: number): CellSet {
  const cells = cellsOf(level);
  const least = region.margin - LAYOUT_EPS_MM;
  const reach = (i: number) => Math.sqrt(cells.hx[i]! ** 2 + cells.hy[i]! ** 2);
  let valid = cells.wall.filter((w) => w >= least).length;
  let spent = 0;
  while (spent < budget && valid < ENOUGH_VALID) {
    const open: number[] = [];
    for (let i = 0; i < cells.x.length; i++) {
      const r = reach(i);
      if (r > MIN_REACH_MM && cells.wall[i]! + r >= least) open.push(i);
    }
    open.sort((p, q) => cells.wall[q]! - cells.wall[p]! || p - q);
    const take = Math.min(open.length, BATCH, Math.floor((budget - spent) / 8));
    if (take === 0) break;
    for (let t = 0; t < take; t++) {
      const added = splitCell(region, cells, open[t]!);
      spent += added.evaluated;
      valid += added.valid;
    }
  }
  return cells;
}

function cellsOf(level: GridLevel): CellSet {
  const cells: CellSet = { x: [], y: [], hx: [], hy: [], wall: [] };
  for (let k = 0; k < level.wall.length; k++) {
    cells.x.push(level.xs[k % level.nx]!);
    cells.y.push(level.ys[Math.floor(k / level.nx)]!);
    cells.hx.push(level.stepX / 2);
    cells.hy.push(level.stepY / 2);
    cells.wall.push(level.wall[k]!);
  }
  return cells;
}

/** Splits cell i into 3 × 3 (3 × 1 or 1 × 3 when it has no width or height). */
function splitCell(region: KeyRegion, cells: CellSet, i: number): { evaluated: number; valid: number } {
  const least = region.margin - LAYOUT_EPS_MM;
  const hx = cells.hx[i]! / 3;
  const hy = cells.hy[i]! / 3;
  cells.hx[i] = hx;
  cells.hy[i] = hy;
  let evaluated = 0;
  let valid = 0;
  for (const sy of hy > 0 ? [-2, 0, 2] : [0]) {
    for (const sx of hx > 0 ? [-2, 0, 2] : [0]) {
      if (sx === 0 && sy === 0) continue;
      const x = cells.x[i]! + sx * hx;
      const y = cells.y[i]! + sy * hy;
      const w = region.wall(x, y);
      cells.x.push(x);
      cells.y.push(y);
      cells.hx.push(hx);
      cells.hy.push(hy);
      cells.wall.push(w);
      evaluated++;
      if (w >= least) valid++;
    }
  }
  return { evaluated, valid };
}
