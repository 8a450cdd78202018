import { describe, expect, it } from 'vitest';
import { keyScaleForClearance, resolveClearance } from '../../../shared/fit';
import { geom3ToMesh } from '../../../shared/geometry/mesh';
import { keyKitPlan } from '../../../shared/kit/key-kit-plan';
import { kitRequestSchema, type ResolvedKeyKitRequest } from '../../../shared/schemas/kit-request';
import { near, sliceMesh, support } from '../../helpers/mesh/slice-mesh';
import { squareKeysBody } from './kit-fixtures';

const plan = (key: Record<string, unknown>) =>
  keyKitPlan(
    kitRequestSchema.parse({ ...squareKeysBody, key: { ...squareKeysBody.key, ...key } }) as ResolvedKeyKitRequest,
  );

/** Width across x of the key (bed z) and of the first pocket of half A, on slices through their middles. */
function widths(p: ReturnType<typeof plan>): { key: number; pocket: number } {
  const key = sliceMesh(geom3ToMesh(p.parts[0]!.solid), 0, 1e-7); // [y, z] on the bed; face x is bed z
  const pocketSlice = sliceMesh(geom3ToMesh(p.parts[1]!.solid), 2, -4);
  const pocket = near(pocketSlice, p.parts[1]!.positions![0]!, { kind: 'rect', width: 10.5, height: 10.5 }, 0.5);
  return {
    key: support(key, [0, 1]) + support(key, [0, -1]),
    pocket: support(pocket, [1, 0]) + support(pocket, [-1, 0]),
  };
}

describe('keyKitPlan', () => {
  it('leaves 0.05 mm per side when a 10 mm key is printed at 99 % (common practice)', () => {
    const p = plan({ strategy: 'scale', scale: 0.99 });
    expect(p.keyScale).toBe(0.99);
    expect(p.clearancePerSide).toBe(0.05);
    const w = widths(p);
    expect(w.key).toBeCloseTo(9.9, 3);
    expect(w.pocket).toBeCloseTo(10, 3);
    expect((w.pocket - w.key) / 2).toBeCloseTo(0.05, 3);
  });

  it('scales the key to leave the fit engine clearance when strategy is scale and no scale is given', () => {
    const c = resolveClearance({ material: 'PLA', fit: 'snug' }).clearancePerSide;
    const p = plan({ strategy: 'scale' });
    expect(p.keyScale).toBe(keyScaleForClearance(10, c));
    expect(p.clearancePerSide).toBeCloseTo(c, 9);
  });

  it('grows the pockets by the clearance and keeps the key nominal when strategy is clearance', () => {
    const p = plan({});
    const w = widths(p);
    expect(p.keyScale).toBeUndefined();
    expect(w.key).toBeCloseTo(10, 3);
    expect((w.pocket - w.key) / 2).toBeCloseTo(p.clearancePerSide, 3);
  });

  it('warns about the different gap along the length when a rect key is scaled', () => {
    const p = plan({ shape: 'rect', width: 6, length: 12, strategy: 'scale', scale: 0.98 });
    expect(p.warnings.join(' ')).toMatch(
      /0\.06 mm per side across its 6 mm width but 0\.12 mm per side along its 12 mm length/,
    );
  });

  it('places exactly the keys asked for and reports their length and pocket depth when count is given', () => {
    const p = plan({ endGap: 0.4 });
    expect(p.parts[1]!.positions).toHaveLength(8);
    expect(p.derived).toMatchObject({ keyCount: 8, keyLength: 15.6, pocketDepth: 8 });
  });
});
