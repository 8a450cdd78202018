import type { FitClass, Material } from '../schemas/joint-options';
import { calibrationSourceWords, type PrinterProfile } from '../schemas/printer-profile';

/** The calibration a printer profile gives one material and fit class: the offset and whose it is. */
export interface ProfileCalibration {
  /** mm per side, added to the fit engine's default. */
  readonly offsetMm: number;
  /** Words the fit derivation repeats, naming the profile and the entry (≤ 200 characters, as the kit request allows). */
  readonly source: string;
}

/**
 * The profile's calibration entry for a material and fit class, in the form the kit request carries it
 * (`calibrationOffset` and `calibrationSource`). The design screen's preview and the server's kit route both
 * use it, so the preview shows the clearance the downloaded kit will have.
 *
 * @returns the offset and its source, or null when the profile has no entry for that material and fit
 * @example
 * profileCalibration({ name: 'Bench FDM', calibration: [{ material: 'PLA', fit: 'snug', offsetMm: -0.03,
 *   measuredOn: '2026-01-12', source: 'entered by hand' }] }, 'PLA', 'snug')?.offsetMm; // -0.03
 */
export function profileCalibration(
  profile: Pick<PrinterProfile, 'name' | 'calibration'>,
  material: Material,
  fit: FitClass,
): ProfileCalibration | null {
  const entry = profile.calibration.find((e) => e.material === material && e.fit === fit);
  if (!entry) return null;
  return { offsetMm: entry.offsetMm, source: calibrationSourceWords(profile.name, entry).slice(0, 200) };
}
