import { z } from 'zod';
import { plainText } from './plain-text';

/**
 * What a key (or rail) did in one graded pocket of a printed coupon, from tightest to loosest:
 * `no-entry` did not go in; `forced` went in only with force; `snug` went in with light pressure and no
 * play; `free` slid in and out freely; `wobbly` had visible play.
 */
export const fitTestOutcomeSchema = z.enum(['no-entry', 'forced', 'snug', 'free', 'wobbly'], {
  error: () => 'each answer must be one of no-entry, forced, snug, free, wobbly',
});
export type FitTestOutcome = z.infer<typeof fitTestOutcomeSchema>;

/** One pocket's answer: its mark, its clearance per side (mm, from the coupon's manifest) and the outcome. */
export const fitTestAnswerSchema = z.object({
  mark: plainText(z.string().min(1).max(8), 'each pocket mark'),
  clearancePerSide: z.number().min(0).max(1),
  outcome: fitTestOutcomeSchema,
});
export type FitTestAnswer = z.infer<typeof fitTestAnswerSchema>;
