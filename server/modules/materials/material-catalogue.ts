import { defaultProcessFor } from '../../../shared/fit/default-process-for';
import { materialAdjustments } from '../../../shared/fit/material-adjustments';
import { shrinkageDefaults } from '../../../shared/fit/shrinkage-defaults';
import { materialSchema } from '../../../shared/schemas/joint-options';
import type { BuiltInMaterial } from '../../../shared/schemas/material';

/**
 * The built-in materials with the fit engine's own numbers and their sources, read from shared/fit so the
 * catalogue can never disagree with what the engine uses.
 */
export function builtInMaterials(): BuiltInMaterial[] {
  return materialSchema.options.map((id) => ({
    id,
    process: defaultProcessFor(id),
    shrinkagePercent: shrinkageDefaults[id].percent,
    shrinkageSource: shrinkageDefaults[id].source,
    clearanceAdjustmentMm: materialAdjustments[id].mm,
    clearanceAdjustmentSource: materialAdjustments[id].source,
  }));
}
