import { z } from 'zod';
import { couponRequestSchema, gradeCount, MAX_COUPON_GRADES } from './coupon-request';
import { fitTestAnswerSchema } from './fit-test-answer';
import { fitClassSchema, materialSchema, type FitClass } from './joint-options';
import { num, mmField } from './kit-number-fields';
import { personSchema } from './library-fields';

/** The graded clearances (mm per side) of the coupon a fit test was printed from. */
export const couponRangeSchema = z.object({
  clearanceFrom: mmField('clearanceFrom', { min: 0, max: 1 }),
  clearanceTo: mmField('clearanceTo', { min: 0, max: 1 }),
  clearanceStep: mmField('clearanceStep', { min: 0.01, max: 1 }),
});

/** The coupon as a fit test keeps it: its range, and the whole coupon request when one was given. */
export const fitTestCouponSchema = couponRangeSchema.extend({
  request: z.record(z.string(), z.unknown()).optional(),
});
export type FitTestCoupon = z.infer<typeof fitTestCouponSchema>;

// A whole coupon request (it has a `joint`) or just its clearance range; issues keep their paths.
const couponFieldSchema = z.unknown().transform((value, ctx): FitTestCoupon => {
  const whole = typeof value === 'object' && value !== null && 'joint' in value;
  const parsed = (whole ? couponRequestSchema : couponRangeSchema).safeParse(value);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      ctx.addIssue({ code: 'custom', message: issue.message, path: issue.path as PropertyKey[] });
    }
    return z.NEVER;
  }
  const { clearanceFrom, clearanceTo, clearanceStep } = parsed.data;
  return whole ? { clearanceFrom, clearanceTo, clearanceStep, request: parsed.data } : parsed.data;
});

/** The best clearance per fit class read from a coupon (mm per side) and the pocket that gave it. */
export const fitTestBestSchema = z.partialRecord(
  fitClassSchema,
  z.object({ clearancePerSide: z.number(), mark: z.string() }),
);
export type FitTestBest = z.infer<typeof fitTestBestSchema>;

/**
 * `POST …/printer-profiles/:profileId/fit-tests` body: the material and joint the coupon was printed for,
 * the coupon (its request or just `clearanceFrom`/`clearanceTo`/`clearanceStep`, mm per side) and one answer
 * per pocket (1–12, marks unique, each clearance inside the coupon's range).
 *
 * @example
 * fitTestInputSchema.parse({ material: 'PLA', joint: 'key',
 *   coupon: { clearanceFrom: 0, clearanceTo: 0.2, clearanceStep: 0.05 },
 *   answers: [{ mark: '1', clearancePerSide: 0, outcome: 'no-entry' }] });
 */
export const fitTestInputSchema = z
  .object({
    material: materialSchema,
    joint: z.enum(['key', 'dovetail'], { error: () => 'joint must be "key" or "dovetail"' }),
    coupon: couponFieldSchema,
    answers: z
      .array(fitTestAnswerSchema, { error: () => 'answers must be a list, one per pocket' })
      .min(1, { error: () => 'Record at least one pocket.' })
      .max(MAX_COUPON_GRADES, { error: () => `A coupon has at most ${MAX_COUPON_GRADES} pockets.` }),
  })
  .superRefine((t, ctx) => {
    const request = t.coupon.request;
    if (request && (request.joint !== t.joint || request.material !== t.material)) {
      ctx.addIssue({
        code: 'custom',
        path: ['coupon'],
        message: `The coupon was made for ${String(request.material)} ${String(request.joint)}s, not ${t.material} ${t.joint}s.`,
      });
    }
    const { clearanceFrom: from, clearanceTo: to, clearanceStep: step } = t.coupon;
    if (to >= from && gradeCount(from, to, step) < t.answers.length) {
      ctx.addIssue({
        code: 'custom',
        path: ['answers'],
        message: `${t.answers.length} answers for a coupon of ${gradeCount(from, to, step)} pockets.`,
      });
    }
    const seen = new Set<string>();
    t.answers.forEach((a, i) => {
      if (seen.has(a.mark)) {
        ctx.addIssue({ code: 'custom', path: ['answers', i, 'mark'], message: `Pocket ${a.mark} is answered twice.` });
      }
      seen.add(a.mark);
      // 1 µm of slack: the manifest's clearances are rounded to the micrometre.
      if (a.clearancePerSide < from - 1e-3 || a.clearancePerSide > to + 1e-3) {
        ctx.addIssue({
          code: 'custom',
          path: ['answers', i, 'clearancePerSide'],
          message: `Pocket ${a.mark} (${num(a.clearancePerSide)} mm) is outside the coupon's ${num(from)}–${num(to)} mm.`,
        });
      }
    });
  });
export type FitTestInput = z.input<typeof fitTestInputSchema>;
export type ParsedFitTestInput = z.output<typeof fitTestInputSchema>;

/** One fit class's result: the measured clearance, the published default and their difference (mm per side). */
export const fitTestResultSchema = z.object({
  clearancePerSide: z.number(),
  publishedDefault: z.number(),
  offsetMm: z.number(),
  mark: z.string(),
});
export type FitTestResult = z.infer<typeof fitTestResultSchema>;
export type FitTestResults = Partial<Record<FitClass, FitTestResult>>;

/** A fit test as the API answers it; `current` is true while the profile's calibration comes from it. */
export const fitTestSchema = z.object({
  id: z.string(),
  printerProfileId: z.string(),
  material: materialSchema,
  joint: z.enum(['key', 'dovetail']),
  coupon: fitTestCouponSchema,
  answers: z.array(fitTestAnswerSchema),
  best: fitTestBestSchema,
  results: z.partialRecord(fitClassSchema, fitTestResultSchema),
  notes: z.array(z.string()),
  current: z.boolean(),
  createdBy: personSchema,
  createdAt: z.string(),
});
export type FitTest = z.infer<typeof fitTestSchema>;

/** `GET …/fit-tests` reply: newest first. */
export const fitTestListSchema = z.object({ items: z.array(fitTestSchema) });
export type FitTestList = z.infer<typeof fitTestListSchema>;

/** The calibration source words that link an entry to the fit test it came from. */
export function fitTestSource(id: string): string {
  return `fit test ${id}`;
}
