import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { keySection } from '../../../../shared/geometry/section/key-section';
import { offsetConvexPolygon } from '../../../../shared/geometry/section/offset-convex-polygon';
import { pocketSection } from '../../../../shared/geometry/section/pocket-section';
import type { Vec2 } from '../../../../shared/geometry/units';

/** Distance from the centre to the line of each edge i (corner i to i + 1), mm. */
const edgeDistances = (p: readonly Vec2[]) =>
  p.map((a, i) => {
    const b = p[(i + 1) % p.length]!;
    return Math.abs(a[0] * b[1] - a[1] * b[0]) / Math.hypot(b[0] - a[0], b[1] - a[1]);
  });
const angle = ([x, y]: Vec2) => Math.atan2(y, x);

describe('pocketSection', () => {
  it('is the key section itself, value for value, when the shape is square, rect or hex', () => {
    for (const params of [
      { shape: 'square', width: 10 },
      { shape: 'rect', width: 6, length: 9 },
      { shape: 'hex', width: 8 },
    ] as const) {
      // Same numbers in, same numbers out: the cutters (and so the STL files) of these kits are unchanged.
      expect(pocketSection(params)).toEqual(keySection(params));
    }
  });

  it('circumscribes the circle with the key corners’ directions when the shape is round', () => {
    const key = keySection({ shape: 'round', width: 8, chordTolerance: 0.02 });
    const pocket = pocketSection({ shape: 'round', width: 8, chordTolerance: 0.02 });
    expect(pocket).toHaveLength(32);
    // Elementary geometry: a regular n-gon with apothem a circumscribes the circle of radius a, and its
    // corners lie at a / cos(π/n).
    for (const d of edgeDistances(pocket)) expect(d).toBeCloseTo(4, 12);
    for (const [x, y] of pocket) expect(Math.hypot(x, y)).toBeCloseTo(4 / Math.cos(Math.PI / 32), 12);
    // Corner i of the pocket lies on the ray through corner i of the key: the rings loft corner to corner.
    pocket.forEach((p, i) => expect(angle(p)).toBeCloseTo(angle(key[i]!), 12));
    // Facets still face ±x: flat to flat across x is the diameter.
    const xs = pocket.map(([x]) => x);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(8, 12);
  });

  it('grows to flats at r + c on every side when offset by the clearance c', () => {
    const grown = offsetConvexPolygon(pocketSection({ shape: 'round', width: 8, chordTolerance: 0.5 }), 0.16);
    // 8 segments at a 0.5 mm tolerance; flats at 4.16 mm: 8.32 mm flat to flat (derived: 8 + 2 × 0.16).
    expect(grown).toHaveLength(8);
    for (const d of edgeDistances(grown)) expect(d).toBeCloseTo(4.16, 12);
  });

  it('keeps the flat line and moves only the arc chords out when a round key has a flat', () => {
    const params = { shape: 'round', width: 8, flat: 1 } as const;
    const key = keySection(params);
    const pocket = pocketSection(params);
    expect(pocket).toHaveLength(key.length);
    const d = edgeDistances(pocket);
    // The closing edge is the flat, 4 − 1 = 3 mm from the centre facing −x; every other edge is tangent to r.
    expect(d[d.length - 1]).toBeCloseTo(3, 12);
    for (const x of d.slice(0, -1)) expect(x).toBeCloseTo(4, 12);
    expect(Math.min(...pocket.map(([x]) => x))).toBeCloseTo(-3, 12);
  });

  it('contains the key with its flats tangent to r for any diameter, tolerance and flat', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 100, noNaN: true }),
        fc.double({ min: 0.001, max: 0.5, noNaN: true }),
        fc.double({ min: 0, max: 0.25, noNaN: true }),
        (width, chordTolerance, flatShare) => {
          const flat = flatShare * width >= 0.02 ? flatShare * width : 0;
          const params = { shape: 'round', width, chordTolerance, flat } as const;
          const key = keySection(params);
          const pocket = pocketSection(params);
          expect(pocket).toHaveLength(key.length);
          const d = edgeDistances(pocket);
          const arcs = flat > 0 ? d.slice(0, -1) : d;
          for (const x of arcs) expect(Math.abs(x - width / 2)).toBeLessThan(1e-9 * width);
          if (flat > 0) expect(Math.abs(d[d.length - 1]! - (width / 2 - flat))).toBeLessThan(1e-9 * width);
        },
      ),
    );
  });
});
