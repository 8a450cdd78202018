import { describe, expect, it } from 'vitest';
import { countField, mmField, num } from '../../../shared/schemas/kit-number-fields';

const message = (r: { success: boolean; error?: { issues: Array<{ message: string }> } }) =>
  r.error?.issues[0]?.message;

describe('num', () => {
  it('drops binary noise and trailing zeros when formatting a number for a message', () => {
    expect(num(16.400000000000002)).toBe('16.4');
    expect(num(-0.0001)).toBe('0');
  });
});

describe('mmField', () => {
  it('names the field and carries the number when a length is out of range', () => {
    const f = mmField('face width', { above: 0, max: 2000 });
    expect(message(f.safeParse(0))).toBe('face width must be more than 0 mm; it is 0 mm');
    expect(message(f.safeParse(2500))).toBe('face width must be at most 2000 mm; it is 2500 mm');
    expect(message(f.safeParse(undefined))).toBe('face width is required');
  });
});

describe('countField', () => {
  it('asks for a whole number when a count has a fraction', () => {
    expect(message(countField('key count', 64).safeParse(2.5))).toBe('key count must be a whole number; it is 2.5');
  });
});
