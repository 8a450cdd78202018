import type { z } from 'zod';
import type { KeyFields } from './kit-key-options';
import { addIssue, num, tooFine } from './kit-number-fields';

/** Shortest key Seamwright builds, mm. */
export const MIN_KEY_LENGTH_MM = 2;
/** Default lead-in chamfer on both key ends, mm (common practice: enough to start the key by hand). */
export const DEFAULT_KEY_CHAMFER_MM = 0.4;

/**
 * Key length along its axis: 2 × depth − end gap, in mm.
 *
 * @param k - the key's depth and end gap, mm
 * @returns the key length in mm
 * @example
 * keyLengthOf({ depth: 8, endGap: 0.4 }); // 15.6
 */
export function keyLengthOf(k: { depth: number; endGap: number }): number {
  return 2 * k.depth - k.endGap;
}

/**
 * The key's narrowest width across its section and what to call it in a message.
 *
 * @param k - key options (sizes valid)
 * @returns the width in mm and its name ("key width", "width across the flat", …)
 * @example
 * narrowestWidth({ shape: 'rect', width: 10, length: 6, … }); // { size: 6, words: 'key length' }
 */
export function narrowestWidth(k: KeyFields): { size: number; words: string } {
  if (k.shape === 'rect' && k.length !== undefined && k.length < k.width)
    return { size: k.length, words: 'key length' };
  if (k.shape === 'round' && k.flat > 0) return { size: k.width - k.flat, words: 'width across the flat' };
  const words = k.shape === 'round' ? 'key diameter' : k.shape === 'hex' ? 'key width across flats' : 'key width';
  return { size: k.width, words };
}

/**
 * The default chamfer: 0.4 mm, but at most 10 % of the narrowest width and an eighth of the key length (both
 * rounded down to 0.01 mm) so a tiny key never fails on a default it did not ask for.
 *
 * @param k - key options (sizes valid)
 * @returns chamfer in mm
 * @example
 * defaultKeyChamfer({ shape: 'square', width: 3, depth: 8, endGap: 0.4, … }); // 0.3
 */
export function defaultKeyChamfer(k: KeyFields): number {
  const byWidth = Math.floor(10 * narrowestWidth(k).size) / 100;
  return Math.min(DEFAULT_KEY_CHAMFER_MM, byWidth, Math.floor((100 * keyLengthOf(k)) / 8) / 100);
}

/**
 * Cross-field checks of a key that need no sizes: fine features, `length` only on rect keys, a flat only on
 * round keys and at most a quarter of the diameter, `scale` only with strategy "scale".
 *
 * @param k - key options after field checks
 * @param ctx - the refinement context; issues go on the offending field
 * @example
 * keyOptionsSchema.superRefine(checkKeyShape);
 */
export function checkKeyShape(k: KeyFields, ctx: z.RefinementCtx): void {
  tooFine(ctx, ['chamfer'], 'key chamfer', k.chamfer);
  tooFine(ctx, ['entryChamfer'], 'pocket entry chamfer', k.entryChamfer);
  tooFine(ctx, ['flat'], 'flat on a round key', k.flat);
  if (k.shape === 'rect' && k.length === undefined)
    addIssue(ctx, 'length', 'a rect key needs "length": its side along y in mm');
  if (k.shape !== 'rect' && k.length !== undefined) {
    addIssue(
      ctx,
      'length',
      `"length" is only for rect keys (their side along y); a ${k.shape} key is sized by "width" alone`,
    );
  }
  if (k.flat > 0 && k.shape !== 'round')
    addIssue(ctx, 'flat', `a flat is only cut on round keys; this key is ${k.shape}`);
  else if (k.width >= 1 && k.flat > k.width / 4) {
    addIssue(
      ctx,
      'flat',
      `a flat ${num(k.flat)} mm deep is more than a quarter of the ${num(k.width)} mm key diameter (${num(k.width / 4)} mm)`,
    );
  }
  if (k.strategy === 'clearance' && k.scale !== undefined) {
    addIssue(ctx, 'scale', 'key scale applies only with strategy "scale" (pockets at nominal size, keys scaled down)');
  }
}

/**
 * Cross-field checks of a key's sizes: a key long enough, a chamfer below half (and 40 %) of the narrowest
 * width and a quarter of the key length, an entry chamfer below half the pocket depth. Messages carry the numbers.
 *
 * @param k - key options whose sizes passed their field checks
 * @param ctx - the refinement context
 * @example
 * checkKeySizes({ shape: 'square', width: 10, chamfer: 6, … }, ctx);
 * // issue "key chamfer 6 mm is more than half the 10 mm key width (5 mm)"
 */
export function checkKeySizes(k: KeyFields, ctx: z.RefinementCtx): void {
  const keyLength = keyLengthOf(k);
  if (keyLength < MIN_KEY_LENGTH_MM) {
    const least = (MIN_KEY_LENGTH_MM + k.endGap) / 2;
    const made = `makes a key ${num(keyLength)} mm long (2 × ${num(k.depth)} mm − ${num(k.endGap)} mm end gap)`;
    addIssue(ctx, 'depth', `key depth ${num(k.depth)} mm ${made}; use a depth of at least ${num(least)} mm`);
    return;
  }
  if (k.chamfer !== undefined) checkChamfer(k.chamfer, narrowestWidth(k), keyLength, ctx);
  const pocketDepth = keyLength / 2 + (k.bottomGap ?? k.endGap / 2);
  if (k.entryChamfer > pocketDepth / 2) {
    const half = `the ${num(pocketDepth)} mm pocket depth (${num(pocketDepth / 2)} mm)`;
    addIssue(ctx, 'entryChamfer', `pocket entry chamfer ${num(k.entryChamfer)} mm is more than half ${half}`);
  }
}

function checkChamfer(
  c: number,
  { size, words }: { size: number; words: string },
  keyLength: number,
  ctx: z.RefinementCtx,
): void {
  const what = `key chamfer ${num(c)} mm`;
  if (c > size / 2)
    addIssue(ctx, 'chamfer', `${what} is more than half the ${num(size)} mm ${words} (${num(size / 2)} mm)`);
  else if (c > 0.4 * size) {
    const face = `an end face under ${num(size - 2 * c)} mm across on the ${num(size)} mm ${words}`;
    addIssue(ctx, 'chamfer', `${what} leaves ${face}; keep it at most ${num(0.4 * size)} mm (40 %)`);
  } else if (c > keyLength / 4) {
    const quarter = `the ${num(keyLength)} mm key length (${num(keyLength / 4)} mm)`;
    addIssue(ctx, 'chamfer', `${what} is more than a quarter of ${quarter}; the key needs a straight middle`);
  }
}
