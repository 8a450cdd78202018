import { describe, expect, it } from 'vitest';
import { dovetailOptionsSchema } from '../../../shared/schemas/kit-dovetail-options';

const messages = (body: unknown) => {
  const r = dovetailOptionsSchema.safeParse(body);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

describe('dovetailOptionsSchema', () => {
  it('resolves the slope from an angle when only the angle is given', () => {
    // arctan(1/8) = 7.1250° (woodworking references, REFERENCES §6).
    expect(dovetailOptionsSchema.parse({ rootWidth: 10, height: 6, angleDeg: 7.125 }).slope).toBeCloseTo(8, 3);
  });

  it('keeps the resolved slope inside 1:2…1:20 when the angle is at its rounded bound', () => {
    expect(dovetailOptionsSchema.parse({ rootWidth: 10, height: 6, angleDeg: 26.57 }).slope).toBe(2);
  });

  it('rejects a chamfer above 40 % of the root width or half the height with the numbers', () => {
    expect(messages({ rootWidth: 5, height: 6, chamfer: 2.5 })).toEqual([
      'chamfer: dovetail chamfer 2.5 mm is more than 40 % of the 5 mm root width (2 mm)',
    ]);
    expect(messages({ rootWidth: 10, height: 2, chamfer: 1.5 })).toEqual([
      'chamfer: dovetail chamfer 1.5 mm is more than half the 2 mm rail height (1 mm)',
    ]);
  });

  it('rejects a pitch when there is only one rail', () => {
    expect(messages({ rootWidth: 10, height: 6, pitch: 20 })).toEqual([
      'pitch: dovetail pitch is the spacing between rails; it needs a count of 2 or more',
    ]);
  });

  it('caps the rail count at 16 when more are asked for', () => {
    expect(messages({ rootWidth: 10, height: 6, count: 17 })).toEqual([
      'count: dovetail count must be at most 16; it is 17',
    ]);
  });
});
