import { describe, expect, it } from 'vitest';
import { geom3ToMesh, meshBounds, meshVolume } from '../../../shared/geometry/mesh';
import { CUTTER_OVERSHOOT_MM, pocketCutter } from '../../../shared/geometry/pocket-cutter';
import { keySection } from '../../../shared/geometry/section/key-section';
import { pocketSection } from '../../../shared/geometry/section/pocket-section';
import { edgeCheck } from '../../helpers/mesh/edge-check';
import { sliceMesh, support } from '../../helpers/mesh/slice-mesh';

const square = keySection({ shape: 'square', width: 10 });
const frustum = (a0: number, a1: number, h: number) => (h / 3) * (a0 + a1 + Math.sqrt(a0 * a1));

describe('pocketCutter', () => {
  it('reaches depth into half A and 1 mm past the face into half B when the half is A', () => {
    const b = meshBounds(geom3ToMesh(pocketCutter({ section: square, clearance: 0.15, depth: 8, half: 'A' })));
    expect(b.min[2]).toBeCloseTo(-8, 3);
    expect(b.max[2]).toBeCloseTo(CUTTER_OVERSHOOT_MM, 3);
    expect(b.max[0]).toBeCloseTo(5.15, 3);
  });

  it('is half A mirrored in z = 0 when the half is B', () => {
    const b = meshBounds(
      geom3ToMesh(pocketCutter({ section: square, clearance: 0.15, depth: 8, half: 'B', entryChamfer: 0.5 })),
    );
    expect(b.min[2]).toBeCloseTo(-1, 3);
    expect(b.max[2]).toBeCloseTo(8, 3);
  });

  it('has the prism-plus-flare volume when there is an entry chamfer (derived)', () => {
    const g = 10.3;
    const e = 0.5;
    const expected = g * g * (8 - e) + frustum(g * g, (g + 2 * e) ** 2, e) + (g + 2 * e) ** 2 * CUTTER_OVERSHOOT_MM;
    const mesh = geom3ToMesh(pocketCutter({ section: square, clearance: 0.15, depth: 8, half: 'A', entryChamfer: e }));
    expect(edgeCheck(mesh)).toMatchObject({ unmatched: 0, repeated: 0, degenerate: 0 });
    expect(meshVolume(mesh)).toBeCloseTo(expected, 1);
  });

  it('moves every flat of a hex out by the clearance when measured on a slice at mid-depth', () => {
    const hex = keySection({ shape: 'hex', width: 8 });
    const slice = sliceMesh(
      geom3ToMesh(pocketCutter({ section: hex, clearance: 0.2, depth: 8, half: 'A', position: [3, -2] })),
      2,
      -4,
    );
    for (let k = 0; k < 6; k++) {
      const d = [Math.cos((k * Math.PI) / 3), Math.sin((k * Math.PI) / 3)] as const;
      const centre = 3 * d[0] - 2 * d[1];
      // Apothem of the hex is w/2 = 4 mm; the pocket's is 4.2 mm.
      expect(support(slice, d) - centre).toBeCloseTo(4.2, 3);
    }
  });

  it('puts every flat of a round pocket at r + clearance, in the flare at r + clearance + entry, when measured on slices', () => {
    const section = pocketSection({ shape: 'round', width: 8, chordTolerance: 0.02 });
    const mesh = geom3ToMesh(pocketCutter({ section, clearance: 0.16, depth: 8, half: 'A', entryChamfer: 0.5 }));
    expect(edgeCheck(mesh)).toMatchObject({ unmatched: 0, repeated: 0, degenerate: 0 });
    // 32 flats facing k · 2π/32; elementary geometry: an n-gon whose flats all lie at a from the centre
    // circumscribes the circle of radius a. Mouth at z = 0: the flare adds the entry chamfer.
    for (const [z, apothem] of [
      [-4, 4.16],
      [-0.001, 4.16 + 0.5 - 0.001],
    ] as const) {
      const slice = sliceMesh(mesh, 2, z);
      for (let k = 0; k < 32; k++) {
        const d = [Math.cos((k * Math.PI) / 16), Math.sin((k * Math.PI) / 16)] as const;
        expect(support(slice, d)).toBeCloseTo(apothem, 3);
      }
    }
  });
});
