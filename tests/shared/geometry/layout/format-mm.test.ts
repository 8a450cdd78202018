import { describe, expect, it } from 'vitest';
import { formatMm } from '../../../../shared/geometry/layout/format-mm';

describe('formatMm', () => {
  it('drops binary noise and trailing zeros when rounding to the nearest hundredth', () => {
    expect(formatMm(16.400000000000002)).toBe('16.4');
    expect(formatMm(12)).toBe('12');
    expect(formatMm(-0.001)).toBe('0');
  });

  it('never understates a need when rounding up and never overstates what is there when rounding down', () => {
    expect(formatMm(16.400000000000002, 'up')).toBe('16.4');
    expect(formatMm(16.401, 'up')).toBe('16.41');
    expect(formatMm(16.399, 'down')).toBe('16.39');
    expect(formatMm(11.716, 'down')).toBe('11.71');
  });
});
