import { z } from 'zod';
import { parseIsoFit } from './parse-iso-fit';

/**
 * An ISO 286 hole-basis fit as text, e.g. "10 H7/g6": validated with {@link parseIsoFit}, so a form, the API
 * and the fit engine accept exactly the same strings and report the same messages. The value stays the text
 * the user typed; parse it with `parseIsoFit` when the parts are needed.
 *
 * @example
 * isoFitSchema.parse('10 H7/g6'); // '10 H7/g6'
 * isoFitSchema.safeParse('10 X7/g6').success; // false, message: hole "X7" is not held here …
 */
export const isoFitSchema = z
  .string({ error: () => 'an ISO fit must be text such as "10 H7/g6"' })
  .superRefine((text, ctx) => {
    try {
      parseIsoFit(text);
    } catch (error) {
      ctx.addIssue({ code: 'custom', message: error instanceof Error ? error.message : String(error) });
    }
  });
