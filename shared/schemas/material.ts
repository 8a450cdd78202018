import { z } from 'zod';
import { fitClassSchema, materialSchema, processSchema } from './joint-options';
import { libraryNameSchema, notesSchema, personSchema } from './library-fields';
import { listQueryFields, pageOf } from './library-list';
import { mmField } from './kit-number-fields';

/**
 * A material of the built-in catalogue, read-only: its process, default shrinkage and clearance
 * adjustment, each with where the number comes from (shared/fit/shrinkage-defaults.ts and
 * material-adjustments.ts).
 */
export const builtInMaterialSchema = z.object({
  id: materialSchema,
  process: processSchema,
  shrinkagePercent: z.number(),
  shrinkageSource: z.string(),
  clearanceAdjustmentMm: z.number(),
  clearanceAdjustmentSource: z.string(),
});
export type BuiltInMaterial = z.infer<typeof builtInMaterialSchema>;

/** `GET /api/teams/:teamId/materials/catalogue` reply. */
export const materialCatalogueSchema = z.object({ items: z.array(builtInMaterialSchema) });

const adjustmentField = (fit: string) => mmField(`${fit} clearance adjustment`, { min: -0.5, max: 0.5 });
const adjustment = (fit: string) => adjustmentField(fit).default(0);

/** Per fit class, mm per side added to the clearance for this material (may be negative). */
export const clearanceAdjustmentsSchema = z.object({
  press: adjustment('press'),
  snug: adjustment('snug'),
  slide: adjustment('slide'),
});
export type ClearanceAdjustments = z.output<typeof clearanceAdjustmentsSchema>;

/**
 * `POST /api/teams/:teamId/materials` body: a team material — a named variant of a built-in base material
 * (a particular spool or resin the studio uses), with its own linear shrinkage in percent (0–5, default the
 * base's) and clearance adjustments per fit class in mm per side (±0.5, default 0).
 *
 * @example
 * teamMaterialInputSchema.parse({ name: 'Grey matte PLA', baseMaterial: 'PLA', shrinkagePercent: 0.3 });
 */
export const teamMaterialInputSchema = z.object({
  name: libraryNameSchema,
  baseMaterial: materialSchema,
  shrinkagePercent: mmField('shrinkage', { min: 0, max: 5 }, '%').nullable().default(null),
  clearanceAdjustments: clearanceAdjustmentsSchema.default({ press: 0, snug: 0, slide: 0 }),
  notes: notesSchema.default(''),
});
export type TeamMaterialInput = z.input<typeof teamMaterialInputSchema>;
export type ParsedTeamMaterialInput = z.output<typeof teamMaterialInputSchema>;

/** A change of some fit classes' adjustments; the others keep theirs. */
const clearanceAdjustmentsPatchSchema = z.object({
  press: adjustmentField('press').optional(),
  snug: adjustmentField('snug').optional(),
  slide: adjustmentField('slide').optional(),
});

/** `PATCH …/materials/:materialId` body: any of the fields; `clearanceAdjustments` may name some fit classes only. */
export const teamMaterialPatchSchema = z.object({
  name: libraryNameSchema.optional(),
  baseMaterial: materialSchema.optional(),
  shrinkagePercent: mmField('shrinkage', { min: 0, max: 5 }, '%').nullable().optional(),
  clearanceAdjustments: clearanceAdjustmentsPatchSchema.optional(),
  notes: notesSchema.optional(),
});
export type TeamMaterialPatch = z.input<typeof teamMaterialPatchSchema>;

/** A team material as the API answers it; `shrinkagePercent` null means "the base material's default". */
export const teamMaterialSchema = z.object({
  id: z.string(),
  name: z.string(),
  baseMaterial: materialSchema,
  process: processSchema,
  shrinkagePercent: z.number().nullable(),
  clearanceAdjustments: z.record(fitClassSchema, z.number()),
  notes: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
  updatedBy: personSchema,
});
export type TeamMaterial = z.infer<typeof teamMaterialSchema>;

/** `GET /api/teams/:teamId/materials` query. */
export const teamMaterialListQuerySchema = z.object({
  ...listQueryFields(['name', 'updatedAt', 'createdAt']),
  base: z.preprocess((v) => (v === '' ? undefined : v), materialSchema.optional()),
});
export type TeamMaterialListQuery = z.input<typeof teamMaterialListQuerySchema>;

/** `GET /api/teams/:teamId/materials` reply. */
export const teamMaterialPageSchema = pageOf(teamMaterialSchema);
export type TeamMaterialPage = z.infer<typeof teamMaterialPageSchema>;
