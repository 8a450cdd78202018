import { beforeAll, describe, expect, it } from 'vitest';
import { dovetailCoupon } from '../../../shared/coupon/dovetail-coupon';
import { couponRequestSchema, type ResolvedDovetailCouponRequest } from '../../../shared/schemas/coupon-request';
import { edgeCheck } from '../../helpers/mesh/edge-check';
import { loadManifold, manifoldOf } from '../../helpers/mesh/manifold-check';
import { extent, sliceNear } from './coupon-helpers';

type Wasm = Awaited<ReturnType<typeof loadManifold>>;
const request = (dovetail: Record<string, unknown>, extra: Record<string, unknown> = {}) =>
  couponRequestSchema.parse({
    joint: 'dovetail',
    material: 'PETG',
    dovetail,
    clearanceFrom: 0.1,
    clearanceTo: 0.3,
    ...extra,
  }) as ResolvedDovetailCouponRequest;

describe('dovetailCoupon', () => {
  let wasm: Wasm;
  beforeAll(async () => {
    wasm = await loadManifold();
  });

  it('builds a closed slot block and a rail on a base, both accepted by manifold-3d', () => {
    const { meshes } = dovetailCoupon(wasm, request({ rootWidth: 8, height: 5, slope: 6 }));
    for (const file of ['slot-block.stl', 'rail.stl']) {
      const mesh = meshes.get(file)!;
      expect(edgeCheck(mesh)).toMatchObject({ unmatched: 0, repeated: 0, degenerate: 0 });
      expect(manifoldOf(wasm, mesh).status).toBe('NoError');
    }
  });

  it('makes each slot wider than the rail by its clearance measured square to each flank, within 1 µm', () => {
    const slope = 6;
    const { manifest, meshes } = dovetailCoupon(wasm, request({ rootWidth: 8, height: 5, slope }));
    const block = meshes.get('slot-block.stl')!;
    const top = manifest.parts[0]!.bbox.max[2];
    const angle = Math.atan(1 / slope); // 1:6 → 9.4623° (woodworking references, REFERENCES §6)
    const v = 2; // 2 mm into the slot from the open face
    for (const slot of manifest.pockets) {
      const points = sliceNear(block, top - v, [slot.position[0], 0], 6.5, 9);
      const measured = extent(points).x;
      // Rail width at v plus the clearance moved along each flank's normal: c / cos(angle) across.
      const expected = 8 + 2 * v * Math.tan(angle) + (2 * slot.clearancePerSide) / Math.cos(angle);
      expect(Math.abs(measured - expected)).toBeLessThan(0.001);
    }
  });

  it('marks the slots 1, 2, 3 for 0.10, 0.20 and 0.30 mm', () => {
    const { manifest } = dovetailCoupon(wasm, request({ rootWidth: 8, height: 5 }, { clearanceStep: 0.1 }));
    expect(manifest.pockets.map((p) => [p.mark, p.clearancePerSide])).toEqual([
      ['1', 0.1],
      ['2', 0.2],
      ['3', 0.3],
    ]);
  });
});

describe('couponRequestSchema', () => {
  it('refuses a range that gives more grades than a coupon holds, with the numbers', () => {
    const r = couponRequestSchema.safeParse({
      joint: 'key',
      material: 'PLA',
      key: { shape: 'square', width: 8, depth: 4 },
      clearanceStep: 0.01,
    });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.message).toContain('41 grades');
  });

  it('refuses clearanceTo below clearanceFrom', () => {
    const r = couponRequestSchema.safeParse({
      joint: 'key',
      material: 'PLA',
      key: { shape: 'square', width: 8, depth: 4 },
      clearanceFrom: 0.3,
      clearanceTo: 0.1,
    });
    expect(r.error!.issues[0]!.path).toEqual(['clearanceTo']);
  });
});
