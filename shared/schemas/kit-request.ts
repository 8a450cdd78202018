import { z } from 'zod';
import { defaultProcessFor } from '../fit/default-process-for';
import { materialMatchesProcess } from '../fit/material-matches-process';
import { faceSchema } from './face';
import { dovetailOptionsSchema } from './kit-dovetail-options';
import { keyOptionsSchema } from './kit-key-options';
import { fitClassSchema, materialSchema, processSchema } from './joint-options';
import { mmField } from './kit-number-fields';
import { plainText } from './plain-text';

/** Default largest chord deviation of round shapes, mm (issue 3). */
export const DEFAULT_CHORD_TOLERANCE_MM = 0.02;

/**
 * A team material chosen for a kit (issue 5): its name, for the derivation, and its clearance adjustment for
 * the request's fit class in mm per side (±0.5), which replaces the built-in material's adjustment. The team
 * material is a variant of the request's `material` (its base material).
 *
 * @example
 * materialTuningSchema.parse({ name: ' Grey matte PLA ', clearanceAdjustment: 0.03 }).name; // "Grey matte PLA"
 */
export const materialTuningSchema = z.object(
  {
    name: plainText(
      z
        .string({ error: () => 'materialTuning name must be text: the name of a team material' })
        .trim()
        .min(1, { error: () => 'materialTuning name must not be empty: give the team material’s name' })
        .max(80, {
          error: (iss) =>
            `materialTuning name must be at most 80 characters; it has ${String((iss.input as string).length)}`,
        }),
      'materialTuning name',
    ),
    clearanceAdjustment: mmField('materialTuning clearance adjustment', { min: -0.5, max: 0.5 }),
  },
  { error: () => 'materialTuning must be an object with a name and a clearanceAdjustment in mm' },
);
/** A team material's tuning as a kit request carries it. */
export type MaterialTuning = z.output<typeof materialTuningSchema>;

const sharedFields = {
  process: processSchema.optional(),
  material: materialSchema,
  fit: fitClassSchema,
  clearance: mmField('clearance per side', { min: 0, max: 1 }).optional(),
  calibrationOffset: mmField('calibration offset', { min: -0.5, max: 0.5 }).optional(),
  // Whose calibration the offset is, in words the fit derivation repeats (e.g. a printer profile's fit test).
  calibrationSource: plainText(
    z
      .string({ error: () => 'calibrationSource must be text' })
      .trim()
      .min(1)
      .max(200, { error: () => 'calibrationSource must be at most 200 characters' }),
    'calibrationSource',
  ).optional(),
  materialTuning: materialTuningSchema.optional(),
  face: faceSchema,
  format: z.enum(['binary', 'ascii'], { error: () => 'format must be "binary" or "ascii"' }).default('binary'),
  chordTolerance: mmField('chord tolerance', { min: 0.001, max: 0.5 }).default(DEFAULT_CHORD_TOLERANCE_MM),
};

const keyKitSchema = z.object({ joint: z.literal('key'), ...sharedFields, key: keyOptionsSchema });
const dovetailKitSchema = z.object({ joint: z.literal('dovetail'), ...sharedFields, dovetail: dovetailOptionsSchema });

/**
 * A kit request: the public contract of `POST /api/kits` and `POST /api/kits/summary`, and the form's schema.
 * Lengths in mm, the cut face centred on the origin in the plane z = 0.
 *
 * - `joint`: "key" needs a `key` object (see `keyOptionsSchema`), "dovetail" a `dovetail` object
 *   (see `dovetailOptionsSchema`); the other joint's object, if sent, is dropped.
 * - `process` defaults from the material (resin-… on "resin", filaments on "fdm"); a material that does not
 *   go with the process is rejected.
 * - `clearance` (mm per side, 0–1) replaces the fit engine's choice; `calibrationOffset` (mm, ±0.5) is the
 *   printer's fit-test correction and `calibrationSource` (text, ≤ 200) says whose, for the derivation.
 * - `materialTuning` `{ name, clearanceAdjustment }`: a team material chosen for this kit, a variant of
 *   `material`. `name` (trimmed, 1–80 characters) is the team material's name, for the derivation;
 *   `clearanceAdjustment` (mm per side, ±0.5) replaces the built-in material's adjustment for this fit class.
 * - `format`: STL "binary" (default) or "ascii". `chordTolerance`: largest chord deviation of round shapes,
 *   default 0.02 mm (0.001–0.5).
 *
 * Every size and count is capped (face 2000 mm, keys 100 mm and 64 of them, rails 16, polygons 1000 points)
 * so no request can ask for unbounded work. Messages name the field and carry the numbers.
 *
 * @example
 * kitRequestSchema.parse({ joint: 'key', material: 'PLA', fit: 'snug',
 *   face: { shape: 'rect', width: 80, height: 60 }, key: { shape: 'square', width: 10, depth: 8, count: 8 } });
 */
export const kitRequestSchema = z
  .discriminatedUnion('joint', [keyKitSchema, dovetailKitSchema], {
    error: () => 'joint must be "key" or "dovetail"',
  })
  .superRefine((r, ctx) => {
    if (r.process !== undefined && !materialMatchesProcess(r.material, r.process)) {
      const other = defaultProcessFor(r.material);
      ctx.addIssue({
        code: 'custom',
        path: ['process'],
        message: `${r.material} is printed on ${other === 'fdm' ? 'an FDM' : 'a resin'} printer, not ${r.process === 'fdm' ? 'FDM' : 'resin'}: set process to "${other}" or choose a ${r.process === 'fdm' ? 'filament' : 'resin'} material`,
      });
    }
  })
  .transform((r) => ({ ...r, process: r.process ?? defaultProcessFor(r.material) }));

/** A kit request as sent: defaults optional. */
export type KitRequest = z.input<typeof kitRequestSchema>;
/** A kit request with every default applied, as the builders and the manifest see it. */
export type ResolvedKitRequest = z.output<typeof kitRequestSchema>;
/** The resolved request of a key joint. */
export type ResolvedKeyKitRequest = Extract<ResolvedKitRequest, { joint: 'key' }>;
/** The resolved request of a dovetail joint. */
export type ResolvedDovetailKitRequest = Extract<ResolvedKitRequest, { joint: 'dovetail' }>;
