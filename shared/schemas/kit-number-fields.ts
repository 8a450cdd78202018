import { z } from 'zod';
import { MIN_FEATURE_MM } from '../geometry/min-feature';

/**
 * Formats a number for a schema message: at most 3 decimals, no binary noise, no trailing zeros.
 *
 * @param value - a number (mm, a ratio or degrees)
 * @returns the number as text, without a unit
 * @example
 * num(16.400000000000002); // "16.4"
 */
export function num(value: number): string {
  const rounded = Math.round(value * 1000) / 1000;
  return String(rounded === 0 ? 0 : rounded);
}

/** Bounds of a number field; `above` excludes its value, `min` includes it. */
export interface NumberBounds {
  readonly above?: number;
  readonly min?: number;
  readonly max: number;
}

/**
 * A length field in mm with plain messages that name the field and carry the numbers, e.g.
 * "key width must be more than 0 mm; it is -3 mm". NaN, Infinity and strings get "must be a number in mm".
 *
 * @param what - the field in words ("key width")
 * @param bounds - `above` (exclusive) or `min` (inclusive) lower bound, and the inclusive `max` (a work cap)
 * @param unit - unit word for messages; default "mm"
 * @returns a zod number schema
 * @example
 * mmField('key width', { above: 0, max: 100 }).safeParse(-3); // issue "key width must be more than 0 mm; it is -3 mm"
 */
export function mmField(what: string, bounds: NumberBounds, unit = 'mm') {
  const u = unit === '' || unit === '°' ? unit : ` ${unit}`;
  let field = z.number({
    error: (iss) =>
      iss.input === undefined ? `${what} is required` : `${what} must be a number${unit === 'mm' ? ' in mm' : ''}`,
  });
  if (bounds.above !== undefined) {
    const above = bounds.above;
    field = field.gt(above, {
      error: (iss) => `${what} must be more than ${num(above)}${u}; it is ${String(iss.input)}${u}`,
    });
  }
  if (bounds.min !== undefined) {
    const min = bounds.min;
    field = field.min(min, {
      error: (iss) => `${what} must be at least ${num(min)}${u}; it is ${String(iss.input)}${u}`,
    });
  }
  return field.max(bounds.max, {
    error: (iss) => `${what} must be at most ${num(bounds.max)}${u}; it is ${String(iss.input)}${u}`,
  });
}

/**
 * A whole-number count field with plain messages ("key count must be a whole number; it is 2.5").
 *
 * @param what - the field in words
 * @param max - the largest count allowed (a work cap)
 * @returns a zod integer schema from 1 to `max`
 * @example
 * countField('key count', 64).safeParse(0); // issue "key count must be at least 1; it is 0"
 */
export function countField(what: string, max: number) {
  return z
    .number({ error: (iss) => (iss.input === undefined ? `${what} is required` : `${what} must be a number`) })
    .int({ error: (iss) => `${what} must be a whole number; it is ${String(iss.input)}` })
    .min(1, { error: (iss) => `${what} must be at least 1; it is ${String(iss.input)}` })
    .max(max, { error: (iss) => `${what} must be at most ${max}; it is ${String(iss.input)}` });
}

/**
 * Adds an issue when a feature size is above 0 but below the smallest feature a kit keeps
 * (MIN_FEATURE_MM, 0.02 mm): such a chamfer or flat would vanish when the STL corners are snapped.
 *
 * @param ctx - the refinement context
 * @param path - the field's path inside the object being refined
 * @param what - the field in words
 * @param value - its value in mm (undefined = not given)
 * @example
 * tooFine(ctx, ['chamfer'], 'key chamfer', 0.005); // issue "key chamfer 0.005 mm is finer than … use 0 or at least 0.02 mm"
 */
export function tooFine(ctx: z.RefinementCtx, path: string[], what: string, value: number | undefined): void {
  if (value !== undefined && value > 0 && value < MIN_FEATURE_MM) {
    ctx.addIssue({
      code: 'custom',
      path,
      message: `${what} ${value} mm is finer than a kit file keeps (${MIN_FEATURE_MM} mm): use 0 for none or at least ${MIN_FEATURE_MM} mm`,
    });
  }
}

/**
 * Adds a custom issue at `field` (a path inside the object being refined) with a plain message.
 *
 * @param ctx - the refinement context
 * @param field - the field's name
 * @param message - the message, with the numbers
 * @example
 * addIssue(ctx, 'length', 'a rect key needs "length": its side along y in mm');
 */
export function addIssue(ctx: z.RefinementCtx, field: string, message: string): void {
  ctx.addIssue({ code: 'custom', path: [field], message });
}
