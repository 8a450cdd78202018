import { describe, expect, it } from 'vitest';
import { placeKeys, type Footprint } from '../../../../shared/geometry/layout';
import { turnVector } from '../../../../shared/geometry/layout/turn-vector';
import type { Face } from '../../../../shared/schemas/face';
import { oracleGap, oracleWall } from './layout-oracle';

function closest(keys: Array<[number, number]>): number {
  let best = Infinity;
  for (let i = 0; i < keys.length; i++)
    for (let j = i + 1; j < keys.length; j++)
      best = Math.min(best, Math.hypot(keys[i]![0] - keys[j]![0], keys[i]![1] - keys[j]![1]));
  return best;
}

describe('placeKeys on rect and round faces', () => {
  it('spreads 8 square keys on an 80 × 60 face at least as far as a 3 + 2 + 3 quincunx', () => {
    const face: Face = { shape: 'rect', width: 80, height: 60 };
    const footprint: Footprint = { kind: 'rect', width: 10.32, height: 10.32 };
    const keys = placeKeys({ face, footprint, margin: 2, count: 8, keyLabel: 'k' });
    // Centres span ±32.84 × ±22.84 (40 − 5.16 − 2, 30 − 5.16 − 2); the quincunx's closest pair is
    // a corner and a middle-row key: √(16.42² + 22.84²) = 28.13 mm (derived).
    expect(closest(keys)).toBeGreaterThanOrEqual(Math.hypot(16.42, 22.84) - 0.01);
    for (const k of keys) expect(oracleWall(face, footprint, k)).toBeGreaterThanOrEqual(2 - 1e-6);
    for (let i = 0; i < keys.length; i++)
      for (let j = i + 1; j < keys.length; j++)
        expect(oracleGap(footprint, keys[i]!, keys[j]!)).toBeGreaterThanOrEqual(2 - 1e-6);
  });

  it('spreads 8 round keys on a round face at least as far as 7 on the rim around one in the middle', () => {
    const keys = placeKeys({
      face: { shape: 'circle', diameter: 60 },
      footprint: { kind: 'circle', diameter: 8.32 },
      margin: 2,
      count: 8,
      keyLabel: 'k',
    });
    // Rim radius 30 − 4.16 − 2 = 23.84; 7 on it are 2 · 23.84 · sin(π/7) apart (derived).
    expect(closest(keys)).toBeGreaterThanOrEqual(2 * 23.84 * Math.sin(Math.PI / 7) - 0.01);
  });

  it('measures turns like Math.cos and Math.sin when the angle is anywhere', () => {
    for (let f = -1.5; f <= 1.5; f += 0.0625 / 3) {
      const [c, s] = turnVector(f);
      expect(c).toBeCloseTo(Math.cos(2 * Math.PI * f), 14);
      expect(s).toBeCloseTo(Math.sin(2 * Math.PI * f), 14);
    }
  });
});
