import { describe, expect, it } from 'vitest';
import { dovetailRail } from '../../../shared/geometry/dovetail-rail';
import { dovetailSlotCutter } from '../../../shared/geometry/dovetail-slot-cutter';
import { geom3ToMesh, meshBounds } from '../../../shared/geometry/mesh';
import { radians } from '../../../shared/geometry/units';
import { edgeCheck } from '../../helpers/mesh/edge-check';
import { sliceMesh, support } from '../../helpers/mesh/slice-mesh';

const theta = Math.atan(1 / 6);
const section = { rootWidth: 10, height: 6, flankAngle: radians(theta) };

describe('dovetailSlotCutter', () => {
  it('leaves the clearance square to both flanks and above the top when compared with its rail', () => {
    const c = 0.2;
    const railSlice = sliceMesh(geom3ToMesh(dovetailRail({ ...section, x: 0, y0: -30, y1: 30 })), 1, 0);
    const slotMesh = geom3ToMesh(dovetailSlotCutter({ ...section, clearance: c, x: 0, y0: -31, y1: 31 }));
    expect(edgeCheck(slotMesh)).toMatchObject({ unmatched: 0, repeated: 0, degenerate: 0 });
    const slotSlice = sliceMesh(slotMesh, 1, 0);
    for (const d of [
      [Math.cos(theta), -Math.sin(theta)],
      [-Math.cos(theta), -Math.sin(theta)],
      [0, 1],
    ] as const) {
      expect(support(slotSlice, d) - support(railSlice, d)).toBeCloseTo(c, 3);
    }
  });

  it('reaches 1 mm below the face and spans y0 to y1 when placed', () => {
    const b = meshBounds(geom3ToMesh(dovetailSlotCutter({ ...section, clearance: 0.15, x: 30, y0: -31, y1: 25 })));
    expect(b.min[2]).toBeCloseTo(-1, 3);
    expect(b.max[2]).toBeCloseTo(6.15, 3);
    expect(b.min[1]).toBeCloseTo(-31, 3);
    expect(b.max[1]).toBeCloseTo(25, 3);
  });
});
