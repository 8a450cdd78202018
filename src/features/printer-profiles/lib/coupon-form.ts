import { z } from 'zod';
import { couponRequestSchema, type CouponRequest } from '../../../../shared/schemas/coupon-request';
import type { Material } from '../../../../shared/schemas/joint-options';
import type { PrinterProfile } from '../../../../shared/schemas/printer-profile';

/**
 * The coupon settings the fit-tests panel edits. It keeps both joints' sizes so switching between a key and
 * a dovetail coupon loses nothing; {@link couponRequestOf} sends only the chosen one. Lengths in mm.
 */
export interface CouponForm {
  joint: 'key' | 'dovetail';
  material: Material;
  process: PrinterProfile['process'];
  key: { shape: 'square' | 'round' | 'hex'; width: number; depth: number };
  /** Rail width at the face, height, and the slope as the n of 1:n. */
  dovetail: { rootWidth: number; height: number; slope: number };
  clearanceFrom: number;
  clearanceTo: number;
  clearanceStep: number;
}

/** The settings a new fit test starts from on a printer of this process, with its first material. */
export function couponFormDefaults(process: PrinterProfile['process'], material: Material): CouponForm {
  return {
    joint: 'key',
    process,
    material,
    key: { shape: 'square', width: 8, depth: 4 },
    dovetail: { rootWidth: 8, height: 5, slope: 6 },
    clearanceFrom: 0,
    clearanceTo: 0.4,
    clearanceStep: 0.05,
  };
}

/** The `POST /api/coupons` body of the settings: the chosen joint's options only. */
export function couponRequestOf(v: CouponForm): CouponRequest {
  const { process, material, clearanceFrom, clearanceTo, clearanceStep } = v;
  const common = { process, material, clearanceFrom, clearanceTo, clearanceStep };
  return v.joint === 'dovetail'
    ? { joint: 'dovetail', ...common, dovetail: { ...v.dovetail } }
    : { joint: 'key', ...common, key: { ...v.key } };
}

/**
 * The form's schema: the settings turned into a coupon request, then the API's own schema, so its messages
 * land on the form's fields (`key.width`, `dovetail.rootWidth`, `clearanceStep`…).
 */
export const couponFormSchema = z.custom<CouponForm>().transform(couponRequestOf).pipe(couponRequestSchema);
