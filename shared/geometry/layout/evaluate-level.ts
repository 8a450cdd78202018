import type { GridLevel } from './grid-level';
import type { KeyRegion } from './key-region';

/**
 * Evaluates the pocket wall at every node of a grid level.
 *
 * @param level - the level to fill (mutated: it was just allocated by the caller)
 * @param region - the layout problem
 * @example
 * evaluateLevel(gridLevel(region.bounds, 64, 64), region); // 4096 walls
 */
export function evaluateLevel(level: GridLevel, region: KeyRegion): void {
  for (let j = 0; j < level.ny; j++) {
    for (let i = 0; i < level.nx; i++) {
      const k = j * level.nx + i;
      level.wall[k] = region.wall(level.xs[i]!, level.ys[j]!);
    }
  }
}
