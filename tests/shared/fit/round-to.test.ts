import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { roundTo } from '../../../shared/fit/round-to';

describe('roundTo', () => {
  it('drops float noise when a sum lands just off a decimal', () => {
    expect(roundTo(0.1 + 0.02, 3)).toBe(0.12);
    expect(roundTo(0.5005, 3)).toBe(0.501); // 0.5005 · 1000 is 500.49999999999994 in binary
  });

  it('rounds halves away from zero and never returns −0 when the value is negative', () => {
    expect(roundTo(-0.0015, 3)).toBe(-0.002);
    expect(Object.is(roundTo(-0.0001, 3), 0)).toBe(true);
  });

  it('returns a whole number of thousandths when the value is any mm length', () => {
    fc.assert(
      fc.property(fc.double({ min: -1000, max: 1000, noNaN: true }), (value) => {
        const rounded = roundTo(value, 3);
        expect(Math.abs(rounded - value)).toBeLessThanOrEqual(0.0005 + 1e-9);
        expect(Number.isInteger(Number((rounded * 1000).toFixed(6)))).toBe(true);
      }),
    );
  });
});
