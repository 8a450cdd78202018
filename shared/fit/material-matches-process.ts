import type { Material, Process } from '../schemas/joint-options';
import { defaultProcessFor } from './default-process-for';

/**
 * Whether a material can be printed with a process: resin materials only on a resin printer, filaments
 * only on FDM. A schema refinement can use it to reject "PLA on resin" before any computation.
 *
 * @param material - a built-in material
 * @param process - `'fdm'` or `'resin'`
 * @returns true when they go together
 * @example
 * materialMatchesProcess('PLA', 'fdm'); // true
 * materialMatchesProcess('resin-standard', 'fdm'); // false
 */
export function materialMatchesProcess(material: Material, process: Process): boolean {
  return defaultProcessFor(material) === process;
}
