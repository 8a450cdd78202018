import { describe, expect, it } from 'vitest';
import { geom3ToMesh, meshVolume } from '../../../../shared/geometry/mesh';
import { loftSolid } from '../../../../shared/geometry/solid/loft-solid';
import type { Vec2 } from '../../../../shared/geometry/units';
import { edgeCheck } from '../../../helpers/mesh/edge-check';
import { expectRelative } from '../../../helpers/mesh/expect-relative';

const square = (h: number): Vec2[] => [
  [-h, -h],
  [h, -h],
  [h, h],
  [-h, h],
];

describe('loftSolid', () => {
  it('makes a closed outward cube when two equal squares are stacked', () => {
    const mesh = geom3ToMesh(
      loftSolid([
        { w: 0, ring: square(5) },
        { w: 10, ring: square(5) },
      ]),
    );
    expect(edgeCheck(mesh)).toMatchObject({ unmatched: 0, repeated: 0, degenerate: 0 });
    expectRelative(meshVolume(mesh), 1000);
  });

  it('matches the prismatoid formula h/6 · (A0 + 4·Am + A1) when the rings differ (derived)', () => {
    const mesh = geom3ToMesh(
      loftSolid([
        { w: 0, ring: square(5) },
        { w: 3, ring: square(2) },
      ]),
    );
    // Linear corner interpolation makes the section area quadratic in w, so Simpson's rule is exact.
    expectRelative(meshVolume(mesh), (3 / 6) * (100 + 4 * 49 + 16));
  });

  it('keeps faces outward when the placement is a proper rotation', () => {
    const mesh = geom3ToMesh(
      loftSolid(
        [
          { w: 0, ring: square(1) },
          { w: 4, ring: square(1) },
        ],
        (u, v, w) => [u, -w, v],
      ),
    );
    expectRelative(meshVolume(mesh), 16);
    expect(edgeCheck(mesh).unmatched).toBe(0);
  });
});
