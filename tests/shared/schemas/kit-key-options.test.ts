import { describe, expect, it } from 'vitest';
import { keyLengthOf, keyOptionsSchema } from '../../../shared/schemas/kit-key-options';

describe('keyOptionsSchema', () => {
  it('makes the default chamfer smaller when the key is too small for 0.4 mm', () => {
    expect(keyOptionsSchema.parse({ shape: 'square', width: 3, depth: 8 }).chamfer).toBe(0.3);
    expect(keyOptionsSchema.parse({ shape: 'square', width: 10, depth: 1.5 }).chamfer).toBe(0.32);
  });

  it('makes the pocket exactly `depth` deep when no bottom gap is given', () => {
    const k = keyOptionsSchema.parse({ shape: 'hex', width: 8, depth: 8, endGap: 0.6 });
    expect(keyLengthOf(k) / 2 + k.bottomGap).toBe(8);
  });

  it('rejects an entry chamfer deeper than half the pocket with the numbers', () => {
    const r = keyOptionsSchema.safeParse({ shape: 'square', width: 10, depth: 4, entryChamfer: 2.5 });
    expect(r.success ? [] : r.error.issues.map((i) => i.message)).toEqual([
      'pocket entry chamfer 2.5 mm is more than half the 4 mm pocket depth (2 mm)',
    ]);
  });

  it('rejects a flat deeper than a quarter of the diameter with the numbers', () => {
    const r = keyOptionsSchema.safeParse({ shape: 'round', width: 8, depth: 8, flat: 2.5 });
    expect(r.success ? [] : r.error.issues.map((i) => i.message)).toEqual([
      'a flat 2.5 mm deep is more than a quarter of the 8 mm key diameter (2 mm)',
    ]);
  });
});

describe('keyLengthOf', () => {
  it('is 2 × depth − end gap when given key options', () => {
    expect(keyLengthOf({ depth: 8, endGap: 0.4 })).toBeCloseTo(15.6, 12);
  });
});
