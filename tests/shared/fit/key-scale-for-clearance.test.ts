import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clearanceForKeyScale, keyScaleForClearance } from '../../../shared/fit/index';

describe('keyScaleForClearance', () => {
  it('gives 99 % when a 10 mm key needs 0.05 mm per side', () => {
    expect(keyScaleForClearance(10, 0.05)).toBe(0.99); // common practice: 99 % keys in nominal pockets
  });

  it('gives 1 when the clearance is 0', () => {
    expect(keyScaleForClearance(8, 0)).toBe(1);
  });

  it('is undone by clearanceForKeyScale when width and clearance vary', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 200, noNaN: true }),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        (width, fraction) => {
          const clearance = (fraction * width) / 2;
          const back = clearanceForKeyScale(width, keyScaleForClearance(width, clearance));
          expect(Math.abs(back - clearance)).toBeLessThanOrEqual(1e-9 * width);
        },
      ),
    );
  });

  it('throws a RangeError with the numbers when the clearance eats the key', () => {
    expect(() => keyScaleForClearance(10, 5)).toThrow(
      /5 mm per side leaves nothing of a 10 mm key: it must be below 5 mm/,
    );
    expect(() => keyScaleForClearance(10, -0.1)).toThrow(RangeError);
    expect(() => keyScaleForClearance(0, 0.1)).toThrow(/key width .*got 0/);
    expect(() => keyScaleForClearance(Number.NaN, 0.1)).toThrow(RangeError);
  });
});
