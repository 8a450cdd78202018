import { describe, expect, it } from 'vitest';
import { dowelPocketDiameter } from '../../../shared/fit/index';

describe('dowelPocketDiameter', () => {
  it('sizes the hole from 10.000 to 10.015 mm when the fit is 10 H7/g6', () => {
    // torqyx.vercel.app/standards/fits: "10 mm: H7 0/+15 µm"
    expect(dowelPocketDiameter('10 H7/g6')).toEqual({ min: 10, max: 10.015, nominal: 10.0075 });
  });

  it('sizes the hole from the H grade when the fit is 50 H9/d9', () => {
    // machinecalcs.com/iso-286-fit-table: 50 H9 0/+62
    expect(dowelPocketDiameter('50 H9/d9')).toEqual({ min: 50, max: 50.062, nominal: 50.031 });
  });

  it('keeps whole micrometres without float noise when the size has a fraction', () => {
    // 12.5 mm is in "over 10 to 18": IT7 = 18 µm (Machine Drawing Table 15.1)
    expect(dowelPocketDiameter('12.5 H7/h6')).toEqual({ min: 12.5, max: 12.518, nominal: 12.509 });
  });

  it('throws a clear error when the fit is malformed or out of range', () => {
    expect(() => dowelPocketDiameter('10 X7/g6')).toThrow(/only H holes/);
    expect(() => dowelPocketDiameter('2 H7/g6')).toThrow(/2 mm .*over 3 mm/);
  });
});
