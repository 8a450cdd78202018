import type { Material, Process } from '../schemas/joint-options';

/**
 * The process a material is printed with: resin materials (`resin-…`) on a resin printer, filaments on FDM.
 *
 * @param material - a built-in material
 * @returns `'resin'` for `resin-standard` and `resin-tough`, else `'fdm'`
 * @example
 * defaultProcessFor('PETG'); // 'fdm'
 * defaultProcessFor('resin-tough'); // 'resin'
 */
export function defaultProcessFor(material: Material): Process {
  return material.startsWith('resin-') ? 'resin' : 'fdm';
}
