import { cleanFloat } from './clean-float';

/**
 * The clearance per side that a key printed at `scale` leaves in a pocket modelled at the key's nominal
 * width: c = (1 − s)·w/2. The inverse of `keyScaleForClearance`.
 *
 * @param width - nominal key width in mm, above 0
 * @param scale - print scale as a fraction, above 0 and at most 1 (0.99 for 99 %, not 99)
 * @returns clearance per side in mm
 * @throws RangeError with the numbers for a width or scale outside those bounds
 * @example
 * clearanceForKeyScale(10, 0.99); // 0.05 (a 10 mm key at 99 % is 9.9 mm: 0.05 mm each side)
 */
export function clearanceForKeyScale(width: number, scale: number): number {
  if (!Number.isFinite(width) || width <= 0) {
    throw new RangeError(`key width must be a finite number of mm above 0; got ${width}`);
  }
  if (!Number.isFinite(scale) || scale <= 0 || scale > 1) {
    throw new RangeError(
      `key scale must be a fraction above 0 and at most 1 (0.99 for 99 %); got ${scale}` +
        (scale > 1 ? ': a key larger than its pocket has no clearance' : ''),
    );
  }
  // cleanFloat: (1 − 0.99) is 0.010000000000000009 in binary; the user asked for exactly 99 %.
  return cleanFloat(((1 - scale) * width) / 2);
}
