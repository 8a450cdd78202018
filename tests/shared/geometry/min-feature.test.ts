import { describe, expect, it } from 'vitest';
import { keptFeature, MIN_FEATURE_MM } from '../../../shared/geometry/min-feature';

describe('keptFeature', () => {
  it('drops a feature to 0 when it is finer than the snapping grid of the largest file allows', () => {
    // JSCAD's grid for a 2000 × 2000 mm cutter file about 10 mm deep: 1e-5 × (2000 + 2000 + 10) / 3 (derived).
    expect(MIN_FEATURE_MM).toBeGreaterThan((1e-5 * 4010) / 3);
    expect(keptFeature(0.019)).toBe(0);
    expect(keptFeature(0.02)).toBe(0.02);
  });
});
