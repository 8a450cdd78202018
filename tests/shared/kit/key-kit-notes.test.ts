import { describe, expect, it } from 'vitest';
import { keyPrintNotes, keyWarnings } from '../../../shared/kit/key-kit-notes';
import { keyOptionsSchema } from '../../../shared/schemas/kit-key-options';

describe('keyWarnings', () => {
  it('warns that a round key without a flat rests on a narrow facet when no flat is asked for', () => {
    const key = keyOptionsSchema.parse({ shape: 'round', width: 8, depth: 8 });
    expect(keyWarnings(key, 1, 0.15).join(' ')).toMatch(/narrow facet/);
  });

  it('warns that a scaled round key leaves less at its flat than around its circle when it has a flat', () => {
    const key = keyOptionsSchema.parse({ shape: 'round', width: 8, depth: 8, flat: 0.8, scale: 0.96 });
    // Scaling about the axis moves the flat (3.2 mm out) by (1 − 0.96) × 3.2 = 0.128 mm (derived).
    expect(keyWarnings(key, 0.96, 0.16).join(' ')).toMatch(
      /scaled to 96 % leaves 0\.16 mm per side around its 8 mm circle but 0\.128 mm at its 0\.8 mm flat/,
    );
    const plain = keyOptionsSchema.parse({ shape: 'round', width: 8, depth: 8, flat: 0.8 });
    expect(keyWarnings(plain, 1, 0.16).join(' ')).not.toMatch(/at its .* flat/);
  });

  it('warns when a computed key scale is below 80 %', () => {
    const key = keyOptionsSchema.parse({ shape: 'square', width: 3, depth: 8, strategy: 'scale' });
    expect(keyWarnings(key, 0.7, 0.45).join(' ')).toMatch(/70 %/);
  });
});

describe('keyPrintNotes', () => {
  it('tells the maker not to scale again when the key file is already scaled', () => {
    const key = keyOptionsSchema.parse({ shape: 'square', width: 10, depth: 8, scale: 0.99 });
    expect(keyPrintNotes(key, 4, 0.99).join(' ')).toMatch(/already scaled to 99 %/);
  });
});
