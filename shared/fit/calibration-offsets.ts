import type { FitTestBest, FitTestResults } from '../schemas/fit-test';
import type { Material, Process } from '../schemas/joint-options';
import { formatMm } from './format-mm';
import { resolveClearance } from './resolve-clearance';
import { roundTo } from './round-to';

/** Largest calibration offset a printer profile stores, mm per side (the profile schema's bound). */
export const MAX_CALIBRATION_OFFSET_MM = 0.5;

/** The offsets a fit test gives, and why any of them cannot be stored (empty when all can). */
export interface CalibrationOffsets {
  results: FitTestResults;
  problems: string[];
}

/**
 * Turns a coupon's best clearances into calibration offsets: per fit class, the measured clearance minus
 * the published default for this process and material (what `resolveClearance` gives without an offset),
 * rounded to 0.001 mm. Applying the offset then gives back the measured clearance. An offset beyond
 * ±0.5 mm is refused rather than clamped: a printer that far off needs a look, not a silent cap.
 *
 * @param process - the printer profile's process
 * @param material - the coupon's material
 * @param best - best clearance per fit class (mm per side), from `deriveCalibration`
 * @returns per class {clearancePerSide, publishedDefault, offsetMm, mark}, and the offsets out of bounds in words
 * @example
 * calibrationOffsets('fdm', 'PLA', { snug: { clearancePerSide: 0.1, mark: '3' } });
 * // { results: { snug: { clearancePerSide: 0.1, publishedDefault: 0.16, offsetMm: -0.06, mark: '3' } }, problems: [] }
 */
export function calibrationOffsets(process: Process, material: Material, best: FitTestBest): CalibrationOffsets {
  const results: FitTestResults = {};
  const problems: string[] = [];
  for (const fit of ['press', 'snug', 'slide'] as const) {
    const hit = best[fit];
    if (!hit) continue;
    const publishedDefault = resolveClearance({ process, material, fit }).clearancePerSide;
    const offsetMm = roundTo(hit.clearancePerSide - publishedDefault, 3);
    if (Math.abs(offsetMm) > MAX_CALIBRATION_OFFSET_MM) {
      problems.push(
        `the ${fit} fit came out at ${formatMm(hit.clearancePerSide)} (pocket ${hit.mark}), ${formatMm(offsetMm, true)} from the published ${formatMm(publishedDefault)}; an offset beyond ±${MAX_CALIBRATION_OFFSET_MM} mm points at the printer or the reading: check the marks, the material and the slicer's scaling, and print the coupon again`,
      );
    }
    results[fit] = { clearancePerSide: hit.clearancePerSide, publishedDefault, offsetMm, mark: hit.mark };
  }
  return { results, problems };
}
