import { describe, expect, it } from 'vitest';
import { pocketSection } from '../../../shared/geometry/section/pocket-section';
import { keyFootprint, keyLabel } from '../../../shared/kit/key-footprint';

describe('keyFootprint', () => {
  it('is the pocket mouth box when the key is square', () => {
    const f = keyFootprint(pocketSection({ shape: 'square', width: 10 }), 0.2, false);
    expect(f.kind).toBe('rect');
    if (f.kind === 'rect') {
      expect(f.width).toBeCloseTo(10.4, 12);
      expect(f.height).toBeCloseTo(10.4, 12);
    }
  });

  it('is a circle through the mouth corners when the key is round', () => {
    const f = keyFootprint(pocketSection({ shape: 'round', width: 8 }), 0.2, true);
    // The round pocket circumscribes the circle r + 0.2: its corners lie at (4 + 0.2) / cos(π/n) (elementary
    // geometry: a regular n-gon with apothem a has circumradius a / cos(π/n)). Was 2 · (4 + 0.2 / cos(π/32))
    // while the pocket grew the inscribed key polygon.
    expect(f).toEqual({ kind: 'circle', diameter: expect.closeTo((2 * (4 + 0.2)) / Math.cos(Math.PI / 32), 9) });
  });
});

describe('keyLabel', () => {
  it('names the key with its size and the right article when used in a layout message', () => {
    expect(keyLabel({ shape: 'square', width: 10 })).toBe('a 10 mm square key');
    expect(keyLabel({ shape: 'round', width: 8 })).toBe('an 8 mm round key');
    expect(keyLabel({ shape: 'rect', width: 11, length: 6 })).toBe('an 11 × 6 mm rect key');
    expect(keyLabel({ shape: 'hex', width: 100 })).toBe('a 100 mm hex key');
  });
});
