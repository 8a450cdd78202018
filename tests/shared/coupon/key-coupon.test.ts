import { beforeAll, describe, expect, it } from 'vitest';
import { buildCoupon } from '../../../shared/coupon/build-coupon';
import { keyCoupon, COUPON_FLOOR_MM } from '../../../shared/coupon/key-coupon';
import { couponRequestSchema, type ResolvedKeyCouponRequest } from '../../../shared/schemas/coupon-request';
import { MARK_DEPTH_MM } from '../../../shared/geometry/coupon/graded-block';
import { edgeCheck } from '../../helpers/mesh/edge-check';
import { loadManifold, manifoldOf } from '../../helpers/mesh/manifold-check';
import { threeParse } from '../../helpers/mesh/stl-readers';
import {
  boundaryGap,
  convexHull,
  edgeDistances,
  keyInFace,
  type Point,
  snapStep,
} from '../../helpers/mesh/section-gap';
import { sliceMesh, support } from '../../helpers/mesh/slice-mesh';
import { extent, sliceNear } from './coupon-helpers';

type Wasm = Awaited<ReturnType<typeof loadManifold>>;
const keyRequest = (key: Record<string, unknown>, extra: Record<string, unknown> = {}) =>
  couponRequestSchema.parse({ joint: 'key', material: 'PLA', key, ...extra }) as ResolvedKeyCouponRequest;

describe('keyCoupon', () => {
  let wasm: Wasm;
  beforeAll(async () => {
    wasm = await loadManifold();
  });

  it('grades 9 pockets from 0.00 to 0.40 mm in 0.05 mm steps, marked 1 to 9, by default', () => {
    const { manifest } = keyCoupon(wasm, keyRequest({ shape: 'square', width: 8, depth: 4 }));
    expect(manifest.pockets.map((p) => p.mark)).toEqual(['1', '2', '3', '4', '5', '6', '7', '8', '9']);
    expect(manifest.pockets.map((p) => p.clearancePerSide)).toEqual([0, 0.05, 0.1, 0.15, 0.2, 0.25, 0.3, 0.35, 0.4]);
    const plate = manifest.parts.find((p) => p.role === 'coupon-plate')!;
    // Issue 7: a plate no larger than about 100 × 40 × 6 mm by default.
    expect(plate.bbox.max[0] - plate.bbox.min[0]).toBeLessThanOrEqual(100);
    expect(plate.bbox.max[1] - plate.bbox.min[1]).toBeLessThanOrEqual(40);
    expect(plate.bbox.max[2] - plate.bbox.min[2]).toBeLessThanOrEqual(6);
    expect(manifest.parts.find((p) => p.role === 'key')!.quantity).toBe(9);
  });

  it('builds a closed, outward plate without T-junctions that manifold-3d accepts', () => {
    const { meshes } = keyCoupon(wasm, keyRequest({ shape: 'round', width: 6, depth: 4 }));
    const plate = meshes.get('coupon-plate.stl')!;
    // Every directed edge once and its reverse once (3MF Core Specification §4.1, REFERENCES §3.2).
    expect(edgeCheck(plate)).toMatchObject({ unmatched: 0, repeated: 0, degenerate: 0 });
    expect(manifoldOf(wasm, plate).status).toBe('NoError');
  });

  it.each([
    ['square', { shape: 'square', width: 8, depth: 4 }],
    ['hex', { shape: 'hex', width: 7, depth: 4 }],
    ['rect', { shape: 'rect', width: 6, length: 9, depth: 5 }],
    // Round pockets circumscribe the circle r + c with flats facing ±x (pocketSection), so across x too.
    ['round', { shape: 'round', width: 6, depth: 4 }],
  ])('makes each %s pocket key width + 2 × its clearance wide at mid-depth, within 1 µm', (_name, key) => {
    const request = keyRequest(key);
    const { manifest, meshes } = keyCoupon(wasm, request);
    const plate = meshes.get('coupon-plate.stl')!;
    const thickness = plate ? manifest.parts[0]!.bbox.max[2] : 0;
    const pocketDepth = thickness - COUPON_FLOOR_MM;
    for (const pocket of manifest.pockets) {
      const points = sliceNear(plate, thickness - pocketDepth / 2, pocket.position, key.width / 2 + 1, 7);
      const measured = extent(points).x;
      expect(Math.abs(measured - (key.width + 2 * pocket.clearancePerSide))).toBeLessThan(0.001);
    }
  });

  it.each([
    ['clearance', { shape: 'round', width: 8, depth: 4 }],
    ['scale', { shape: 'round', width: 8, depth: 4, strategy: 'scale' }],
    ['clearance, with a flat', { shape: 'round', width: 8, depth: 4, flat: 0.8 }],
  ])(
    'leaves at least each grade between its key and its round pocket, flats at r + grade, when the strategy is %s',
    (_name, key) => {
      const request = keyRequest(key);
      const { manifest, meshes } = keyCoupon(wasm, request);
      const plate = meshes.get('coupon-plate.stl')!;
      const top = manifest.parts[0]!.bbox.max[2];
      const r = key.width / 2;
      const flat = 'flat' in key ? key.flat : 0;
      const byScale = 'strategy' in key;
      for (const pocket of manifest.pockets) {
        const c = pocket.clearancePerSide;
        const keyMesh = meshes.get(pocket.keyFile ?? 'key.stl')!;
        const s = pocket.keyScale ?? 1;
        // The key rests on its flat, s·(r − flat) below its axis; a full round key is symmetric about it.
        const mid = sliceMesh(keyMesh, 0, 0.013).map(([, z]) => z);
        const axisZ = flat > 0 ? s * (r - flat) : (Math.min(...mid) + Math.max(...mid)) / 2;
        // manifold-3d keeps the plate's corners as float32 (≤ 4e-6 mm at 50 mm); the key file is snapped.
        const tol = Math.SQRT2 * snapStep(keyMesh) + 1e-5;
        const reach = r + c + 1;
        // Below the engraved marks (0.6 mm), at mid-depth and just above the pocket floor.
        for (const z of [top - 0.9, top - key.depth / 2, top - key.depth + 0.3]) {
          const points = sliceNear(plate, z, pocket.position, reach, reach);
          const hole = convexHull(
            points.map(([x, y]) => [x - pocket.position[0], y - pocket.position[1]] as Point),
            1e-3,
          );
          for (const at of [-2, 0.013, 2.9]) {
            const keyHull = keyInFace(keyMesh, at, axisZ, 1e-3);
            expect(boundaryGap(keyHull, hole)).toBeGreaterThanOrEqual(c - tol);
          }
          // Elementary geometry: a polygon whose every edge line lies at a from the centre circumscribes the
          // circle of radius a; here a = r + c (r for the scale strategy's nominal pockets). A flat is its
          // own line, r − flat + c out on the −x side.
          const grown = byScale ? 0 : c;
          const leftmost = Math.min(...hole.map(([x]) => x));
          edgeDistances(hole).forEach((d, i) => {
            const ends = [hole[i]!, hole[(i + 1) % hole.length]!];
            const isFlat = flat > 0 && ends.every(([x]) => Math.abs(x - leftmost) < 1e-4);
            expect(Math.abs(d - (isFlat ? r - flat + grown : r + grown))).toBeLessThan(0.001);
          });
          // Flats face ±x and ±y (n a multiple of 4): 2(r + c) flat to flat, the declared key width + 2 × grade.
          if (flat === 0) {
            expect(Math.abs(support(hole, [1, 0]) + support(hole, [-1, 0]) - (key.width + 2 * grown))).toBeLessThan(
              1e-5,
            );
            expect(Math.abs(support(hole, [0, 1]) + support(hole, [0, -1]) - (key.width + 2 * grown))).toBeLessThan(
              1e-5,
            );
          }
        }
      }
    },
  );

  it('engraves a distinct mark in front of each pocket, left to right in grade order', () => {
    const { manifest, meshes } = keyCoupon(
      wasm,
      keyRequest({ shape: 'square', width: 8, depth: 4 }, { clearanceFrom: 0.1, clearanceTo: 0.3 }),
    );
    const plate = meshes.get('coupon-plate.stl')!;
    const top = manifest.parts[0]!.bbox.max[2];
    const xs = manifest.pockets.map((p) => p.position[0]);
    expect([...xs].sort((a, b) => a - b)).toEqual(xs);
    const shapes = manifest.pockets.map((p) => {
      // Just below the top face, the engraving's walls show up in front of (below, in y) each pocket.
      const label = sliceNear(plate, top - MARK_DEPTH_MM / 2, [p.position[0], p.position[1] - 8], 4.5, 3.4);
      expect(label.length).toBeGreaterThan(0);
      const e = extent(label);
      return `${e.x.toFixed(2)}×${e.y.toFixed(2)}:${label.length}`;
    });
    expect(new Set(shapes).size).toBe(shapes.length);
  });

  it('prints one scaled key per nominal pocket with the scale strategy', () => {
    const { manifest, meshes } = keyCoupon(
      wasm,
      keyRequest({ shape: 'square', width: 10, depth: 4, strategy: 'scale' }, { clearanceFrom: 0, clearanceTo: 0.1 }),
    );
    expect(manifest.pockets).toHaveLength(3);
    for (const pocket of manifest.pockets) {
      const key = meshes.get(pocket.keyFile!)!;
      // A key laid on the bed runs along x; its section shows in a cut across x at its middle.
      const bbox = manifest.parts.find((p) => p.file === pocket.keyFile)!.bbox;
      expect(bbox.max[2] - bbox.min[2]).toBeCloseTo(10 * pocket.keyScale!, 4);
      expect(edgeCheck(key).unmatched).toBe(0);
      // 99 % of a 10 mm key leaves 0.05 mm per side (common practice; REFERENCES "facts of the trade").
      if (pocket.clearancePerSide === 0.05) expect(pocket.keyScale).toBeCloseTo(0.99, 9);
    }
  });
});

describe('buildCoupon', () => {
  it('writes STLs that an independent reader parses, and a README with the legend and cautions', async () => {
    const wasm = await loadManifold();
    const { manifest, files } = buildCoupon(wasm, keyRequest({ shape: 'square', width: 8, depth: 4 }));
    for (const part of manifest.parts) {
      const file = files.find((f) => f.name === part.file)!;
      // three.js STLLoader (independent reader) sees as many triangles as the manifest says.
      expect(threeParse(file.bytes).length / 9).toBe(part.triangles);
    }
    const readme = new TextDecoder().decode(files.find((f) => f.name === 'README.txt')!.bytes);
    expect(readme).toContain('- 5: 0.20 mm');
    expect(readme).toMatch(/Do not scale/);
    expect(readme).toMatch(/CAUTIONS/);
  });

  it('is deterministic: the same request gives byte-identical files', async () => {
    const wasm = await loadManifold();
    const a = buildCoupon(wasm, keyRequest({ shape: 'hex', width: 6, depth: 3 }));
    const b = buildCoupon(wasm, keyRequest({ shape: 'hex', width: 6, depth: 3 }));
    expect(a.files.map((f) => Buffer.from(f.bytes).toString('base64'))).toEqual(
      b.files.map((f) => Buffer.from(f.bytes).toString('base64')),
    );
  });
});
