// fast-check generators for faces, footprints and layout requests over the valid parameter space.
import fc from 'fast-check';
import type { Face } from '../../../../shared/schemas/face';
import type { Footprint } from '../../../../shared/geometry/layout';

const mm = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

export const rectFaceArb: fc.Arbitrary<Face> = fc.record({
  shape: fc.constant('rect' as const),
  width: mm(1, 400),
  height: mm(1, 400),
});
export const circleFaceArb: fc.Arbitrary<Face> = fc.record({
  shape: fc.constant('circle' as const),
  diameter: mm(1, 400),
});

/** Star-shaped about the origin: vertices in angle order, every angular gap under 180°. */
export const starFaceArb: fc.Arbitrary<Face> = fc
  .record({
    weights: fc.array(mm(1, 2), { minLength: 4, maxLength: 60 }),
    radii: fc.array(mm(0.3, 1), { minLength: 60, maxLength: 60 }),
    size: mm(10, 300),
    turn: mm(0, 6.28),
    reverse: fc.boolean(),
  })
  .map(({ weights, radii, size, turn, reverse }) => {
    const total = weights.reduce((s, w) => s + w, 0);
    let angle = turn;
    const points = weights.map((w, i): [number, number] => {
      const r = size * radii[i]!;
      const p: [number, number] = [r * Math.cos(angle), r * Math.sin(angle)];
      angle += (2 * Math.PI * w) / total;
      return p;
    });
    return { shape: 'polygon' as const, points: reverse ? points.reverse() : points };
  });

/** Convex: points on an ellipse in angle order. */
export const convexFaceArb: fc.Arbitrary<Face> = fc
  .record({
    weights: fc.array(mm(1, 3), { minLength: 3, maxLength: 40 }),
    rx: mm(5, 300),
    ry: mm(5, 300),
    reverse: fc.boolean(),
  })
  .map(({ weights, rx, ry, reverse }) => {
    const total = weights.reduce((s, w) => s + w, 0);
    let angle = 0;
    const points = weights.map((w): [number, number] => {
      const p: [number, number] = [rx * Math.cos(angle), ry * Math.sin(angle)];
      angle += (2 * Math.PI * w) / total;
      return p;
    });
    return { shape: 'polygon' as const, points: reverse ? points.reverse() : points };
  });

export const faceArb: fc.Arbitrary<Face> = fc.oneof(rectFaceArb, circleFaceArb, starFaceArb, convexFaceArb);

export const footprintArb: fc.Arbitrary<Footprint> = fc.oneof(
  fc.record({ kind: fc.constant('rect' as const), width: mm(0.5, 40), height: mm(0.5, 40) }),
  fc.record({ kind: fc.constant('circle' as const), diameter: mm(0.5, 40) }),
);

export const marginArb = mm(0, 10);
export const countArb = fc.option(fc.integer({ min: 1, max: 12 }), { nil: undefined });
