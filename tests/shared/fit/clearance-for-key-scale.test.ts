import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clearanceForKeyScale, keyScaleForClearance } from '../../../shared/fit/index';

describe('clearanceForKeyScale', () => {
  it('leaves 0.05 mm per side when a 10 mm key is printed at 99 %', () => {
    expect(clearanceForKeyScale(10, 0.99)).toBe(0.05); // common practice (REFERENCES, facts of the trade)
  });

  it('leaves no gap when the scale is 1', () => {
    expect(clearanceForKeyScale(10, 1)).toBe(0);
  });

  it('is undone by keyScaleForClearance when width and scale vary', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 200, noNaN: true }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        (width, scale) => {
          const back = keyScaleForClearance(width, clearanceForKeyScale(width, scale));
          expect(Math.abs(back - scale)).toBeLessThanOrEqual(1e-9);
        },
      ),
    );
  });

  it('throws a RangeError that hints at fractions when the scale is a percentage', () => {
    expect(() => clearanceForKeyScale(10, 99)).toThrow(/fraction .*0\.99 for 99 %.*got 99/);
    expect(() => clearanceForKeyScale(10, 0)).toThrow(RangeError);
    expect(() => clearanceForKeyScale(-1, 0.99)).toThrow(/key width/);
  });
});
