import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { distanceToFaceEdge, faceArea, faceBounds, faceSpanAtX, pointInFace } from '../../../../shared/geometry/layout';
import type { Face } from '../../../../shared/schemas/face';
import { faceArb, starFaceArb } from './layout-arbitraries';
import { segDist, winding } from './layout-oracle';

const RECT: Face = { shape: 'rect', width: 80, height: 60 };
const CIRCLE: Face = { shape: 'circle', diameter: 10 };
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
const reversed = (face: Face): Face =>
  face.shape === 'polygon' ? { shape: 'polygon', points: [...face.points].reverse() } : face;

describe('faceBounds', () => {
  it('centres rect and round faces on the origin', () => {
    expect(faceBounds(RECT)).toEqual({ minX: -40, minY: -30, maxX: 40, maxY: 30 });
    expect(faceBounds(CIRCLE)).toEqual({ minX: -5, minY: -5, maxX: 5, maxY: 5 });
  });

  it('takes a polygon box from its points', () => {
    expect(
      faceBounds({
        shape: 'polygon',
        points: [
          [1, 2],
          [5, -3],
          [-2, 4],
        ],
      }),
    ).toEqual({ minX: -2, minY: -3, maxX: 5, maxY: 4 });
  });
});

describe('faceArea', () => {
  it('multiplies the sides of a rect face and uses πr² for a round one', () => {
    expect(faceArea(RECT)).toBe(4800);
    expect(faceArea(CIRCLE)).toBeCloseTo(Math.PI * 25, 12);
  });

  it('gives a non-convex polygon the same area in either winding', () => {
    // Derived: the 80 × 80 square less the 60 × 60 notch.
    expect(faceArea(L_SHAPE)).toBe(2800);
    expect(faceArea(reversed(L_SHAPE))).toBe(2800);
  });

  it('approaches the circle area when a polygon has many points on a circle', () => {
    const points = Array.from({ length: 1000 }, (_, i): [number, number] => [
      50 * Math.cos((2 * Math.PI * i) / 1000),
      50 * Math.sin((2 * Math.PI * i) / 1000),
    ]);
    expect(faceArea({ shape: 'polygon', points }) / (Math.PI * 2500)).toBeCloseTo(1, 4);
  });
});

describe('faceSpanAtX', () => {
  it('gives the full height of a rect face inside it and null outside', () => {
    expect(faceSpanAtX(RECT, 39)).toEqual({ minY: -30, maxY: 30 });
    expect(faceSpanAtX(RECT, 41)).toBeNull();
  });

  it('follows the circle when the face is round', () => {
    // 3-4-5 triangle (derived).
    expect(faceSpanAtX(CIRCLE, 3)).toEqual({ minY: -4, maxY: 4 });
    expect(faceSpanAtX(CIRCLE, -6)).toBeNull();
  });

  it('takes the overall extent across a gap when the polygon is not convex', () => {
    expect(faceSpanAtX(U_SHAPE, 0)).toEqual({ minY: -30, maxY: -10 });
    expect(faceSpanAtX(U_SHAPE, 30)).toEqual({ minY: -30, maxY: 30 });
    expect(faceSpanAtX(reversed(U_SHAPE), 40)).toEqual({ minY: -30, maxY: 30 });
    expect(faceSpanAtX(U_SHAPE, 40.5)).toBeNull();
  });

  it('ends on the face edge when the line crosses the face', () => {
    fc.assert(
      fc.property(faceArb, fc.double({ min: 0.01, max: 0.99, noNaN: true }), (face, t) => {
        const box = faceBounds(face);
        const x = box.minX + t * (box.maxX - box.minX);
        const span = faceSpanAtX(face, x);
        expect(span).not.toBeNull();
        const scale = Math.max(box.maxX - box.minX, box.maxY - box.minY);
        expect(distanceToFaceEdge(face, [x, span!.minY])).toBeLessThan(1e-9 * scale + 1e-9);
        expect(distanceToFaceEdge(face, [x, span!.maxY])).toBeLessThan(1e-9 * scale + 1e-9);
      }),
      { numRuns: 200 },
    );
  });
});

describe('pointInFace', () => {
  it('counts the edge as inside', () => {
    expect(pointInFace(RECT, [40, 30])).toBe(true);
    expect(pointInFace(CIRCLE, [3, 4])).toBe(true);
    expect(pointInFace(L_SHAPE, [-20, 0])).toBe(true);
  });

  it('leaves out the notch of an L in either winding', () => {
    for (const face of [L_SHAPE, reversed(L_SHAPE)]) {
      expect(pointInFace(face, [0, 0])).toBe(false);
      expect(pointInFace(face, [-30, 30])).toBe(true);
      expect(pointInFace(face, [30, -30])).toBe(true);
    }
  });

  it('agrees with a winding-number test when the polygon is random', () => {
    fc.assert(
      fc.property(
        starFaceArb,
        fc.double({ min: -1.2, max: 1.2, noNaN: true }),
        fc.double({ min: -1.2, max: 1.2, noNaN: true }),
        (face, u, v) => {
          const box = faceBounds(face);
          const p: [number, number] = [u * Math.max(-box.minX, box.maxX), v * Math.max(-box.minY, box.maxY)];
          const points = (face as { points: Array<[number, number]> }).points;
          fc.pre(distanceToFaceEdge(face, p) > 1e-6);
          expect(pointInFace(face, p)).toBe(winding(points, p) !== 0);
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('distanceToFaceEdge', () => {
  it('measures to the nearest side inside a rect and to the corner outside it', () => {
    expect(distanceToFaceEdge(RECT, [0, 0])).toBe(30);
    expect(distanceToFaceEdge(RECT, [43, 34])).toBe(5); // 3-4-5 from the corner (derived)
  });

  it('measures along the radius when the face is round', () => {
    expect(distanceToFaceEdge(CIRCLE, [0, 0])).toBe(5);
    expect(distanceToFaceEdge(CIRCLE, [0, 8])).toBe(3);
  });

  it('agrees with the nearest edge found by brute force when the polygon is random', () => {
    fc.assert(
      fc.property(
        starFaceArb,
        fc.double({ min: -1.5, max: 1.5, noNaN: true }),
        fc.double({ min: -1.5, max: 1.5, noNaN: true }),
        (face, u, v) => {
          const box = faceBounds(face);
          const p: [number, number] = [u * box.maxX, v * box.maxY];
          const points = (face as { points: Array<[number, number]> }).points;
          const expected = Math.min(...points.map((a, i) => segDist(p, a, points[(i + 1) % points.length]!)));
          expect(distanceToFaceEdge(face, p)).toBeCloseTo(expected, 9);
        },
      ),
      { numRuns: 300 },
    );
  });
});
