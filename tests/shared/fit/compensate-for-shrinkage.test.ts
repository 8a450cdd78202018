import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compensateForShrinkage } from '../../../shared/fit/index';

describe('compensateForShrinkage', () => {
  it('models 100.503 mm when 100 mm is wanted at 0.5 % shrinkage', () => {
    expect(compensateForShrinkage(100, 0.5)).toBe(100.503); // derived, REFERENCES §7.1: S/(1 − s)
  });

  it('returns the size unchanged when the shrinkage is 0', () => {
    expect(compensateForShrinkage(42.125, 0)).toBe(42.125);
  });

  it('comes back to the wanted size after shrinking when size and percentage vary', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1000, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        (size, percent) => {
          const modelled = compensateForShrinkage(size, percent);
          // within the 0.001 mm rounding, scaled by the shrink factor
          expect(Math.abs(modelled * (1 - percent / 100) - size)).toBeLessThanOrEqual(0.0005 + 1e-9);
        },
      ),
    );
  });

  it('throws a RangeError when the percentage is 100 or more or not a number', () => {
    expect(() => compensateForShrinkage(10, 100)).toThrow(/got 100/);
    expect(() => compensateForShrinkage(10, Number.NaN)).toThrow(RangeError);
    expect(() => compensateForShrinkage(Number.POSITIVE_INFINITY, 1)).toThrow(/size/);
  });
});
