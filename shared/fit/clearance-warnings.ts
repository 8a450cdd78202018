import type { Process } from '../schemas/joint-options';
import { formatMm } from './format-mm';
import { FDM_MIN_RELIABLE_CLEARANCE_MM, MAX_RELIABLE_CLEARANCE_MM } from './reliable-clearance';

/**
 * Warnings for a clearance per side that does not print reliably: 0 or less (no gap at all), below 0.05 mm
 * on FDM, above 0.5 mm on any process.
 *
 * @param clearance - clearance per side in mm, already rounded
 * @param process - `'fdm'` or `'resin'`
 * @returns the warnings in plain words with the numbers; empty when the clearance is fine
 * @example
 * clearanceWarnings(0.03, 'fdm'); // ["0.03 mm per side is below 0.05 mm, the least FDM prints reliably: …"]
 */
export function clearanceWarnings(clearance: number, process: Process): string[] {
  if (clearance <= 0) {
    return [
      `${formatMm(clearance)} per side leaves no gap at all: the parts will go together only with force, if at all`,
    ];
  }
  if (process === 'fdm' && clearance < FDM_MIN_RELIABLE_CLEARANCE_MM) {
    return [
      `${formatMm(clearance)} per side is below ${FDM_MIN_RELIABLE_CLEARANCE_MM} mm, the least FDM prints reliably: ` +
        'the parts may not go together; print a fit test first',
    ];
  }
  if (clearance > MAX_RELIABLE_CLEARANCE_MM) {
    return [
      `${formatMm(clearance)} per side is above ${MAX_RELIABLE_CLEARANCE_MM} mm: ` +
        'the joint will be loose and will not hold the halves in line',
    ];
  }
  return [];
}
