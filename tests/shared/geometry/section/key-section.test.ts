import { describe, expect, it } from 'vitest';
import { keySection } from '../../../../shared/geometry/section/key-section';
import type { Vec2 } from '../../../../shared/geometry/units';

const area = (p: readonly Vec2[]) =>
  p.reduce((s, a, i) => s + (a[0] * p[(i + 1) % p.length]![1] - p[(i + 1) % p.length]![0] * a[1]) / 2, 0);
const extent = (p: readonly Vec2[], axis: 0 | 1) =>
  Math.max(...p.map((v) => v[axis])) - Math.min(...p.map((v) => v[axis]));

describe('keySection', () => {
  it('makes a counter-clockwise square of side width when the shape is square', () => {
    const s = keySection({ shape: 'square', width: 10 });
    expect(area(s)).toBeCloseTo(100, 12);
  });

  it('puts width along x and length along y when the shape is rect', () => {
    const s = keySection({ shape: 'rect', width: 10, length: 6 });
    expect(extent(s, 0)).toBeCloseTo(10, 12);
    expect(extent(s, 1)).toBeCloseTo(6, 12);
  });

  it('measures width flat-to-flat across x when the shape is hex', () => {
    const s = keySection({ shape: 'hex', width: 8 });
    expect(extent(s, 0)).toBeCloseTo(8, 12);
    // Regular hexagon, flat-to-flat w: area (√3/2)·w², corner-to-corner 2w/√3 (derived).
    expect(area(s)).toBeCloseTo((Math.sqrt(3) / 2) * 64, 10);
    expect(extent(s, 1)).toBeCloseTo(16 / Math.sqrt(3), 12);
  });

  it('inscribes a polygon in the circle with facets facing ±x when the shape is round', () => {
    const s = keySection({ shape: 'round', width: 8, chordTolerance: 0.02 });
    expect(s).toHaveLength(32);
    for (const [x, y] of s) expect(Math.hypot(x, y)).toBeCloseTo(4, 12);
    expect(area(s)).toBeCloseTo(16 * 16 * Math.sin((2 * Math.PI) / 32), 10);
    // A facet faces −x: the two leftmost corners share x (the key rests on it when printed).
    const xs = s.map(([x]) => x).sort((a, b) => a - b);
    expect(xs[0]).toBeCloseTo(xs[1]!, 12);
  });

  it('cuts the flat at x = −(r − flat) with every other corner on the circle when a round key has a flat', () => {
    const s = keySection({ shape: 'round', width: 8, flat: 1 });
    expect(Math.min(...s.map(([x]) => x))).toBeCloseTo(-3, 12);
    for (const [x, y] of s) expect(Math.hypot(x, y)).toBeCloseTo(4, 12);
    expect(area(s)).toBeGreaterThan(0);
  });

  it('insets every flat by the chamfer with the same corner count when an inset is asked for', () => {
    for (const params of [
      { shape: 'square', width: 10 },
      { shape: 'hex', width: 8 },
      { shape: 'round', width: 8, flat: 1 },
    ] as const) {
      const full = keySection(params);
      const end = keySection(params, 0.5);
      expect(end).toHaveLength(full.length);
      expect(area(end)).toBeLessThan(area(full));
    }
    expect(extent(keySection({ shape: 'square', width: 10 }, 0.5), 0)).toBeCloseTo(9, 12);
  });

  it('ignores a flat of less than 0.02 mm when it is too fine for a kit file', () => {
    expect(keySection({ shape: 'round', width: 8, flat: 0.01 })).toEqual(keySection({ shape: 'round', width: 8 }));
  });
});
