import { z } from 'zod';
import { countField, mmField, num, tooFine } from './kit-number-fields';

/** Most keys one kit may ask for (issue 3: "as many as fit, capped at 64"). */
export const MAX_KEY_COUNT = 64;
/** Largest key width, rect length or pocket depth, mm: caps the work one request can ask for. */
export const MAX_KEY_SIZE_MM = 100;
/** Default lead-in chamfer on both key ends, mm (common practice: enough to start the key by hand). */
export const DEFAULT_KEY_CHAMFER_MM = 0.4;
/** Shortest key Seamwright builds, mm. */
export const MIN_KEY_LENGTH_MM = 2;

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

type KeyFields = z.output<z.ZodObject<typeof keyFields>>;

/** The key's narrowest width across its section and what to call it in a message. */
function narrowest(k: KeyFields): { size: number; words: string } {
  if (k.shape === 'rect' && k.length !== undefined && k.length < k.width) return { size: k.length, words: 'key length' };
  if (k.shape === 'round' && k.flat > 0) return { size: k.width - k.flat, words: 'width across the flat' };
  const words = k.shape === 'round' ? 'key diameter' : k.shape === 'hex' ? 'key width across flats' : 'key width';
  return { size: k.width, words };
}

/** Key length along its axis: 2 × depth − end gap, in mm. */
export function keyLengthOf(k: { depth: number; endGap: number }): number {
  return 2 * k.depth - k.endGap;
}

function checkShape(k: KeyFields, ctx: z.RefinementCtx): void {
  tooFine(ctx, ['chamfer'], 'key chamfer', k.chamfer);
  tooFine(ctx, ['entryChamfer'], 'pocket entry chamfer', k.entryChamfer);
  tooFine(ctx, ['flat'], 'flat on a round key', k.flat);
  if (k.shape === 'rect' && k.length === undefined) {
    ctx.addIssue({ code: 'custom', path: ['length'], message: 'a rect key needs "length": its side along y in mm' });
  }
  if (k.shape !== 'rect' && k.length !== undefined) {
    ctx.addIssue({ code: 'custom', path: ['length'], message: `"length" is only for rect keys (their side along y); a ${k.shape} key is sized by "width" alone` });
  }
  if (k.flat > 0 && k.shape !== 'round') {
    ctx.addIssue({ code: 'custom', path: ['flat'], message: `a flat is only cut on round keys; this key is ${k.shape}` });
  } else if (k.width >= 1 && k.flat > k.width / 4) {
    ctx.addIssue({ code: 'custom', path: ['flat'], message: `a flat ${num(k.flat)} mm deep is more than a quarter of the ${num(k.width)} mm key diameter (${num(k.width / 4)} mm)` });
  }
  if (k.strategy === 'clearance' && k.scale !== undefined) {
    ctx.addIssue({ code: 'custom', path: ['scale'], message: 'key scale applies only with strategy "scale" (pockets at nominal size, keys scaled down)' });
  }
}

function checkSizes(k: KeyFields, ctx: z.RefinementCtx): void {
  const keyLength = keyLengthOf(k);
  if (keyLength < MIN_KEY_LENGTH_MM) {
    const least = (MIN_KEY_LENGTH_MM + k.endGap) / 2;
    ctx.addIssue({ code: 'custom', path: ['depth'], message: `key depth ${num(k.depth)} mm makes a key ${num(keyLength)} mm long (2 × ${num(k.depth)} mm − ${num(k.endGap)} mm end gap); use a depth of at least ${num(least)} mm` });
    return;
  }
  const { size, words } = narrowest(k);
  const c = k.chamfer;
  if (c !== undefined && c > size / 2) {
    ctx.addIssue({ code: 'custom', path: ['chamfer'], message: `key chamfer ${num(c)} mm is more than half the ${num(size)} mm ${words} (${num(size / 2)} mm)` });
  } else if (c !== undefined && c > 0.4 * size) {
    ctx.addIssue({ code: 'custom', path: ['chamfer'], message: `key chamfer ${num(c)} mm leaves an end face under ${num(size - 2 * c)} mm across on the ${num(size)} mm ${words}; keep it at most ${num(0.4 * size)} mm (40 %)` });
  } else if (c !== undefined && c > keyLength / 4) {
    ctx.addIssue({ code: 'custom', path: ['chamfer'], message: `key chamfer ${num(c)} mm is more than a quarter of the ${num(keyLength)} mm key length (${num(keyLength / 4)} mm); the key needs a straight middle` });
  }
  const pocketDepth = keyLength / 2 + (k.bottomGap ?? k.endGap / 2);
  if (k.entryChamfer > pocketDepth / 2) {
    ctx.addIssue({ code: 'custom', path: ['entryChamfer'], message: `pocket entry chamfer ${num(k.entryChamfer)} mm is more than half the ${num(pocketDepth)} mm pocket depth (${num(pocketDepth / 2)} mm)` });
  }
}

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
    error: (iss) => (iss.input === undefined ? 'a key joint needs a "key" object with shape, width and depth' : '"key" must be an object'),
  })
  .superRefine((k, ctx) => {
    checkShape(k, ctx);
    const sized = k.width >= 1 && k.depth >= 1 && (k.shape !== 'rect' || (k.length ?? 0) >= 1);
    if (sized) checkSizes(k, ctx);
  })
  .transform((k) => {
    const keyLength = keyLengthOf(k);
    const chamfer = k.chamfer ?? Math.min(DEFAULT_KEY_CHAMFER_MM, Math.floor(10 * narrowest(k).size) / 100, Math.floor((100 * keyLength) / 8) / 100);
    return {
      ...k,
      chamfer,
      strategy: k.strategy ?? (k.scale !== undefined ? ('scale' as const) : ('clearance' as const)),
      bottomGap: k.bottomGap ?? k.endGap / 2,
    };
  });
/** Key options as sent (defaults optional). */
export type KeyOptionsInput = z.input<typeof keyOptionsSchema>;
/** Key options with every default applied. */
export type KeyOptions = z.output<typeof keyOptionsSchema>;
