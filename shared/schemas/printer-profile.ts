import { z } from 'zod';
import { materialMatchesProcess } from '../fit/material-matches-process';
import { fitClassSchema, materialSchema, processSchema } from './joint-options';
import { libraryNameSchema, notesSchema, personSchema } from './library-fields';
import { listQueryFields, pageOf } from './library-list';
import { mmField } from './kit-number-fields';
import { plainText } from './plain-text';

/** Most calibration entries one profile keeps: 8 materials × 3 fit classes, with room to spare. */
export const MAX_CALIBRATION_ENTRIES = 48;

/**
 * One calibration entry: for this material and fit class, the clearance offset (mm per side, ±0.5, may be
 * negative) that this printer needs on top of the published default, the day it was measured (YYYY-MM-DD)
 * and where it came from ("entered by hand" now; a fit test later).
 *
 * @example
 * calibrationEntrySchema.parse({ material: 'PLA', fit: 'snug', offsetMm: -0.03, measuredOn: '2026-01-12' });
 */
export const calibrationEntrySchema = z.object({
  material: materialSchema,
  fit: fitClassSchema,
  offsetMm: mmField('calibration offset', { min: -0.5, max: 0.5 }),
  measuredOn: z.iso.date({ error: () => 'measuredOn must be a date such as 2026-01-12' }),
  source: plainText(
    z
      .string()
      .trim()
      .min(1, { error: () => 'Say where the offset came from.' })
      .max(200, { error: () => 'Use at most 200 characters for the source.' }),
    'source',
  ).default('entered by hand'),
});
export type CalibrationEntry = z.output<typeof calibrationEntrySchema>;
export type CalibrationEntryInput = z.input<typeof calibrationEntrySchema>;

const buildVolumeSchema = z.object({
  x: mmField('build volume x', { above: 0, max: 2000 }),
  y: mmField('build volume y', { above: 0, max: 2000 }),
  z: mmField('build volume z', { above: 0, max: 2000 }),
});

const profileFields = {
  name: libraryNameSchema,
  process: processSchema,
  buildVolume: buildVolumeSchema,
  nozzleDiameter: mmField('nozzle diameter', { min: 0.1, max: 2 }).nullable().default(null),
  layerHeight: mmField('layer height', { min: 0.005, max: 1 }),
  notes: notesSchema.default(''),
  calibration: z
    .array(calibrationEntrySchema)
    .max(MAX_CALIBRATION_ENTRIES, {
      error: () => `A profile keeps at most ${MAX_CALIBRATION_ENTRIES} calibration entries.`,
    })
    .default([]),
};

type ProfileShape = { process: 'fdm' | 'resin'; nozzleDiameter: number | null; calibration: CalibrationEntry[] };

function checkProfile(p: ProfileShape, ctx: z.RefinementCtx): void {
  if (p.process === 'fdm' && p.nozzleDiameter === null) {
    ctx.addIssue({
      code: 'custom',
      path: ['nozzleDiameter'],
      message: 'An FDM printer needs its nozzle diameter in mm (0.4 is common).',
    });
  }
  if (p.process === 'resin' && p.nozzleDiameter !== null) {
    ctx.addIssue({
      code: 'custom',
      path: ['nozzleDiameter'],
      message: 'A resin printer has no nozzle: leave the nozzle diameter empty.',
    });
  }
  const seen = new Set<string>();
  p.calibration.forEach((entry, i) => {
    const key = `${entry.material}/${entry.fit}`;
    if (seen.has(key)) {
      ctx.addIssue({
        code: 'custom',
        path: ['calibration', i, 'fit'],
        message: `${entry.material} ${entry.fit} is calibrated twice: keep one entry per material and fit.`,
      });
    }
    seen.add(key);
    if (!materialMatchesProcess(entry.material, p.process)) {
      ctx.addIssue({
        code: 'custom',
        path: ['calibration', i, 'material'],
        message: `${entry.material} is not printed on ${p.process === 'fdm' ? 'an FDM' : 'a resin'} printer.`,
      });
    }
  });
}

/**
 * `POST /api/teams/:teamId/printer-profiles` body. Lengths in mm: build volume x × y × z (0–2000), nozzle
 * diameter (FDM only, 0.1–2), layer height (0.005–1). The calibration table has one entry per material and
 * fit class, each material one this process prints.
 */
export const printerProfileInputSchema = z.object(profileFields).superRefine(checkProfile);
export type PrinterProfileInput = z.input<typeof printerProfileInputSchema>;
export type ParsedPrinterProfileInput = z.output<typeof printerProfileInputSchema>;

/** `PATCH …/printer-profiles/:profileId` body: any of the fields; the merged profile is checked as a whole. */
export const printerProfilePatchSchema = z.object({
  name: libraryNameSchema.optional(),
  process: processSchema.optional(),
  buildVolume: buildVolumeSchema.optional(),
  nozzleDiameter: profileFields.nozzleDiameter.removeDefault().optional(),
  layerHeight: profileFields.layerHeight.optional(),
  notes: notesSchema.optional(),
  calibration: profileFields.calibration.removeDefault().optional(),
});
export type PrinterProfilePatch = z.input<typeof printerProfilePatchSchema>;

/** A printer profile as the API answers it. */
export const printerProfileSchema = z.object({
  id: z.string(),
  name: z.string(),
  process: processSchema,
  buildVolume: z.object({ x: z.number(), y: z.number(), z: z.number() }),
  nozzleDiameter: z.number().nullable(),
  layerHeight: z.number(),
  notes: z.string(),
  calibration: z.array(calibrationEntrySchema),
  createdAt: z.string(),
  updatedAt: z.string(),
  updatedBy: personSchema,
});
export type PrinterProfile = z.infer<typeof printerProfileSchema>;

/** `GET /api/teams/:teamId/printer-profiles` query. */
export const printerProfileListQuerySchema = z.object({
  ...listQueryFields(['name', 'updatedAt', 'createdAt']),
  process: z.preprocess((v) => (v === '' ? undefined : v), processSchema.optional()),
});
export type PrinterProfileListQuery = z.input<typeof printerProfileListQuerySchema>;

/** `GET /api/teams/:teamId/printer-profiles` reply. */
export const printerProfilePageSchema = pageOf(printerProfileSchema);
export type PrinterProfilePage = z.infer<typeof printerProfilePageSchema>;

/**
 * The words the fit engine's derivation uses for a calibration entry, naming the printer profile so the
 * derivation says whose calibration it applied.
 *
 * @param profileName - the printer profile's name
 * @param entry - the entry used
 * @returns e.g. `the calibration of printer profile "Bench FDM" (PLA snug, entered by hand on 2026-01-12)`;
 *   the fit engine adds the offset after it
 */
export function calibrationSourceWords(profileName: string, entry: CalibrationEntry): string {
  return `the calibration of printer profile "${profileName}" (${entry.material} ${entry.fit}, ${entry.source} on ${entry.measuredOn})`;
}
