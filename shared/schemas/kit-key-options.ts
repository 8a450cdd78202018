import { z } from 'zod';
import { checkKeyShape, checkKeySizes, defaultKeyChamfer } from './kit-key-checks';
import { countField, mmField } from './kit-number-fields';

export { DEFAULT_KEY_CHAMFER_MM, keyLengthOf, MIN_KEY_LENGTH_MM } from './kit-key-checks';

/** Most keys one kit may ask for (issue 3: "as many as fit, capped at 64"). */
export const MAX_KEY_COUNT = 64;
/** Largest key width, rect length or pocket depth, mm: caps the work one request can ask for. */
export const MAX_KEY_SIZE_MM = 100;

/** Cross-section shapes of a key pin. */
export const keyShapeSchema = z.enum(['square', 'rect', 'round', 'hex'], {
  error: () => 'key shape must be "square", "rect", "round" or "hex"',
});

const keyFields = {
  shape: keyShapeSchema,
  width: mmField('key width', { min: 1, max: MAX_KEY_SIZE_MM }),
  length: mmField('key length (a rect key’s side along y)', { min: 1, max: MAX_KEY_SIZE_MM }).optional(),
  depth: mmField('key depth', { min: 1, max: MAX_KEY_SIZE_MM }),
  count: countField('key count', MAX_KEY_COUNT).optional(),
  margin: mmField('key margin (the wall around each pocket)', { min: 0.4, max: 50 }).default(2),
  chamfer: mmField('key chamfer', { min: 0, max: 20 }).optional(),
  strategy: z.enum(['clearance', 'scale'], { error: () => 'key strategy must be "clearance" or "scale"' }).optional(),
  scale: z
    .number({ error: () => 'key scale must be a number, a fraction such as 0.99 for 99 %' })
    .gt(0.8, { error: (iss) => `key scale must be more than 0.8 (80 %); it is ${String(iss.input)}` })
    .max(1, { error: (iss) => `key scale must be at most 1 (100 %; 0.99 means 99 %); it is ${String(iss.input)}` })
    .optional(),
  endGap: mmField('key end gap', { min: 0, max: 5 }).default(0.4),
  bottomGap: mmField('pocket bottom gap', { min: 0, max: 5 }).optional(),
  entryChamfer: mmField('pocket entry chamfer', { min: 0, max: 5 }).default(0),
  flat: mmField('flat on a round key', { min: 0, max: MAX_KEY_SIZE_MM / 4 }).default(0),
};

/** Key options after the field checks and before the defaults that depend on other fields. */
export type KeyFields = z.output<z.ZodObject<typeof keyFields>>;

/**
 * A key joint's options, all lengths in mm. The key's section lies in the cut face: `width` is its size
 * across x (side of a square, flat-to-flat of a hex, diameter of a round key); `length` is a rect key's
 * side along y (required for rect, rejected for the other shapes). `depth` is how deep the key goes into
 * each half; the key is 2 × depth − `endGap` long so it never bottoms out, and each pocket is
 * keyLength / 2 + `bottomGap` deep (default endGap / 2, so exactly `depth`).
 *
 * Defaults: margin 2 mm; chamfer 0.4 mm (smaller on tiny keys: at most 10 % of the narrowest width and an
 * eighth of the key length); strategy "scale" when `scale` is given, else "clearance"; endGap 0.4 mm;
 * entryChamfer 0; flat 0 (round keys only, cut on the −x side, at most a quarter of the diameter).
 * Unknown fields are rejected so a misspelt option is reported, not ignored.
 *
 * @example
 * keyOptionsSchema.parse({ shape: 'square', width: 10, depth: 8 }).chamfer; // 0.4
 */
export const keyOptionsSchema = z
  .strictObject(keyFields, {
    error: (iss) => {
      if (iss.code === 'unrecognized_keys')
        return `unknown key option${iss.keys.length > 1 ? 's' : ''} ${iss.keys.map((k) => `"${k}"`).join(', ')}: check the spelling`;
      return iss.input === undefined
        ? 'a key joint needs a "key" object with shape, width and depth'
        : '"key" must be an object';
    },
  })
  .superRefine((k, ctx) => {
    checkKeyShape(k, ctx);
    const sized = k.width >= 1 && k.depth >= 1 && (k.shape !== 'rect' || (k.length ?? 0) >= 1);
    if (sized) checkKeySizes(k, ctx);
  })
  .transform((k) => ({
    ...k,
    chamfer: k.chamfer ?? defaultKeyChamfer(k),
    strategy: k.strategy ?? (k.scale !== undefined ? ('scale' as const) : ('clearance' as const)),
    bottomGap: k.bottomGap ?? k.endGap / 2,
  }));
/** Key options as sent (defaults optional). */
export type KeyOptionsInput = z.input<typeof keyOptionsSchema>;
/** Key options with every default applied. */
export type KeyOptions = z.output<typeof keyOptionsSchema>;
