import type { CalibrationEntry } from '../../../shared/schemas/printer-profile';
import type { FitTestResults } from '../../../shared/schemas/fit-test';
import type { Material } from '../../../shared/schemas/joint-options';

/**
 * The profile's calibration table with a fit test's results written in: each class the test measured
 * replaces that material's entry for the class; a class it did not measure keeps its older entry, since a
 * coupon that missed the slide range says nothing new about sliding.
 */
export function mergeCalibration(
  current: readonly CalibrationEntry[],
  material: Material,
  results: FitTestResults,
  measuredOn: string,
  source: string,
): CalibrationEntry[] {
  const measured = (['press', 'snug', 'slide'] as const).filter((fit) => results[fit] !== undefined);
  const kept = current.filter((e) => e.material !== material || !measured.includes(e.fit));
  const added = measured.map((fit) => ({ material, fit, offsetMm: results[fit]!.offsetMm, measuredOn, source }));
  return [...kept, ...added];
}
