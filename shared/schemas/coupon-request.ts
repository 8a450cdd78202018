import { z } from 'zod';
import { defaultProcessFor } from '../fit/default-process-for';
import { materialMatchesProcess } from '../fit/material-matches-process';
import { dovetailOptionsSchema } from './kit-dovetail-options';
import { keyOptionsSchema } from './kit-key-options';
import { materialSchema, processSchema } from './joint-options';
import { mmField, num } from './kit-number-fields';

/** Most graded pockets or slots one coupon may hold: keeps the plate printable in minutes and caps the work. */
export const MAX_COUPON_GRADES = 12;

const gradeFields = {
  process: processSchema.optional(),
  material: materialSchema,
  clearanceFrom: mmField('clearanceFrom', { min: 0, max: 1 }).default(0),
  clearanceTo: mmField('clearanceTo', { min: 0, max: 1 }).default(0.4),
  clearanceStep: mmField('clearanceStep', { min: 0.01, max: 1 }).default(0.05),
};

const keyCouponSchema = z.object({ joint: z.literal('key'), ...gradeFields, key: keyOptionsSchema });
const dovetailCouponSchema = z.object({
  joint: z.literal('dovetail'),
  ...gradeFields,
  dovetail: dovetailOptionsSchema,
});

/** How many grades a range gives: from, from + step, … up to and including to (within 1 µm). */
export function gradeCount(from: number, to: number, step: number): number {
  return Math.floor((to - from) / step + 1e-6) + 1;
}

/**
 * A fit-test coupon request: the public contract of `POST /api/coupons`. The joint fields are those of a kit
 * request; the clearance range (mm per side) defaults to 0.00 to 0.40 in 0.05 steps (9 grades).
 *
 * @example
 * couponRequestSchema.parse({ joint: 'key', material: 'PLA', key: { shape: 'square', width: 8, depth: 4 } });
 */
export const couponRequestSchema = z
  .discriminatedUnion('joint', [keyCouponSchema, dovetailCouponSchema], {
    error: () => 'joint must be "key" or "dovetail"',
  })
  .superRefine((r, ctx) => {
    if (r.clearanceTo < r.clearanceFrom) {
      ctx.addIssue({
        code: 'custom',
        path: ['clearanceTo'],
        message: `clearanceTo (${num(r.clearanceTo)} mm) must not be below clearanceFrom (${num(r.clearanceFrom)} mm)`,
      });
      return;
    }
    const count = gradeCount(r.clearanceFrom, r.clearanceTo, r.clearanceStep);
    if (count > MAX_COUPON_GRADES) {
      ctx.addIssue({
        code: 'custom',
        path: ['clearanceStep'],
        message: `${num(r.clearanceFrom)} to ${num(r.clearanceTo)} mm in ${num(r.clearanceStep)} mm steps gives ${count} grades; a coupon holds at most ${MAX_COUPON_GRADES}: take a larger step or a narrower range`,
      });
    }
    if (r.process !== undefined && !materialMatchesProcess(r.material, r.process)) {
      ctx.addIssue({
        code: 'custom',
        path: ['process'],
        message: `${r.material} is not printed on a ${r.process} printer`,
      });
    }
  })
  .transform((r) => ({ ...r, process: r.process ?? defaultProcessFor(r.material) }));

export type CouponRequest = z.input<typeof couponRequestSchema>;
export type ResolvedCouponRequest = z.output<typeof couponRequestSchema>;
export type ResolvedKeyCouponRequest = Extract<ResolvedCouponRequest, { joint: 'key' }>;
export type ResolvedDovetailCouponRequest = Extract<ResolvedCouponRequest, { joint: 'dovetail' }>;
