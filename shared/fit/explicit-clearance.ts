import type { Process } from '../schemas/joint-options';
import { clearanceWarnings } from './clearance-warnings';
import { formatMm } from './format-mm';
import type { ClearanceResult } from './resolve-clearance';
import { roundTo } from './round-to';

/**
 * The result for a clearance the user set: it replaces the defaults, the material adjustment and the
 * calibration, and still gets the same warnings as a computed one.
 *
 * @param clearance - clearance per side in mm, 0 or more
 * @param fitWords - the fit in words, e.g. "snug fit in PETG on FDM" (for the derivation)
 * @param process - `'fdm'` or `'resin'` (sets which warnings apply)
 * @returns the clearance rounded to 0.001 mm, a one-step derivation and the warnings
 * @throws RangeError for a clearance that is negative or not finite
 * @example
 * explicitClearance(0.2, 'snug fit in PLA on FDM', 'fdm').derivation;
 * // "0.2 mm: set explicitly, in place of the defaults for a snug fit in PLA on FDM"
 */
export function explicitClearance(clearance: number, fitWords: string, process: Process): ClearanceResult {
  if (!Number.isFinite(clearance) || clearance < 0) {
    throw new RangeError(`clearance must be a finite number of mm per side, 0 or more; got ${clearance}`);
  }
  const clearancePerSide = roundTo(clearance, 3);
  return {
    clearancePerSide,
    derivation: `${formatMm(clearancePerSide)}: set explicitly, in place of the defaults for a ${fitWords}`,
    steps: [{ label: 'set explicitly', mm: clearancePerSide, source: 'your input' }],
    warnings: clearanceWarnings(clearancePerSide, process),
  };
}
