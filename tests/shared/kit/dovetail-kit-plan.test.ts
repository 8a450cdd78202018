import { describe, expect, it } from 'vitest';
import { geom3ToMesh, meshBounds } from '../../../shared/geometry/mesh';
import { dovetailKitPlan } from '../../../shared/kit/dovetail-kit-plan';
import { kitRequestSchema, type ResolvedDovetailKitRequest } from '../../../shared/schemas/kit-request';
import { dovetailBody } from './kit-fixtures';

const plan = (dovetail: Record<string, unknown>) =>
  dovetailKitPlan(
    kitRequestSchema.parse({
      ...dovetailBody,
      dovetail: { ...dovetailBody.dovetail, ...dovetail },
    }) as ResolvedDovetailKitRequest,
  );

describe('dovetailKitPlan', () => {
  it('builds 1:8 rails when the slope is given as 7.125° (woodworking references, REFERENCES §6)', () => {
    const p = plan({ angleDeg: 7.125 });
    expect(p.derived.slope).toBeCloseTo(8, 3);
    expect(p.derived.topWidth).toBeCloseTo(10 + (2 * 6) / 8, 3);
  });

  it('stops the slots a wall short of the +y edge when there is an end stop', () => {
    const p = plan({ endStop: true, endStopWall: 4 });
    const slots = meshBounds(geom3ToMesh(p.parts[1]!.solid));
    const rails = meshBounds(geom3ToMesh(p.parts[0]!.solid));
    expect(slots.max[1]).toBeCloseTo(26, 3);
    expect(slots.min[1]).toBeCloseTo(-31, 3);
    expect(rails.max[1]).toBeCloseTo(26 - p.clearancePerSide, 3);
  });

  it('spaces the rails by the pitch around the face centre when a pitch is given', () => {
    const p = plan({ pitch: 25 });
    expect(p.parts[0]!.positions!.map(([x]) => x)).toEqual([-25, 0, 25]);
    expect(p.derived.pitch).toBe(25);
  });
});
