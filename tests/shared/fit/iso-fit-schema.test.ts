import { describe, expect, it } from 'vitest';
import { isoFitSchema } from '../../../shared/fit/index';

describe('isoFitSchema', () => {
  it('accepts the text unchanged when it is a fit held here', () => {
    expect(isoFitSchema.parse('10 H7/g6')).toBe('10 H7/g6');
  });

  it('reports the parser message when the text is not a fit', () => {
    const result = isoFitSchema.safeParse('10 X7/g6');
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.message).toMatch(/hole "X7" is not held here/);
  });

  it('reports a message when the value is not text', () => {
    const result = isoFitSchema.safeParse(10);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.message).toMatch(/"10 H7\/g6"/);
  });
});
