import { describe, expect, it } from 'vitest';
import { formatLength, parseLength } from '../../../../../src/features/design/lib/units';

describe('formatLength', () => {
  it('shows inches to 0.0001 and mm to 0.001 without trailing zeros when converting', () => {
    expect(formatLength(80, 'in')).toBe('3.1496');
    expect(formatLength(25.4, 'in')).toBe('1');
    expect(formatLength(0.16, 'mm')).toBe('0.16');
    expect(formatLength(1 / 3, 'mm')).toBe('0.333');
  });
});

describe('parseLength', () => {
  it('stores inches as mm and leaves empty text unset when parsing', () => {
    expect(parseLength('4', 'in')).toBeCloseTo(101.6, 12);
    expect(parseLength('12,5', 'mm')).toBe(12.5);
    expect(parseLength('  ', 'mm')).toBeUndefined();
    expect(parseLength('abc', 'mm')).toBeNaN();
  });
});
