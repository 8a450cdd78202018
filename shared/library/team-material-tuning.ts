import type { FitClass } from '../schemas/joint-options';
import type { MaterialTuning } from '../schemas/kit-request';
import type { TeamMaterial } from '../schemas/material';

/**
 * A team material's adjustment for one fit class, as the kit request carries it (`materialTuning`), which
 * replaces the base material's adjustment in the fit engine. The design screen's preview and the server's
 * kit route both use it, so the preview shows the clearance of the downloaded kit.
 *
 * @example
 * teamMaterialTuning({ name: 'Grey matte PLA', clearanceAdjustments: { press: 0, snug: 0.03, slide: 0.05 } }, 'snug');
 * // { name: 'Grey matte PLA', clearanceAdjustment: 0.03 }
 */
export function teamMaterialTuning(
  material: Pick<TeamMaterial, 'name' | 'clearanceAdjustments'>,
  fit: FitClass,
): MaterialTuning {
  // A stored material has all three fit classes (the schema defaults each to 0); 0 stays the fallback for a
  // row written before that default existed.
  return { name: material.name, clearanceAdjustment: material.clearanceAdjustments[fit] ?? 0 };
}
