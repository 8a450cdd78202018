import type { GridLevel } from './grid-level';
import type { KeyRegion } from './key-region';
import { LAYOUT_EPS_MM } from './layout-tolerance';

/** Most valid/invalid neighbour pairs refined; beyond this a deterministic stride picks them. */
const MAX_PAIRS = 512;
/** Bisection steps: the boundary is found to 1/1024 of a grid cell. */
const STEPS = 10;

/**
 * Points on the edge of the region where pockets fit, found by bisecting between each grid node
 * that fits and a neighbour that does not. Spread-out layouts sit on that edge, which a grid
 * alone only approximates (a round region, a slanted polygon side).
 *
 * @param region - the layout problem
 * @param level - the evaluated grid
 * @returns the points (mm) and their walls (mm), all of which fit
 * @example
 * boundaryPoints(region, level).xs.length; // up to 512
 */
export function boundaryPoints(region: KeyRegion, level: GridLevel): { xs: number[]; ys: number[]; walls: number[] } {
  const least = region.margin - LAYOUT_EPS_MM;
  const pairs = edgePairs(level, least);
  const out = { xs: [] as number[], ys: [] as number[], walls: [] as number[] };
  const node = (k: number): [number, number] => [level.xs[k % level.nx]!, level.ys[Math.floor(k / level.nx)]!];
  const stride = Math.max(1, Math.ceil(pairs.length / 2 / MAX_PAIRS));
  for (let p = 0; p < pairs.length; p += 2 * stride) {
    const found = bisect(region, least, node(pairs[p]!), node(pairs[p + 1]!));
    if (!found) continue;
    out.xs.push(found[0]);
    out.ys.push(found[1]);
    out.walls.push(found[2]);
  }
  return out;
}

/** Flat list of (node that fits, neighbour that does not) index pairs, in grid order. */
function edgePairs(level: GridLevel, least: number): number[] {
  const { nx, ny } = level;
  const fits = (k: number) => level.wall[k]! >= least;
  const pairs: number[] = [];
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const k = j * nx + i;
      if (!fits(k)) continue;
      if (i > 0 && !fits(k - 1)) pairs.push(k, k - 1);
      if (i < nx - 1 && !fits(k + 1)) pairs.push(k, k + 1);
      if (j > 0 && !fits(k - nx)) pairs.push(k, k - nx);
      if (j < ny - 1 && !fits(k + nx)) pairs.push(k, k + nx);
    }
  }
  return pairs;
}

/** The last fitting point on the way from `inside` (fits) to `outside` (does not), with its wall. */
function bisect(region: KeyRegion, least: number, inside: [number, number], outside: [number, number]) {
  let [ax, ay] = inside;
  let [bx, by] = outside;
  let found: [number, number, number] | null = null;
  for (let s = 0; s < STEPS; s++) {
    const mx = (ax + bx) / 2;
    const my = (ay + by) / 2;
    const w = region.wall(mx, my);
    if (w >= least) {
      [ax, ay] = [mx, my];
      found = [mx, my, w];
    } else {
      [bx, by] = [mx, my];
    }
  }
  return found;
}
