import type { Material } from '../schemas/joint-options';
import type { WordedStep } from './default-clearance-steps';
import { formatMm } from './format-mm';
import { materialAdjustments } from './material-adjustments';

/** A team material's tuning: its name and its clearance adjustment in mm per side (may be negative). */
export interface MaterialTuningInput {
  readonly name: string;
  readonly clearanceAdjustment: number;
}

/**
 * The material's step of a clearance derivation. A team material (`tuning`) replaces the built-in material's
 * adjustment and is always named, even at 0 mm, so the derivation says which material was used; a built-in
 * material is named only when its adjustment is not 0.
 *
 * @param material - the built-in material (the team material's base)
 * @param tuning - the team material chosen, if any; its `clearanceAdjustment` in mm per side
 * @returns the step with its words, or null when there is nothing to say
 * @throws RangeError for an unknown material, or a tuning adjustment that is not finite
 * @example
 * materialStep('PLA', { name: 'Grey matte PLA', clearanceAdjustment: 0.03 })?.words;
 * // "+0.03 mm for Grey matte PLA (a team material based on PLA)"
 */
export function materialStep(material: Material, tuning?: MaterialTuningInput): WordedStep | null {
  const adjustment = materialAdjustments[material];
  // The types already rule this out; the check is for callers that skipped the schema.
  if (!adjustment) throw new RangeError(`unknown material ${material}`);
  if (tuning) {
    const mm = tuning.clearanceAdjustment;
    if (!Number.isFinite(mm)) {
      throw new RangeError(`the clearance adjustment of ${tuning.name} must be a finite number of mm; got ${mm}`);
    }
    const label = `for ${tuning.name} (a team material based on ${material})`;
    return {
      step: { label, mm, source: `the team’s own adjustment for ${tuning.name}, in place of ${material}’s` },
      words: `${formatMm(mm, true)} ${label}`,
    };
  }
  if (adjustment.mm === 0) return null;
  return {
    step: { label: `for ${material}`, mm: adjustment.mm, source: adjustment.source },
    words: `${formatMm(adjustment.mm, true)} for ${material}`,
  };
}
