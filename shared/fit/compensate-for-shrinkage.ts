import { roundTo } from './round-to';

/**
 * The size to model so that the part is `size` after it shrinks by `shrinkagePercent`: S / (1 − s).
 * Dividing, not multiplying by (1 + s): the shrinkage is a fraction of the modelled size, not of the target.
 *
 * @param size - wanted size after printing, in mm
 * @param shrinkagePercent - linear shrinkage in percent (0.5 for 0.5 %); below 100, negative for growth
 * @returns the size to model, in mm, rounded to 0.001 mm
 * @throws RangeError for a size or percentage that is not finite, or a percentage of 100 or more
 * @example
 * compensateForShrinkage(100, 0.5); // 100.503
 */
export function compensateForShrinkage(size: number, shrinkagePercent: number): number {
  if (!Number.isFinite(size)) throw new RangeError(`size must be a finite number of mm; got ${size}`);
  if (!Number.isFinite(shrinkagePercent) || shrinkagePercent >= 100 || shrinkagePercent <= -100) {
    throw new RangeError(`shrinkage must be a percentage between −100 and 100; got ${shrinkagePercent}`);
  }
  return roundTo(size / (1 - shrinkagePercent / 100), 3);
}
