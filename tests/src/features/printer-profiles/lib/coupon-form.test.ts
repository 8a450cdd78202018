import { describe, expect, it } from 'vitest';
import {
  couponFormDefaults,
  couponFormSchema,
  couponRequestOf,
} from '../../../../../src/features/printer-profiles/lib/coupon-form';

const defaults = couponFormDefaults('fdm', 'PLA');

describe('couponRequestOf', () => {
  it('sends the key options only when the joint is a key', () => {
    const request = couponRequestOf(defaults);
    expect(request).toMatchObject({ joint: 'key', material: 'PLA', key: { shape: 'square', width: 8, depth: 4 } });
    expect(request).not.toHaveProperty('dovetail');
  });

  it('sends the dovetail options only when the joint is a dovetail', () => {
    const request = couponRequestOf({ ...defaults, joint: 'dovetail' });
    expect(request).toMatchObject({ joint: 'dovetail', dovetail: { rootWidth: 8, height: 5, slope: 6 } });
    expect(request).not.toHaveProperty('key');
  });
});

describe('couponFormSchema', () => {
  it('accepts the defaults of both joints', () => {
    expect(couponFormSchema.safeParse(defaults).success).toBe(true);
    const dovetail = couponFormSchema.parse({ ...defaults, joint: 'dovetail' });
    expect(dovetail.joint).toBe('dovetail');
  });

  it('puts a dovetail size problem on its form field when the rail is too narrow', () => {
    const result = couponFormSchema.safeParse({
      ...defaults,
      joint: 'dovetail',
      dovetail: { ...defaults.dovetail, rootWidth: 1 },
    });
    expect(result.success).toBe(false);
    expect(result.error!.issues.map((i) => i.path.join('.'))).toContain('dovetail.rootWidth');
  });

  it('ignores a bad key size when the joint is a dovetail', () => {
    const result = couponFormSchema.safeParse({
      ...defaults,
      joint: 'dovetail',
      key: { ...defaults.key, width: Number.NaN },
    });
    expect(result.success).toBe(true);
  });
});
