import { cleanFloat } from './clean-float';

/**
 * The scale at which to print a key so that it leaves `clearance` per side in a pocket modelled at the
 * key's nominal width: s = (w − 2c) / w (the "scale" strategy: pockets at nominal size, keys shrunk).
 *
 * @param width - nominal key width in mm, above 0
 * @param clearance - clearance per side in mm, 0 or more and less than half the width
 * @returns the scale as a fraction (0.99 means 99 %)
 * @throws RangeError with the numbers for a width or clearance outside those bounds
 * @example
 * keyScaleForClearance(10, 0.05); // 0.99
 */
export function keyScaleForClearance(width: number, clearance: number): number {
  if (!Number.isFinite(width) || width <= 0) {
    throw new RangeError(`key width must be a finite number of mm above 0; got ${width}`);
  }
  if (!Number.isFinite(clearance) || clearance < 0) {
    throw new RangeError(`clearance must be a finite number of mm per side, 0 or more; got ${clearance}`);
  }
  if (2 * clearance >= width) {
    throw new RangeError(
      `a clearance of ${clearance} mm per side leaves nothing of a ${width} mm key: it must be below ${width / 2} mm`,
    );
  }
  return cleanFloat((width - 2 * clearance) / width);
}
