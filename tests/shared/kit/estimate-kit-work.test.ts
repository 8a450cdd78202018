import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildKit } from '../../../shared/kit/build-kit';
import { estimateKitWork } from '../../../shared/kit/estimate-kit-work';
import { assertKitWithinBudget, MAX_KIT_STL_BYTES } from '../../../shared/kit/kit-work-budget';
import { kitRequestSchema } from '../../../shared/schemas/kit-request';
import { GeometryError } from '../../../shared/geometry/geometry-error';

const keyKit = (key: Record<string, unknown>, extra: Record<string, unknown> = {}) =>
  kitRequestSchema.parse({
    joint: 'key',
    material: 'PLA',
    fit: 'snug',
    face: { shape: 'rect', width: 400, height: 400 },
    key: { depth: 8, ...key },
    ...extra,
  });

function actual(request: ReturnType<typeof keyKit>) {
  const kit = buildKit(request);
  const stl = kit.files.filter((f) => f.name.endsWith('.stl'));
  return {
    triangles: kit.manifest.parts.reduce((sum, p) => sum + p.triangles, 0),
    stlBytes: stl.reduce((sum, f) => sum + f.bytes.byteLength, 0),
  };
}

describe('estimateKitWork', () => {
  it('bounds the triangles and STL bytes of the kit that is then built, for any key kit', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('square', 'rect', 'round', 'hex'),
        fc.double({ min: 3, max: 20, noNaN: true }),
        fc.option(fc.integer({ min: 1, max: 12 }), { nil: undefined }),
        fc.constantFrom(0.005, 0.02, 0.1),
        fc.constantFrom('binary', 'ascii'),
        (shape, width, count, chordTolerance, format) => {
          const request = keyKit(
            { shape, width, length: shape === 'rect' ? width / 2 : undefined, count },
            { chordTolerance, format },
          );
          const estimate = estimateKitWork(request);
          const built = actual(request);
          expect(estimate.triangles).toBeGreaterThanOrEqual(built.triangles);
          expect(estimate.stlBytes).toBeGreaterThanOrEqual(built.stlBytes);
          // A bound, but not a wild one: within a factor of three of the real kit when the count is given.
          if (count !== undefined) expect(estimate.triangles).toBeLessThan(3 * built.triangles);
        },
      ),
      { numRuns: 25 },
    );
  });

  it('counts at most as many keys as the face can hold when the count is left to the layout', () => {
    const request = kitRequestSchema.parse({
      joint: 'key',
      material: 'PLA',
      fit: 'snug',
      face: { shape: 'rect', width: 30, height: 30 },
      key: { shape: 'square', width: 10, depth: 8 },
    });
    // 900 mm² of face over 100 mm² of key section: no more than 9 pockets can fit.
    expect(estimateKitWork(request).pieces).toBe(9);
  });
});

describe('assertKitWithinBudget', () => {
  it('lets every ordinary kit through', () => {
    expect(() => assertKitWithinBudget(keyKit({ shape: 'round', width: 8, count: 64 }))).not.toThrow();
  });

  it('refuses 64 fine round keys as ASCII with the size, the limit and what to change', () => {
    const request = keyKit({ shape: 'round', width: 40, count: 64 }, { chordTolerance: 0.001, format: 'ascii' });
    let error: unknown;
    try {
      assertKitWithinBudget(request);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(GeometryError);
    expect((error as GeometryError).code).toBe('WORK_LIMIT');
    const message = (error as GeometryError).message;
    expect(message).toMatch(/could be up to \d+\.\d MB of STL/);
    expect(message).toContain(`at most ${(MAX_KIT_STL_BYTES / 1e6).toFixed(1)} MB`);
    expect(message).toContain('64 round keys');
    expect(message).toContain('a coarser chord tolerance (now 0.001 mm');
    expect(message).toContain('binary STL');
  });
});
