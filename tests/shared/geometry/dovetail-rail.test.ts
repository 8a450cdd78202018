import { describe, expect, it } from 'vitest';
import { dovetailRail } from '../../../shared/geometry/dovetail-rail';
import { geom3ToMesh, meshBounds, meshVolume } from '../../../shared/geometry/mesh';
import { radians } from '../../../shared/geometry/units';
import { edgeCheck } from '../../helpers/mesh/edge-check';
import { expectRelative } from '../../helpers/mesh/expect-relative';
import { sliceMesh } from '../../helpers/mesh/slice-mesh';

const rail = (slope: number, chamfer = 0) =>
  geom3ToMesh(
    dovetailRail({
      rootWidth: 10,
      height: 6,
      flankAngle: radians(Math.atan(1 / slope)),
      x: 5,
      y0: -20,
      y1: 30,
      chamfer,
    }),
  );

/**
 * Flank angle from the vertical, in degrees, measured on a slice across a tall, short rail at y = 0. Tall
 * because the STL corners are snapped to a grid of 1e-5 × the mean bounding-box side: over a 40 mm flank that
 * moves the angle by at most ~3e-4°, below the 5e-4° the checks allow.
 */
function flankAngleDeg(slope: number): number {
  const h = 40;
  const mesh = geom3ToMesh(
    dovetailRail({ rootWidth: 10, height: h, flankAngle: radians(Math.atan(1 / slope)), x: 0, y0: -2, y1: 2 }),
  );
  const pts = sliceMesh(mesh, 1, 0); // [x, z]
  const bottom = Math.max(...pts.filter(([, z]) => Math.abs(z) < 1e-3).map(([x]) => x));
  const top = Math.max(...pts.filter(([, z]) => Math.abs(z - h) < 1e-3).map(([x]) => x));
  return (Math.atan2(top - bottom, h) * 180) / Math.PI;
}

describe('dovetailRail', () => {
  it('leans its flanks arctan(1/6) = 9.4623° out from the vertical when the slope is 1:6', () => {
    // Woodworking references (REFERENCES §6: Popular Woodworking, Lee Valley): 1:6 for softwood ≈ 9.46°.
    expect(flankAngleDeg(6)).toBeCloseTo(9.4623, 3);
  });

  it('leans its flanks arctan(1/8) = 7.1250° out from the vertical when the slope is 1:8', () => {
    // Same references: 1:8 for hardwood ≈ 7.125°.
    expect(flankAngleDeg(8)).toBeCloseTo(7.125, 3);
  });

  it('stands on the face from y0 to y1 at x when placed', () => {
    const b = meshBounds(rail(6));
    expect(b.min[2]).toBe(0);
    expect(b.max[2]).toBeCloseTo(6, 3);
    expect(b.min[1]).toBeCloseTo(-20, 3);
    expect(b.max[1]).toBeCloseTo(30, 3);
    expect((b.min[0] + b.max[0]) / 2).toBeCloseTo(5, 3);
  });

  it('has the trapezoid prism volume less its chamfered ends when chamfered (derived)', () => {
    const c = 0.5;
    const top = 10 + 2;
    const area = ((10 + top) / 2) * 6;
    // End ring: flanks and top moved in by c, base kept; with t = tan θ = 1/6 and k = c·√(1 + t²):
    const k = c * Math.sqrt(1 + 1 / 36);
    const endArea = ((10 - 2 * k + (top - 2 * k - (2 * c) / 6)) / 2) * (6 - c);
    const midK = k / 2;
    const midArea = ((10 - 2 * midK + (top - 2 * midK - c / 6)) / 2) * (6 - c / 2);
    const ends = 2 * (c / 6) * (area + 4 * midArea + endArea);
    const mesh = rail(6, c);
    expect(edgeCheck(mesh)).toMatchObject({ unmatched: 0, repeated: 0, degenerate: 0 });
    expectRelative(meshVolume(mesh), area * (50 - 2 * c) + ends);
  });
});
