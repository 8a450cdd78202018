import { z } from 'zod';

/** The `format` field of a presets file. */
export const PRESETS_FILE_FORMAT = 'seamwright-presets';
/** The layout of the file around the presets; each preset's settings carry their own schemaVersion. */
export const PRESETS_FILE_VERSION = 1;
/** Largest presets file accepted for import, in bytes (a preset is about 1 kB; 1 MiB holds hundreds). */
export const MAX_PRESETS_FILE_BYTES = 1024 * 1024;
/** Most presets one file may hold. */
export const MAX_PRESETS_PER_FILE = 500;

/**
 * One preset in a presets file. `settings` is checked after it has been upgraded from its `schemaVersion`,
 * so it is kept loose here; `printerProfile` names a printer profile of the importing team (matched by
 * name, case-insensitive).
 */
export const presetFileItemSchema = z.object({
  name: z.string({ error: () => 'name is required' }),
  description: z.string().optional(),
  tags: z.array(z.string()).optional(),
  printerProfile: z.string().nullable().optional(),
  schemaVersion: z.unknown(),
  settings: z.unknown(),
});
export type PresetFileItem = z.infer<typeof presetFileItemSchema>;

/**
 * Seamwright's presets file (`GET /api/teams/:teamId/presets/export`, read back by `…/presets/import`):
 *
 * ```json
 * { "format": "seamwright-presets", "formatVersion": 1, "exportedAt": "2026-02-01T10:00:00.000Z",
 *   "team": "Quillmoss Prop Studio",
 *   "presets": [{ "name": "Helmet crown seam", "description": "…", "tags": ["helmet"],
 *                 "printerProfile": "Bench FDM", "schemaVersion": 1,
 *                 "settings": { "joint": "key", "material": "PLA", "fit": "snug", "key": { … } } }] }
 * ```
 *
 * `settings` is a kit request without its face, as `presetSettingsSchema` reads it at that schemaVersion.
 * Items are kept loose here so that one broken preset is reported by itself; the import checks each.
 */
export const presetsFileSchema = z.object({
  format: z.literal(PRESETS_FILE_FORMAT, {
    error: () => `this is not a Seamwright presets file ("format" must be "${PRESETS_FILE_FORMAT}")`,
  }),
  formatVersion: z.literal(PRESETS_FILE_VERSION, {
    error: () =>
      `this presets file has a layout this Seamwright does not read (formatVersion must be ${PRESETS_FILE_VERSION})`,
  }),
  exportedAt: z.string().optional(),
  team: z.string().optional(),
  presets: z
    .array(z.unknown(), { error: () => '"presets" must be a list' })
    .max(MAX_PRESETS_PER_FILE, { error: () => `a presets file may hold at most ${MAX_PRESETS_PER_FILE} presets` }),
});
export type PresetsFile = z.infer<typeof presetsFileSchema>;

/** What the import did (or would have done) with one preset of the file. */
export const presetImportItemSchema = z.object({
  /** Position in the file's `presets` list, from 0. */
  index: z.number().int(),
  /** The name in the file ("" when it had none). */
  name: z.string(),
  outcome: z.enum(['added', 'renamed', 'refused']),
  /** The name it was saved under (differs from `name` when renamed); absent when refused. */
  savedAs: z.string().optional(),
  /** Why it was refused or renamed, in plain words. */
  reason: z.string().optional(),
  /** Other things worth knowing, e.g. a printer profile the team does not have. */
  notes: z.array(z.string()),
});
export type PresetImportItem = z.infer<typeof presetImportItemSchema>;

/**
 * The import report: one row per preset of the file. `written` is true when every preset passed and all were
 * saved in one transaction; when any was refused, nothing was written (the reply is then a 400 whose error
 * carries this report as `report`).
 */
export const presetImportReportSchema = z.object({
  written: z.boolean(),
  added: z.number().int(),
  renamed: z.number().int(),
  refused: z.number().int(),
  items: z.array(presetImportItemSchema),
});
export type PresetImportReport = z.infer<typeof presetImportReportSchema>;
