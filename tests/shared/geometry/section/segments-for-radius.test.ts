import { describe, expect, it } from 'vitest';
import { segmentsForRadius } from '../../../../shared/geometry/section/segments-for-radius';

describe('segmentsForRadius', () => {
  it('keeps the chord deviation within the tolerance when the radius and tolerance vary', () => {
    for (const r of [0.5, 1.5, 4, 10, 50]) {
      for (const tol of [0.001, 0.005, 0.02, 0.1]) {
        const n = segmentsForRadius(r, tol);
        // Sagitta of one segment: r · (1 − cos(π / n)) (derived).
        expect(r * (1 - Math.cos(Math.PI / n))).toBeLessThanOrEqual(tol + 1e-12);
        expect(n % 4).toBe(0);
      }
    }
  });

  it('gives 32 segments when an 8 mm key uses the default 0.02 mm tolerance', () => {
    expect(segmentsForRadius(4, 0.02)).toBe(32);
  });

  it('never goes below 8 segments when the tolerance is coarser than the radius', () => {
    expect(segmentsForRadius(0.5, 2)).toBe(8);
    expect(segmentsForRadius(5, 0.5)).toBe(8);
  });

  it('caps the segment count at 1024 when the tolerance is extremely fine', () => {
    expect(segmentsForRadius(1000, 1e-6)).toBe(1024);
  });
});
