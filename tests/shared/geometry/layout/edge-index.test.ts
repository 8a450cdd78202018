import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { edgeIndex } from '../../../../shared/geometry/layout/edge-index';
import { edgeRectWall } from '../../../../shared/geometry/layout/edge-rect-wall';
import { edgeSignedDistance } from '../../../../shared/geometry/layout/edge-signed-distance';
import { polygonRing } from '../../../../shared/geometry/layout/polygon-ring';
import { ringSignedDistance } from '../../../../shared/geometry/layout/ring-signed-distance';
import { convexFaceArb, starFaceArb } from './layout-arbitraries';
import { oracleWall } from './layout-oracle';

type Pts = Array<[number, number]>;
const polygonArb = fc.oneof(starFaceArb, convexFaceArb).map((f) => (f as { points: Pts }).points);
const unit = fc.double({ min: -1.3, max: 1.3, noNaN: true });

function comb(): Pts {
  const points: Pts = [];
  for (let i = 0; i < 100; i++) points.push([i * 4, 0], [i * 4, 100], [i * 4 + 2, 100], [i * 4 + 2, 0]);
  points.push([400, 0], [400, -10], [0, -10]);
  return points;
}

describe('edgeSignedDistance', () => {
  it('matches the all-edges distance when the polygon and point are random', () => {
    fc.assert(
      fc.property(fc.oneof(polygonArb, fc.constant(comb())), unit, unit, (points, u, v) => {
        const ring = polygonRing(points);
        const p = [u * 420, v * 150] as const;
        const q = [
          u * Math.max(...points.map((a) => Math.abs(a[0]))),
          v * Math.max(...points.map((a) => Math.abs(a[1]))),
        ] as const;
        for (const [x, y] of [p, q]) {
          expect(edgeSignedDistance(edgeIndex(ring), x, y)).toBeCloseTo(ringSignedDistance(ring, x, y), 9);
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe('edgeRectWall', () => {
  it('matches an independent wall when the rectangle lies inside, and is negative otherwise', () => {
    fc.assert(
      fc.property(
        polygonArb,
        unit,
        unit,
        fc.double({ min: 0.1, max: 60, noNaN: true }),
        fc.double({ min: 0.1, max: 60, noNaN: true }),
        (points, u, v, w, h) => {
          const index = edgeIndex(polygonRing(points));
          const c: [number, number] = [
            u * Math.max(...points.map((a) => Math.abs(a[0]))),
            v * Math.max(...points.map((a) => Math.abs(a[1]))),
          ];
          const got = edgeRectWall(index, c[0], c[1], w / 2, h / 2);
          const expected = oracleWall({ shape: 'polygon', points }, { kind: 'rect', width: w, height: h }, c);
          if (expected === -Infinity) expect(got).toBeLessThan(0);
          else expect(got).toBeCloseTo(expected, 9);
        },
      ),
      { numRuns: 400 },
    );
  });
});
