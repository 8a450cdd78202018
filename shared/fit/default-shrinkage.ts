import type { Material } from '../schemas/joint-options';
import { shrinkageDefaults, type ShrinkageDefault } from './shrinkage-defaults';

/**
 * The editable default linear shrinkage for a material, marked "common practice": published figures
 * disagree by an order of magnitude (REFERENCES §7.1), so the user should replace it with a measured value.
 *
 * @param material - a built-in material
 * @returns `{ percent, source }`: shrinkage in percent and why that number
 * @throws RangeError for a material that is not built in
 * @example
 * defaultShrinkage('PLA'); // { percent: 0.2, source: 'common practice: about 0.2 % for PLA; …' }
 */
export function defaultShrinkage(material: Material): ShrinkageDefault {
  const found = shrinkageDefaults[material];
  // Types rule this out; the check is for callers that skipped the schema.
  if (!found) throw new RangeError(`unknown material ${material}`);
  return found;
}
