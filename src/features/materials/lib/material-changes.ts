import type {
  ParsedTeamMaterialInput,
  TeamMaterial,
  TeamMaterialInput,
  TeamMaterialPatch,
} from '../../../../shared/schemas/material';

/** The edit form's starting values: the material as the API answered it. */
export function materialFormValues(material: TeamMaterial): TeamMaterialInput {
  const a = material.clearanceAdjustments;
  return {
    name: material.name,
    baseMaterial: material.baseMaterial,
    shrinkagePercent: material.shrinkagePercent,
    clearanceAdjustments: { press: a.press ?? 0, snug: a.snug ?? 0, slide: a.slide ?? 0 },
    notes: material.notes,
  };
}

/**
 * The PATCH body for an edited material: only the fields whose parsed value differs from the material as
 * loaded, so an edit does not overwrite someone else's change to another field — down to each fit class's
 * clearance adjustment (the server keeps the fit classes a patch does not name).
 *
 * @returns the changed fields; an empty object when nothing changed
 */
export function materialChanges(material: TeamMaterial, values: ParsedTeamMaterialInput): TeamMaterialPatch {
  const before = materialFormValues(material);
  const patch: TeamMaterialPatch = {};
  if (values.name !== before.name) patch.name = values.name;
  if (values.baseMaterial !== before.baseMaterial) patch.baseMaterial = values.baseMaterial;
  if (values.shrinkagePercent !== before.shrinkagePercent) patch.shrinkagePercent = values.shrinkagePercent;
  const adjustments = (['press', 'snug', 'slide'] as const).filter(
    (fit) => values.clearanceAdjustments[fit] !== before.clearanceAdjustments?.[fit],
  );
  if (adjustments.length > 0) {
    patch.clearanceAdjustments = Object.fromEntries(adjustments.map((fit) => [fit, values.clearanceAdjustments[fit]]));
  }
  if (values.notes !== before.notes) patch.notes = values.notes;
  return patch;
}
