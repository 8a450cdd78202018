import { z } from 'zod';
import { libraryNameSchema, notesSchema, personSchema, tagsSchema, versionNumberSchema } from './library-fields';
import { listQueryFields, pageOf, queryId, queryText } from './library-list';
import { fitClassSchema, materialSchema } from './joint-options';
import { presetSettingsSchema, type PresetSettings, type PresetSettingsInput } from './preset-settings';

const printerProfileIdSchema = z
  .uuid({ error: () => 'printerProfileId must be the id of a printer profile' })
  .nullable();

/**
 * `POST /api/teams/:teamId/presets` body: `{"name", "description"?, "tags"?, "printerProfileId"?, "settings"}`,
 * settings being a kit request without its face (see `presetSettingsSchema`).
 *
 * @example
 * presetInputSchema.parse({ name: 'Helmet seam', settings: { joint: 'key', material: 'PLA', fit: 'snug',
 *   key: { shape: 'square', width: 10, depth: 8 } } });
 */
export const presetInputSchema = z.object({
  name: libraryNameSchema,
  description: notesSchema.default(''),
  tags: tagsSchema.default([]),
  printerProfileId: printerProfileIdSchema.default(null),
  settings: presetSettingsSchema,
});
/** A preset body as sent; `settings` typed as a kit request without its face. */
export type PresetInput = Omit<z.input<typeof presetInputSchema>, 'settings'> & { settings: PresetSettingsInput };
export type ParsedPresetInput = z.output<typeof presetInputSchema>;

/**
 * `PATCH /api/teams/:teamId/presets/:presetId` body: `baseVersion` (the version the edit started from) and
 * any of the fields to change. A save based on an older version is refused with 409 and the current preset.
 */
export const presetPatchSchema = z.object({
  baseVersion: versionNumberSchema('baseVersion', 'baseVersion (the version this edit is based on) is required'),
  name: libraryNameSchema.optional(),
  description: notesSchema.optional(),
  tags: tagsSchema.optional(),
  printerProfileId: printerProfileIdSchema.optional(),
  settings: presetSettingsSchema.optional(),
});
export type PresetPatch = Omit<z.input<typeof presetPatchSchema>, 'settings'> & { settings?: PresetSettingsInput };

/** `POST …/presets/:presetId/versions/:version/restore` body: the version the restore is based on. */
export const presetRestoreSchema = presetPatchSchema.pick({ baseVersion: true });

/** `POST …/presets/:presetId/duplicate` body: the copy's name; default "<name> (copy)". */
export const presetDuplicateSchema = z.object({ name: libraryNameSchema.optional() });

/** A preset as every preset read answers it; `version` counts the saves, from 1. */
export const presetSchema = z.object({
  id: z.string(),
  teamId: z.string(),
  name: z.string(),
  description: z.string(),
  tags: z.array(z.string()),
  printerProfileId: z.string().nullable(),
  printerProfileName: z.string().nullable(),
  version: z.number().int(),
  schemaVersion: z.number().int(),
  settings: z.custom<PresetSettings>((v) => typeof v === 'object' && v !== null),
  archived: z.boolean(),
  createdAt: z.string(),
  createdBy: personSchema,
  updatedAt: z.string(),
  updatedBy: personSchema,
});
export type Preset = z.infer<typeof presetSchema>;

/** A preset as the list shows it: no full settings, but what the filters look at. */
export const presetSummarySchema = presetSchema.omit({ settings: true, teamId: true }).extend({
  joint: z.enum(['key', 'dovetail']),
  material: materialSchema,
  fit: fitClassSchema,
});
export type PresetSummary = z.infer<typeof presetSummarySchema>;

/** `GET /api/teams/:teamId/presets` query: search, filters, sort and paging. */
export const presetListQuerySchema = z.object({
  ...listQueryFields(['updatedAt', 'name', 'createdAt', 'version']),
  tag: queryText('tag', 32),
  joint: z.preprocess((v) => (v === '' ? undefined : v), z.enum(['key', 'dovetail']).optional()),
  material: z.preprocess((v) => (v === '' ? undefined : v), materialSchema.optional()),
  printer: queryId('printer'),
  author: queryId('author'),
  archived: z.preprocess(
    (v) => (v === '' ? undefined : v),
    z
      .enum(['active', 'archived', 'all'], { error: () => 'archived must be active, archived or all' })
      .default('active'),
  ),
});
export type PresetListQuery = z.input<typeof presetListQuerySchema>;
export type ParsedPresetListQuery = z.output<typeof presetListQuerySchema>;

/** `GET /api/teams/:teamId/presets` reply. */
export const presetPageSchema = pageOf(presetSummarySchema);
export type PresetPage = z.infer<typeof presetPageSchema>;

/** The 409 reply of a stale save: the usual error plus the preset as it is now. */
export const presetConflictSchema = z.object({
  error: z.object({ code: z.literal('CONFLICT'), message: z.string(), current: presetSchema }),
});
