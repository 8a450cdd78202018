import { z } from 'zod';
import { fitClassSchema, materialSchema, processSchema } from './joint-options';
import { kitRequestSchema } from './kit-request';
import { personSchema, versionNumberSchema } from './library-fields';
import { listQueryFields, pageOf, queryId } from './library-list';

/**
 * `POST /api/teams/:teamId/kits` body: the full kit request, and optionally the preset it came from (its
 * current version unless `presetVersion` says which), the printer profile whose calibration the fit
 * engine should use (left out: the preset's printer profile; null: none), and the team material the kit is printed in
 * (`teamMaterialId`, default none): one of this team's materials whose base material is the request's
 * `material`; its clearance adjustment for the request's fit class replaces the built-in material's (the
 * server sets the request's `materialTuning` from it).
 */
export const recordKitSchema = z.object({
  request: kitRequestSchema,
  presetId: z
    .uuid({ error: () => 'presetId must be the id of a preset' })
    .nullable()
    .default(null),
  presetVersion: versionNumberSchema('presetVersion').nullable().default(null),
  // Left out: the preset's printer profile (if any). null: none, even when the preset names one.
  printerProfileId: z
    .uuid({ error: () => 'printerProfileId must be the id of a printer profile' })
    .nullable()
    .optional(),
  teamMaterialId: z
    .uuid({ error: () => 'teamMaterialId must be the id of a team material' })
    .nullable()
    .default(null),
});
export type RecordKitInput = z.input<typeof recordKitSchema>;
export type ParsedRecordKitInput = z.output<typeof recordKitSchema>;

/** One STL of a recorded kit: its name, size in bytes and SHA-256 (hex) at the time of the download. */
export const kitFileHashSchema = z.object({ name: z.string(), bytes: z.number().int(), sha256: z.string() });
export type KitFileHash = z.infer<typeof kitFileHashSchema>;

/** The manifest summary kept for a recorded kit (the full manifest is in the original zip). */
export const kitSummarySchema = z.object({
  joint: z.enum(['key', 'dovetail']),
  process: processSchema,
  material: materialSchema,
  fit: fitClassSchema,
  clearancePerSide: z.number(),
  keyScale: z.number().optional(),
  /** How the clearance was reached, naming the printer profile whose calibration was used. */
  derivation: z.string(),
  /**
   * The team material the kit was printed in, when one was chosen: its id (null when the request itself
   * carried the tuning), name and clearance adjustment in mm per side. Absent for kits without one.
   */
  teamMaterial: z.object({ id: z.string().nullable(), name: z.string(), clearanceAdjustment: z.number() }).optional(),
  warnings: z.array(z.string()),
  parts: z.array(
    z.object({
      file: z.string(),
      role: z.string(),
      half: z.enum(['A', 'B']).optional(),
      quantity: z.number().int(),
      triangles: z.number().int(),
      volumeMm3: z.number(),
    }),
  ),
});
export type KitSummary = z.infer<typeof kitSummarySchema>;

/** The calibration a recorded kit used: offset in mm per side and whose it was. */
export const kitCalibrationSchema = z.object({ offsetMm: z.number(), source: z.string() }).nullable();

/** A recorded kit as the history list shows it. */
export const kitHistoryItemSchema = z.object({
  id: z.string(),
  createdAt: z.string(),
  user: personSchema,
  presetId: z.string().nullable(),
  presetName: z.string().nullable(),
  presetVersion: z.number().int().nullable(),
  printerProfileId: z.string().nullable(),
  printerProfileName: z.string().nullable(),
  calibration: kitCalibrationSchema,
  fileName: z.string(),
  engineVersion: z.string(),
  summary: kitSummarySchema,
});
export type KitHistoryItem = z.infer<typeof kitHistoryItemSchema>;

/** `GET …/kits/:kitId` reply: the list row plus the full request and each STL's hash. */
export const kitHistoryEntrySchema = kitHistoryItemSchema.extend({
  request: z.record(z.string(), z.unknown()),
  files: z.array(kitFileHashSchema),
});
export type KitHistoryEntry = z.infer<typeof kitHistoryEntrySchema>;

/** `GET /api/teams/:teamId/kits` query: search (file, preset or printer name), filters, sort, paging. */
export const kitHistoryQuerySchema = z.object({
  ...listQueryFields(['createdAt', 'fileName']),
  joint: z.preprocess((v) => (v === '' ? undefined : v), z.enum(['key', 'dovetail']).optional()),
  material: z.preprocess((v) => (v === '' ? undefined : v), materialSchema.optional()),
  printer: queryId('printer'),
  preset: queryId('preset'),
  author: queryId('author'),
});
export type KitHistoryQuery = z.input<typeof kitHistoryQuerySchema>;

/** `GET /api/teams/:teamId/kits` reply. */
export const kitHistoryPageSchema = pageOf(kitHistoryItemSchema);
export type KitHistoryPage = z.infer<typeof kitHistoryPageSchema>;

/**
 * `GET …/kits/:kitId/check` reply: the kit rebuilt by this Seamwright compared file by file with the
 * recorded SHA-256 hashes. `identical` is true when every STL matches byte for byte; `message` says the
 * outcome in plain words; `original` is true when the original zip is kept and can be downloaded as well.
 */
export const kitCheckSchema = z.object({
  identical: z.boolean(),
  message: z.string(),
  recordedEngine: z.string(),
  currentEngine: z.string(),
  original: z.boolean(),
  files: z.array(
    z.object({
      name: z.string(),
      status: z.enum(['same', 'changed', 'missing', 'new']),
      recorded: z.string().nullable(),
      current: z.string().nullable(),
    }),
  ),
});
export type KitCheck = z.infer<typeof kitCheckSchema>;

/** `GET …/kits/:kitId/download` query: the kit rebuilt now ("current", default) or the original zip. */
export const kitDownloadQuerySchema = z.object({
  variant: z.preprocess(
    (v) => (v === '' ? undefined : v),
    z.enum(['current', 'original'], { error: () => 'variant must be "current" or "original"' }).default('current'),
  ),
});
