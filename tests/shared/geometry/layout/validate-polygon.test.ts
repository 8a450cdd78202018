import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GeometryError } from '../../../../shared/geometry/geometry-error';
import { validatePolygon } from '../../../../shared/geometry/layout';
import { convexFaceArb, starFaceArb } from './layout-arbitraries';
import { segsMeet } from './layout-oracle';

type Pts = Array<[number, number]>;

function failure(points: Pts): GeometryError | null {
  try {
    validatePolygon(points);
    return null;
  } catch (e) {
    if (e instanceof GeometryError) return e;
    throw e;
  }
}

function timed(run: () => unknown): number {
  const start = performance.now();
  run();
  return performance.now() - start;
}

function star(n: number, inner: number, outer: number): Pts {
  return Array.from({ length: n }, (_, i) => {
    const a = (2 * Math.PI * i) / n;
    const r = i % 2 ? outer : inner;
    return [r * Math.cos(a), r * Math.sin(a)];
  });
}

/** Brute force, every pair of edges: the independent reference for random outlines. */
function selfContact(points: Pts): boolean {
  const n = points.length;
  for (let a = 0; a < n; a++) {
    for (let b = a + 1; b < n; b++) {
      const adjacent = b === a + 1 || (a === 0 && b === n - 1);
      if (adjacent) continue;
      if (segsMeet(points[a]!, points[(a + 1) % n]!, points[b]!, points[(b + 1) % n]!)) return true;
    }
  }
  return false;
}

describe('validatePolygon', () => {
  it('refuses a bow-tie and names the crossing edges when two edges cross', () => {
    const error = failure([
      [0, 0],
      [10, 10],
      [10, 0],
      [0, 10],
    ]);
    expect(error?.code).toBe('POLYGON_INVALID');
    expect(error?.message).toBe('the face outline crosses itself: edges 1–2 and 3–4 cross near (5.0, 5.0)');
  });

  it('accepts a 1000-point star when it is simple, without a blow-up', () => {
    const points = star(1000, 80, 100);
    expect(failure(points)).toBeNull();
    // A guard against a quadratic blow-up or a hang, not a speed target (speed is measured in `npm run bench`):
    // the bound is far above the few milliseconds a sweep takes, so a busy machine cannot fail it.
    expect(Math.min(...[0, 1, 2].map(() => timed(() => failure(points))))).toBeLessThan(2000);
  });

  it('refuses a 1000-point outline, without a blow-up, when one spike crosses the far side', () => {
    const points = star(1000, 80, 100);
    points[250] = [0, -150]; // the top spike now reaches through the bottom of the star
    expect(failure(points)?.code).toBe('POLYGON_INVALID');
    expect(Math.min(...[0, 1, 2].map(() => timed(() => failure(points))))).toBeLessThan(2000);
  });

  it('refuses an outline when it touches itself at a point', () => {
    const error = failure([
      [0, 0],
      [4, 0],
      [2, 2],
      [4, 4],
      [0, 4],
      [2, 2],
    ]);
    expect(error?.message).toMatch(
      /^the face outline crosses itself: edges \d–\d and \d–\d touch near \(2\.0, 2\.0\)$/,
    );
  });

  it('refuses an outline when it doubles back along itself', () => {
    expect(
      failure([
        [0, 0],
        [10, 0],
        [5, 0],
        [5, 5],
      ])?.message,
    ).toMatch(/edges .* (touch|overlap) near/);
  });

  it('refuses fewer than 3 distinct points', () => {
    expect(
      failure([
        [0, 0],
        [0, 0],
        [1, 1],
      ])?.message,
    ).toBe('a polygon face needs at least 3 distinct points; this one has 2');
  });

  it('refuses points that enclose no area when they all lie on one line', () => {
    expect(
      failure([
        [0, 0],
        [1, 1],
        [2, 2],
        [3, 3],
      ])?.message,
    ).toBe('the face outline encloses no area: its points all lie on one line');
  });

  it('refuses a point that is not a finite number', () => {
    expect(
      failure([
        [0, 0],
        [Number.NaN, 1],
        [2, 0],
      ])?.message,
    ).toBe('point 2 of the face is not a finite [x, y] in mm');
  });

  it('refuses more than 1000 points as too much work', () => {
    const error = failure(star(1002, 80, 100));
    expect(error?.code).toBe('WORK_LIMIT');
    expect(error?.message).toBe('a polygon face may have at most 1000 points; this one has 1002');
  });

  it('accepts a closing point equal to the first and repeated points when the outline is simple, without a blow-up', () => {
    expect(
      failure([
        [0, 0],
        [10, 0],
        [10, 0],
        [10, 10],
        [0, 10],
        [0, 0],
      ]),
    ).toBeNull();
  });

  it('accepts star-shaped and convex outlines in either winding', () => {
    fc.assert(
      fc.property(fc.oneof(starFaceArb, convexFaceArb), (face) => {
        const points = (face as { points: Pts }).points;
        expect(failure(points)).toBeNull();
        expect(failure([...points].reverse())).toBeNull();
      }),
      { numRuns: 200 },
    );
  });

  it('refuses a convex outline when two neighbouring points are swapped', () => {
    fc.assert(
      fc.property(convexFaceArb, fc.nat(), (face, at) => {
        const points = [...(face as { points: Pts }).points];
        fc.pre(points.length >= 4);
        const k = at % points.length;
        const k1 = (k + 1) % points.length;
        [points[k], points[k1]] = [points[k1]!, points[k]!];
        expect(failure(points)?.code).toBe('POLYGON_INVALID');
      }),
      { numRuns: 200 },
    );
  });

  it('agrees with a brute-force check of every edge pair when the points are random', () => {
    const pointArb = fc.tuple(fc.integer({ min: -50, max: 50 }), fc.integer({ min: -50, max: 50 }));
    fc.assert(
      fc.property(
        fc.uniqueArray(pointArb, { minLength: 4, maxLength: 9, selector: ([x, y]) => `${x},${y}` }),
        (raw) => {
          const points = raw.map(([x, y]): [number, number] => [x + 0.1 * Math.sin(x * y), y + 0.1 * Math.cos(x + y)]);
          const error = failure(points);
          if (error?.message.startsWith('the face outline encloses no area')) return;
          expect(error !== null).toBe(selfContact(points));
        },
      ),
      { numRuns: 500 },
    );
  });
});
