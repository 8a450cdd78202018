import { describe, expect, it } from 'vitest';
import type { Material } from '../../../shared/schemas/joint-options';
import { defaultShrinkage } from '../../../shared/fit/index';

const materials: Material[] = ['PLA', 'PETG', 'ABS', 'ASA', 'PA', 'TPU', 'resin-standard', 'resin-tough'];

describe('defaultShrinkage', () => {
  it('marks every default as common practice and editable when any material is asked for', () => {
    // REFERENCES §7.1: sources disagree, so only the marking is checked, never the material constants
    for (const material of materials) {
      const { percent, source } = defaultShrinkage(material);
      expect(source).toMatch(/^common practice/);
      expect(source).toMatch(/edit/);
      expect(percent).toBeGreaterThanOrEqual(0);
      expect(percent).toBeLessThan(5);
    }
  });

  it('throws a RangeError when the material is unknown', () => {
    expect(() => defaultShrinkage('wood' as Material)).toThrow(/unknown material wood/);
  });
});
