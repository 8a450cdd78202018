import type { FitClass, Material, Process } from '../schemas/joint-options';
import { materialMatchesProcess } from './material-matches-process';

const materialNames: Readonly<Record<Material, string>> = {
  PLA: 'PLA',
  PETG: 'PETG',
  ABS: 'ABS',
  ASA: 'ASA',
  PA: 'nylon (PA)',
  TPU: 'TPU',
  'resin-standard': 'standard resin',
  'resin-tough': 'tough resin',
};

/**
 * Names a fit in words for a derivation: fit class, material and process.
 *
 * @param fit - fit class
 * @param material - material
 * @param process - process; left out of the words when it goes without saying (resin in resin)
 * @returns e.g. "snug fit in PETG on FDM", "press fit in standard resin"
 * @example
 * describeFit('slide', 'PLA', 'fdm'); // "slide fit in PLA on FDM"
 */
export function describeFit(fit: FitClass, material: Material, process: Process): string {
  const where =
    process === 'resin' && materialMatchesProcess(material, process)
      ? ''
      : ` on ${process === 'fdm' ? 'FDM' : 'a resin printer'}`;
  return `${fit} fit in ${materialNames[material] ?? material}${where}`;
}
