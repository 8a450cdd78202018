import { z } from 'zod';
import { personSchema } from './library-fields';
import { presetSchema } from './preset';

/**
 * One saved version of a preset: who saved it, when, what changed in plain words ("key width 10 → 12 mm"),
 * and, for a restore, which version it brought back. Versions count from 1 and are never changed.
 */
export const presetVersionSummarySchema = z.object({
  version: z.number().int(),
  createdAt: z.string(),
  author: personSchema,
  changes: z.array(z.string()),
  restoredFrom: z.number().int().nullable(),
});
export type PresetVersionSummary = z.infer<typeof presetVersionSummarySchema>;

/** `GET …/presets/:presetId/versions` reply, newest first. */
export const presetVersionListSchema = z.object({ items: z.array(presetVersionSummarySchema) });
export type PresetVersionList = z.infer<typeof presetVersionListSchema>;

/** `GET …/presets/:presetId/versions/:version` reply: the preset exactly as it was saved then. */
export const presetVersionSchema = presetVersionSummarySchema.extend(
  presetSchema.pick({
    name: true,
    description: true,
    tags: true,
    printerProfileId: true,
    schemaVersion: true,
    settings: true,
  }).shape,
);
export type PresetVersion = z.infer<typeof presetVersionSchema>;
