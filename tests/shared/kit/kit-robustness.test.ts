import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GeometryError } from '../../../shared/geometry/geometry-error';
import { summarizeKit } from '../../../shared/kit';
import { kitRequestSchema } from '../../../shared/schemas/kit-request';

const mm = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const maybe = <T>(a: fc.Arbitrary<T>) => fc.option(a, { nil: undefined });

/** Raw bodies over the schema's full ranges, most of them impossible to build; the schema sorts them out. */
const wideBody = fc.record({
  joint: fc.constantFrom('key', 'dovetail'),
  material: fc.constantFrom('PLA', 'PETG', 'TPU', 'resin-standard'),
  fit: fc.constantFrom('press', 'snug', 'slide'),
  clearance: maybe(mm(0, 1)),
  calibrationOffset: maybe(mm(-0.5, 0.5)),
  chordTolerance: mm(0.001, 0.5),
  face: fc.oneof(
    fc.record({ shape: fc.constant('rect'), width: mm(1, 2000), height: mm(1, 2000) }),
    fc.record({ shape: fc.constant('circle'), diameter: mm(1, 2000) }),
    fc.record({
      shape: fc.constant('polygon'),
      points: fc.array(fc.tuple(mm(-300, 300), mm(-300, 300)), { minLength: 3, maxLength: 12 }),
    }),
  ),
  key: fc.record({
    shape: fc.constantFrom('square', 'rect', 'round', 'hex'),
    width: mm(1, 100),
    length: maybe(mm(1, 100)),
    depth: mm(1, 100),
    count: maybe(fc.integer({ min: 1, max: 64 })),
    margin: maybe(mm(0.4, 50)),
    strategy: maybe(fc.constantFrom('clearance', 'scale')),
    endGap: maybe(mm(0, 5)),
    flat: maybe(mm(0, 25)),
  }),
  dovetail: fc.record({
    rootWidth: mm(2, 100),
    height: mm(1, 50),
    slope: maybe(mm(2, 20)),
    length: maybe(mm(4, 2000)),
    count: maybe(fc.integer({ min: 1, max: 16 })),
    pitch: maybe(mm(1, 500)),
    endStop: maybe(fc.boolean()),
    margin: maybe(mm(0.4, 50)),
  }),
});

describe('summarizeKit', () => {
  it('throws nothing but a GeometryError when any request the schema accepts cannot be built', () => {
    let accepted = 0;
    fc.assert(
      fc.property(wideBody, (raw) => {
        const body = JSON.parse(JSON.stringify(raw));
        if (body.joint === 'key') delete body.dovetail;
        const parsed = kitRequestSchema.safeParse(body);
        if (!parsed.success) return;
        accepted++;
        try {
          summarizeKit(parsed.data);
        } catch (error) {
          expect(error).toBeInstanceOf(GeometryError);
          expect((error as GeometryError).message.length).toBeGreaterThan(10);
        }
      }),
      { numRuns: Number(process.env.KIT_PROPERTY_RUNS ?? 60) },
    );
    expect(accepted).toBeGreaterThan(10);
  });
});
