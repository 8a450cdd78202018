import { describe, expect, it } from 'vitest';
import { GeometryError } from '../../../../shared/geometry/geometry-error';
import { MAX_KEYS, MIN_STAGGER_MM, placeKeys, type Footprint } from '../../../../shared/geometry/layout';
import type { Face } from '../../../../shared/schemas/face';
import { oracleGap, oracleWall, oracleWidth } from './layout-oracle';

// A 10 mm square key with 0.2 mm clearance per side leaves a 10.4 mm pocket (derived: 10 + 2 × 0.2).
const POCKET_10: Footprint = { kind: 'rect', width: 10.4, height: 10.4 };
const L_SHAPE: Face = {
  shape: 'polygon',
  points: [
    [-40, -40],
    [40, -40],
    [40, -20],
    [-20, -20],
    [-20, 40],
    [-40, 40],
  ],
};
const U_SHAPE: Face = {
  shape: 'polygon',
  points: [
    [-40, -30],
    [40, -30],
    [40, 30],
    [20, 30],
    [20, -10],
    [-20, -10],
    [-20, 30],
    [-40, 30],
  ],
};

function thrown(run: () => unknown): GeometryError {
  try {
    run();
  } catch (e) {
    if (e instanceof GeometryError) return e;
    throw e;
  }
  throw new Error('expected a GeometryError');
}

function timed(run: () => unknown): number {
  const start = performance.now();
  run();
  return performance.now() - start;
}

function expectLegal(face: Face, footprint: Footprint, margin: number, keys: Array<[number, number]>): void {
  for (const k of keys) expect(oracleWall(face, footprint, k)).toBeGreaterThanOrEqual(margin - 1e-6);
  for (let i = 0; i < keys.length; i++) {
    for (let j = i + 1; j < keys.length; j++) {
      expect(oracleGap(footprint, keys[i]!, keys[j]!)).toBeGreaterThanOrEqual(margin - 1e-6);
    }
  }
}

describe('placeKeys', () => {
  it('says how wide the face must be when a rect face is too narrow', () => {
    // Worked example from the product spec (issue 3); 16.4 = 10.4 mm pocket + 2 × 3 mm walls (derived).
    const error = thrown(() =>
      placeKeys({
        face: { shape: 'rect', width: 12, height: 60 },
        footprint: POCKET_10,
        margin: 3,
        keyLabel: 'a 10 mm key',
      }),
    );
    expect(error.code).toBe('FACE_TOO_SMALL');
    expect(error.message).toBe('a 10 mm key with 3 mm walls needs a face at least 16.4 mm wide; this one is 12 mm');
  });

  it('says how high the face must be when a rect face is too low', () => {
    const error = thrown(() =>
      placeKeys({
        face: { shape: 'rect', width: 80, height: 12 },
        footprint: POCKET_10,
        margin: 3,
        keyLabel: 'a 10 mm key',
      }),
    );
    expect(error.message).toBe('a 10 mm key with 3 mm walls needs a face at least 16.4 mm high; this one is 12 mm');
  });

  it('says how big a round face must be when a round face is too small', () => {
    // Derived: 8.3 mm pocket + 2 × 2 mm walls = 12.3 mm.
    const error = thrown(() =>
      placeKeys({
        face: { shape: 'circle', diameter: 10 },
        footprint: { kind: 'circle', diameter: 8.3 },
        margin: 2,
        keyLabel: 'an 8 mm key',
      }),
    );
    expect(error.code).toBe('FACE_TOO_SMALL');
    expect(error.message).toBe('an 8 mm key with 2 mm walls needs a face at least 12.3 mm across; this one is 10 mm');
  });

  it('gives the roomiest spot found when no spot of a polygon face is far enough from its edges', () => {
    // The L's arms are 20 mm wide; its largest inscribed circle sits in the corner square, touching
    // both outer sides and the inner corner: r = 20·(2 + √2)/(1 + √2) − 20 = 11.716 mm (derived).
    const error = thrown(() =>
      placeKeys({ face: L_SHAPE, footprint: { kind: 'circle', diameter: 20 }, margin: 3, keyLabel: 'a 20 mm key' }),
    );
    expect(error.code).toBe('FACE_TOO_SMALL');
    expect(error.message).toBe(
      'a 20 mm key with 3 mm walls needs a spot at least 13 mm from every edge of the face; the roomiest spot found on this face is 11.71 mm from its nearest edge',
    );
  });

  it('says the pocket fits nowhere when it is larger than any part of a polygon face', () => {
    const error = thrown(() =>
      placeKeys({
        face: L_SHAPE,
        footprint: { kind: 'rect', width: 30, height: 30 },
        margin: 1,
        keyLabel: 'a 30 mm key',
      }),
    );
    expect(error.message).toBe(
      'a 30 mm key with 1 mm walls needs room for its 30 × 30 mm pocket with 1 mm of wall all round; the pocket does not fit anywhere on this face',
    );
  });

  it('says how many fit when more keys are asked for than fit', () => {
    // 80 × 60 face, 10.4 mm pockets at a 13.4 mm pitch: centres span 63.6 × 43.6 mm, so
    // ⌊63.6 / 13.4⌋ + 1 = 5 columns × ⌊43.6 / 13.4⌋ + 1 = 4 rows = 20 (derived; a square grid is the
    // densest packing of equal axis-aligned squares in a rectangle).
    const error = thrown(() =>
      placeKeys({
        face: { shape: 'rect', width: 80, height: 60 },
        footprint: POCKET_10,
        margin: 3,
        count: 30,
        keyLabel: 'a 10 mm key',
      }),
    );
    expect(error.code).toBe('TOO_MANY_KEYS');
    expect(error.message).toBe(
      'only 20 keys fit on this face with 3 mm walls (a 10 mm key, 10.4 × 10.4 mm pocket); 30 were asked for',
    );
  });

  it('places as many keys as fit when count is omitted', () => {
    const face: Face = { shape: 'rect', width: 80, height: 60 };
    const keys = placeKeys({ face, footprint: POCKET_10, margin: 3, keyLabel: 'a 10 mm key' });
    expect(keys).toHaveLength(20);
    expectLegal(face, POCKET_10, 3, keys);
  });

  it('caps the keys at 64 when count is omitted on a large face', () => {
    const face: Face = { shape: 'rect', width: 1000, height: 800 };
    const keys = placeKeys({ face, footprint: POCKET_10, margin: 3, keyLabel: 'a 10 mm key' });
    expect(keys).toHaveLength(MAX_KEYS);
    expectLegal(face, POCKET_10, 3, keys);
  });

  it('refuses more than 64 keys when count is above the cap', () => {
    const error = thrown(() =>
      placeKeys({
        face: { shape: 'rect', width: 1000, height: 800 },
        footprint: POCKET_10,
        margin: 3,
        count: 65,
        keyLabel: 'k',
      }),
    );
    expect(error.code).toBe('TOO_MANY_KEYS');
    expect(error.message).toBe('at most 64 keys can be placed on one face; 65 were asked for');
  });

  it('puts one key at the centre when the centre fits', () => {
    const keys = placeKeys({
      face: { shape: 'circle', diameter: 30 },
      footprint: POCKET_10,
      margin: 3,
      count: 1,
      keyLabel: 'k',
    });
    expect(keys).toEqual([[0, 0]]);
  });

  it('puts one key at the most interior spot when the centre of the face is outside it', () => {
    const [key] = placeKeys({ face: L_SHAPE, footprint: POCKET_10, margin: 3, count: 1, keyLabel: 'k' });
    // The roomiest spot of the L is in its corner square, on the diagonal (derived from symmetry).
    const wall = oracleWall(L_SHAPE, POCKET_10, key!);
    let best = -Infinity;
    for (let x = -40; x <= 40; x += 0.5)
      for (let y = -40; y <= 40; y += 0.5) best = Math.max(best, oracleWall(L_SHAPE, POCKET_10, [x, y]));
    expect(wall).toBeGreaterThanOrEqual(best - 0.01);
    expect(key![0]).toBeCloseTo(key![1], 2);
  });

  it('places a key on a face exactly as wide as the pocket plus two walls', () => {
    const keys = placeKeys({
      face: { shape: 'rect', width: 16.4, height: 16.4 },
      footprint: POCKET_10,
      margin: 3,
      keyLabel: 'k',
    });
    expect(keys).toEqual([[0, 0]]);
  });

  it('sends two keys toward the two ends of the long axis when the face is long', () => {
    const face: Face = { shape: 'rect', width: 200, height: 30 };
    const [a, b] = placeKeys({ face, footprint: POCKET_10, margin: 3, count: 2, keyLabel: 'k' });
    // Centres may go up to 100 − 5.2 − 3 = 91.8 mm from the middle (derived).
    expect(a![0]).toBeCloseTo(-91.8, 6);
    expect(b![0]).toBeCloseTo(91.8, 6);
    expect(Math.abs(b![0] - a![0])).toBeGreaterThan(Math.abs(b![1] - a![1]));
  });

  it('puts four keys in the corners of the usable area when the face is square', () => {
    const keys = placeKeys({
      face: { shape: 'rect', width: 60, height: 60 },
      footprint: POCKET_10,
      margin: 3,
      count: 4,
      keyLabel: 'k',
    });
    // 30 − 5.2 − 3 = 21.8 mm (derived).
    expect(keys).toEqual([
      [-21.8, -21.8],
      [-21.8, 21.8],
      [21.8, -21.8],
      [21.8, 21.8],
    ]);
  });

  it('spreads three keys into an even triangle when the face is round', () => {
    const keys = placeKeys({
      face: { shape: 'circle', diameter: 60 },
      footprint: { kind: 'circle', diameter: 8.3 },
      margin: 2,
      count: 3,
      keyLabel: 'k',
    });
    // Centres reach 30 − 4.15 − 2 = 23.85 mm out; an inscribed equilateral triangle has sides √3 · 23.85 (derived).
    const side = Math.sqrt(3) * 23.85;
    for (let i = 0; i < 3; i++) {
      const [p, q] = [keys[i]!, keys[(i + 1) % 3]!];
      expect(Math.hypot(p[0] - q[0], p[1] - q[1])).toBeGreaterThan(side * 0.98);
    }
  });

  it('keeps the walls when the face is an L or a U', () => {
    for (const face of [L_SHAPE, U_SHAPE]) {
      for (const count of [2, 3, 5]) {
        const keys = placeKeys({ face, footprint: POCKET_10, margin: 3, count, keyLabel: 'k' });
        expect(keys).toHaveLength(count);
        expectLegal(face, POCKET_10, 3, keys);
      }
    }
  });

  it('gives the same keys when the polygon is wound the other way', () => {
    const reversed: Face = {
      shape: 'polygon',
      points: [...(U_SHAPE as { points: Array<[number, number]> }).points].reverse(),
    };
    const params = { footprint: POCKET_10, margin: 3, count: 4, keyLabel: 'k' };
    expect(placeKeys({ face: reversed, ...params })).toEqual(placeKeys({ face: U_SHAPE, ...params }));
  });

  it('places only two keys when the face leaves no room to stagger three', () => {
    // 100 × 16.8 face: centres may only move 16.8 − 16.4 = 0.4 mm across (derived), under MIN_STAGGER_MM.
    const face: Face = { shape: 'rect', width: 100, height: 16.8 };
    expect(placeKeys({ face, footprint: POCKET_10, margin: 3, keyLabel: 'a 10 mm key' })).toHaveLength(2);
    const error = thrown(() => placeKeys({ face, footprint: POCKET_10, margin: 3, count: 3, keyLabel: 'a 10 mm key' }));
    expect(error.code).toBe('NO_ROOM_FOR_KEYS');
    expect(error.message).toBe(
      '3 keys (a 10 mm key with 3 mm walls) would all sit on one line: this face leaves 0.4 mm across that line to stagger them, at least 0.5 mm is needed; ask for 2 keys or use a wider face',
    );
  });

  it('staggers a row of keys when the face is only just wide enough', () => {
    const face: Face = { shape: 'rect', width: 100, height: 17 };
    const keys = placeKeys({ face, footprint: POCKET_10, margin: 3, keyLabel: 'k' });
    expect(keys.length).toBeGreaterThanOrEqual(3);
    expect(oracleWidth(keys)).toBeGreaterThanOrEqual(MIN_STAGGER_MM - 1e-9);
    expectLegal(face, POCKET_10, 3, keys);
  });

  it('lets pockets touch but never overlap when the margin is 0', () => {
    const face: Face = { shape: 'rect', width: 20.8, height: 10.4 };
    expect(placeKeys({ face, footprint: POCKET_10, margin: 0, keyLabel: 'k' })).toEqual([
      [-5.2, 0],
      [5.2, 0],
    ]);
  });

  it('answers well under a second when the face is a 1000-point polygon and 64 keys are asked for', () => {
    const points: Array<[number, number]> = Array.from({ length: 1000 }, (_, i) => {
      const a = (2 * Math.PI * i) / 1000;
      const r = i % 2 ? 100 : 80;
      return [r * Math.cos(a), r * Math.sin(a)];
    });
    const face: Face = { shape: 'polygon', points };
    const run = () => placeKeys({ face, footprint: POCKET_10, margin: 3, count: 64, keyLabel: 'k' });
    const keys = run();
    // A guard against unbounded work (the candidate cap), not a speed target: those live in `npm run bench`.
    const ms = Math.min(...[0, 1, 2].map(() => timed(run)));
    expect(keys).toHaveLength(64);
    expect(ms, `took ${ms.toFixed(0)} ms`).toBeLessThan(5000);
    expectLegal(face, POCKET_10, 3, keys);
  });

  it('does not change its inputs and repeats itself exactly when called twice', () => {
    const face: Face = {
      shape: 'polygon',
      points: [
        [-40, -40],
        [40, -40],
        [40, -20],
        [-20, -20],
        [-20, 40],
        [-40, 40],
      ],
    };
    const copy = structuredClone(face);
    const first = placeKeys({ face, footprint: POCKET_10, margin: 3, count: 6, keyLabel: 'k' });
    expect(placeKeys({ face, footprint: POCKET_10, margin: 3, count: 6, keyLabel: 'k' })).toEqual(first);
    expect(face).toEqual(copy);
  });

  it('refuses a polygon face that crosses itself', () => {
    const error = thrown(() =>
      placeKeys({
        face: {
          shape: 'polygon',
          points: [
            [0, 0],
            [50, 50],
            [50, 0],
            [0, 50],
          ],
        },
        footprint: POCKET_10,
        margin: 3,
        keyLabel: 'k',
      }),
    );
    expect(error.code).toBe('POLYGON_INVALID');
  });

  it('throws a RangeError when a size is not a positive number', () => {
    const face: Face = { shape: 'rect', width: 80, height: 60 };
    expect(() => placeKeys({ face, footprint: { kind: 'circle', diameter: -1 }, margin: 3, keyLabel: 'k' })).toThrow(
      RangeError,
    );
    expect(() => placeKeys({ face, footprint: POCKET_10, margin: Number.NaN, keyLabel: 'k' })).toThrow(RangeError);
    expect(() => placeKeys({ face, footprint: POCKET_10, margin: 3, count: 2.5, keyLabel: 'k' })).toThrow(RangeError);
  });
});
