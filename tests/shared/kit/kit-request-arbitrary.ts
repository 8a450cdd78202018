import fc from 'fast-check';
import type { KitRequest } from '../../../shared/schemas/kit-request';

const materials = ['PLA', 'PETG', 'ABS', 'ASA', 'PA', 'TPU', 'resin-standard', 'resin-tough'] as const;
const fits = ['press', 'snug', 'slide'] as const;
const mm = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
/** Chamfers and flats below 0.02 mm are outside the valid space (the schema rejects them): use 0 then. */
const feature = (v: number) => (v < 0.02 ? 0 : v);

/** Faces roomy enough for a few keys or rails: rect, circle, a convex hexagon and a non-convex L. */
const faceArb = fc.oneof(
  fc.record({ shape: fc.constant('rect' as const), width: mm(70, 160), height: mm(60, 140) }),
  fc.record({ shape: fc.constant('circle' as const), diameter: mm(80, 160) }),
  mm(45, 80).map((r) => ({
    shape: 'polygon' as const,
    points: Array.from(
      { length: 6 },
      (_, i) => [r * Math.cos((i * Math.PI) / 3), r * Math.sin((i * Math.PI) / 3)] as [number, number],
    ),
  })),
  mm(70, 120).map((s) => ({
    shape: 'polygon' as const,
    points: [
      [-s, -s],
      [s, -s],
      [s, 0],
      [0, 0],
      [0, s],
      [-s, s],
    ] as Array<[number, number]>,
  })),
);

const shared = {
  material: fc.constantFrom(...materials),
  fit: fc.constantFrom(...fits),
  chordTolerance: mm(0.005, 0.2),
};

/**
 * Valid key kit requests across the whole parameter space the schema allows (sizes kept to what a few
 * keys need on the faces above): every shape, both strategies, chamfers, gaps, flats and entry chamfers.
 */
export const keyRequestArb: fc.Arbitrary<KitRequest> = fc
  .record({
    shape: fc.constantFrom('square', 'rect', 'round', 'hex'),
    width: mm(3, 16),
    length: mm(3, 16),
    depth: mm(2, 14),
    endGap: mm(0, 1),
    bottomGap: fc.option(mm(0, 1), { nil: undefined }),
    chamferFraction: fc.option(mm(0, 1), { nil: undefined }),
    entryFraction: mm(0, 0.9),
    flatFraction: mm(0, 1),
    count: fc.option(fc.integer({ min: 1, max: 4 }), { nil: undefined }),
    margin: mm(0.8, 3),
    scale: fc.option(fc.double({ min: 0.81, max: 1, noNaN: true }), { nil: undefined }),
    strategy: fc.constantFrom('clearance', 'scale', undefined),
    face: faceArb,
    ...shared,
  })
  .map((r) => {
    const flat = r.shape === 'round' ? feature(r.flatFraction > 0.5 ? ((r.flatFraction - 0.5) / 2) * r.width : 0) : 0;
    const narrowest = r.shape === 'rect' ? Math.min(r.width, r.length) : r.width - flat;
    const keyLength = 2 * r.depth - r.endGap;
    const pocketDepth = keyLength / 2 + (r.bottomGap ?? r.endGap / 2);
    const chamfer =
      r.chamferFraction === undefined
        ? undefined
        : feature(r.chamferFraction * Math.min(0.4 * narrowest, keyLength / 4) * 0.99);
    const strategy = r.strategy === 'clearance' ? 'clearance' : r.strategy;
    return {
      joint: 'key' as const,
      material: r.material,
      fit: r.fit,
      chordTolerance: r.chordTolerance,
      face: r.face,
      key: {
        shape: r.shape,
        width: r.width,
        ...(r.shape === 'rect' ? { length: r.length } : {}),
        depth: r.depth,
        endGap: r.endGap,
        ...(r.bottomGap !== undefined ? { bottomGap: r.bottomGap } : {}),
        ...(chamfer !== undefined ? { chamfer } : {}),
        entryChamfer: feature(Math.min(r.entryFraction * 0.45 * pocketDepth, 5)),
        ...(flat > 0 ? { flat } : {}),
        ...(r.count !== undefined ? { count: r.count } : {}),
        margin: r.margin,
        ...(strategy !== undefined ? { strategy } : {}),
        ...(strategy !== 'clearance' && r.scale !== undefined ? { scale: r.scale } : {}),
      },
    };
  });

/** Valid dovetail kit requests: slopes 1:2…1:20 as ratio or angle, 1–3 rails, end stops, chamfers. */
export const dovetailRequestArb: fc.Arbitrary<KitRequest> = fc
  .record({
    rootWidth: mm(3, 12),
    height: mm(2, 10),
    slope: mm(2, 20),
    asAngle: fc.boolean(),
    count: fc.integer({ min: 1, max: 3 }),
    endStop: fc.boolean(),
    chamferFraction: fc.option(mm(0, 1), { nil: undefined }),
    margin: mm(0.8, 3),
    face: faceArb,
    ...shared,
  })
  .map((r) => ({
    joint: 'dovetail' as const,
    material: r.material,
    fit: r.fit,
    chordTolerance: r.chordTolerance,
    face: r.face,
    dovetail: {
      rootWidth: r.rootWidth,
      height: r.height,
      ...(r.asAngle ? { angleDeg: (Math.atan(1 / r.slope) * 180) / Math.PI } : { slope: r.slope }),
      count: r.count,
      endStop: r.endStop,
      margin: r.margin,
      ...(r.chamferFraction !== undefined
        ? { chamfer: feature(r.chamferFraction * Math.min(0.4 * r.rootWidth, r.height / 2) * 0.99) }
        : {}),
    },
  }));
