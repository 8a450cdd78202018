import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { GeometryError } from '../../../shared/geometry/geometry-error';
import type { TriangleMesh } from '../../../shared/geometry/mesh';
import { geom3ToMesh, meshVolume } from '../../../shared/geometry/mesh';
import { keySection } from '../../../shared/geometry/section/key-section';
import { pocketSection } from '../../../shared/geometry/section/pocket-section';
import { writeBinaryStl } from '../../../shared/geometry/stl';
import { buildKit } from '../../../shared/kit/build-kit';
import { dovetailKitPlan } from '../../../shared/kit/dovetail-kit-plan';
import { keyFootprint } from '../../../shared/kit/key-footprint';
import { keyKitPlan } from '../../../shared/kit/key-kit-plan';
import {
  kitRequestSchema,
  type ResolvedKeyKitRequest,
  type ResolvedKitRequest,
} from '../../../shared/schemas/kit-request';
import { edgeCheck } from '../../helpers/mesh/edge-check';
import { loadManifold, manifoldOf } from '../../helpers/mesh/manifold-check';
import { near, sliceMesh, support } from '../../helpers/mesh/slice-mesh';
import { readBinaryStl, referenceStl } from '../../helpers/mesh/stl-readers';
import { dovetailRequestArb, keyRequestArb } from './kit-request-arbitrary';
import { snapStep } from '../../helpers/mesh/section-gap';

const anyRequestArb = fc.oneof(keyRequestArb, dovetailRequestArb);
// Modest by default so the suite stays quick; raise KIT_PROPERTY_RUNS for a deeper search.
const RUNS = Number(process.env.KIT_PROPERTY_RUNS ?? 40);

/** Builds the kit, or undefined when the layout says (with a GeometryError) that it does not fit. */
function tryBuild(request: ResolvedKitRequest): ReturnType<typeof buildKit> | undefined {
  try {
    return buildKit(request);
  } catch (error) {
    if (error instanceof GeometryError) return undefined;
    throw error;
  }
}

function meshOfFile(bytes: Uint8Array): TriangleMesh {
  const { records, count } = readBinaryStl(bytes);
  const positions = new Float32Array(count * 9);
  const normals = new Float32Array(count * 3);
  for (let t = 0; t < count; t++) {
    normals.set(records.subarray(t * 12, t * 12 + 3), t * 3);
    positions.set(records.subarray(t * 12 + 3, t * 12 + 12), t * 9);
  }
  return { positions, normals };
}

let built = 0;
let tried = 0;

describe('buildKit', () => {
  let wasm: Awaited<ReturnType<typeof loadManifold>>;
  beforeAll(async () => {
    wasm = await loadManifold();
  });

  it('makes every part a closed, outward 2-manifold that manifold-3d accepts with the same volume when the request is valid', () => {
    fc.assert(
      fc.property(anyRequestArb, (body) => {
        tried++;
        const kit = tryBuild(kitRequestSchema.parse(body));
        if (!kit) return;
        built++;
        kit.manifest.parts.forEach((part, i) => {
          const mesh = meshOfFile(kit.files[i]!.bytes);
          expect(edgeCheck(mesh)).toMatchObject({ unmatched: 0, repeated: 0, degenerate: 0 });
          const volume = meshVolume(mesh);
          expect(volume).toBeGreaterThan(0);
          expect(part.triangles).toBe(mesh.normals.length / 3);
          // manifold-3d 3.5.4, an independent manifold library: status NoError and the same volume.
          const m = manifoldOf(wasm, mesh);
          expect(m.status).toBe('NoError');
          expect(Math.abs(m.volume - volume) / volume).toBeLessThan(1e-5);
        });
      }),
      { numRuns: RUNS },
    );
    // The arbitraries are meant to fit: most requests must really build.
    expect(built).toBeGreaterThan(tried * 0.7);
  });

  it('writes byte-identical files when the same request is built twice', () => {
    fc.assert(
      fc.property(anyRequestArb, (body) => {
        const a = tryBuild(kitRequestSchema.parse(body));
        const b = tryBuild(kitRequestSchema.parse(structuredClone(body)));
        expect(a?.files.map((f) => f.name)).toEqual(b?.files.map((f) => f.name));
        a?.files.forEach((f, i) =>
          expect(Buffer.compare(Buffer.from(f.bytes), Buffer.from(b!.files[i]!.bytes))).toBe(0),
        );
      }),
      { numRuns: RUNS / 2 },
    );
  });

  it('writes the same records as @jscad/stl-serializer (the reference writer) for every part when the request is valid', () => {
    fc.assert(
      fc.property(anyRequestArb, (body) => {
        const request = kitRequestSchema.parse(body);
        let plan;
        try {
          plan = request.joint === 'key' ? keyKitPlan(request) : dovetailKitPlan(request);
        } catch (error) {
          if (error instanceof GeometryError) return;
          throw error;
        }
        for (const part of plan.parts) {
          const mine = writeBinaryStl(geom3ToMesh(part.solid));
          const ref = referenceStl(part.solid);
          expect(mine.byteLength).toBe(ref.byteLength);
          // Same triangles, same order, same orientation: every byte after the 80-byte header agrees.
          expect(Buffer.compare(Buffer.from(mine.subarray(80)), Buffer.from(ref.subarray(80)))).toBe(0);
        }
      }),
      { numRuns: RUNS / 2 },
    );
  });
});

describe('keyKitPlan', () => {
  it('leaves the declared clearance per side between every pocket and the key at mid-depth when the kit builds', () => {
    fc.assert(
      fc.property(keyRequestArb, (body) => {
        const request = kitRequestSchema.parse(body) as ResolvedKeyKitRequest;
        const kit = tryBuild(request);
        if (!kit) return;
        checkPocketsHoldKey(request, kit);
      }),
      { numRuns: RUNS },
    );
  });
});

function checkPocketsHoldKey(request: ResolvedKeyKitRequest, kit: ReturnType<typeof buildKit>): void {
  const k = request.key;
  const { manifest } = kit;
  const keyMesh = meshOfFile(kit.files[0]!.bytes);
  const s = manifest.keyScale ?? 1;
  const growth = manifest.keyScale === undefined ? manifest.clearancePerSide : 0;
  const params = {
    shape: k.shape,
    width: k.width,
    length: k.length,
    flat: k.flat,
    chordTolerance: request.chordTolerance,
  };
  const section = keySection(params).map(([x, y]) => [x, y] as [number, number]);
  // The pocket's nominal outline: the key's section, or for a round key the polygon circumscribing its
  // circle, with edges parallel to the key's (pocketSection).
  const outline = pocketSection(params).map(([x, y]) => [x, y] as [number, number]);
  // The key lies on the bed, axis along x, lifted so its lowest point is at z = 0 (keyOnBed): bed (y, z)
  // is face (z + s · min x of the section, −y). Slice it across the middle of its length.
  const lift = s * Math.min(...section.map(([x]) => x));
  const keySlice = sliceMesh(keyMesh, 0, 1e-7).map(([y, z]) => [z + lift, -y] as [number, number]);
  const depth = (2 * k.depth - k.endGap) / 2 + k.bottomGap;
  const dirs = section.map((p, i) => {
    const q = section[(i + 1) % section.length]!;
    const len = Math.hypot(q[0] - p[0], q[1] - p[1]);
    return [(q[1] - p[1]) / len, -(q[0] - p[0]) / len] as [number, number];
  });
  for (const half of ['A', 'B'] as const) {
    const part = manifest.parts.find((p) => p.role === 'pocket-cutter' && p.half === half)!;
    const mesh = meshOfFile(kit.files[manifest.parts.indexOf(part)]!.bytes);
    const slice = sliceMesh(mesh, 2, half === 'A' ? -depth / 2 : depth / 2);
    // Each corner moves up to half a grid step per axis when snapped, so a support distance along a unit
    // direction moves up to √2/2 grid steps; √2 × the sum bounds a difference of two, plus float32 rounding.
    const tol = Math.SQRT2 * (snapStep(mesh) + snapStep(keyMesh)) + 1e-5;
    // Pockets are kept `margin` apart around their layout footprints: half a margin round one picks it alone.
    const foot = keyFootprint(outline, growth + k.entryChamfer, k.shape === 'round');
    for (const p of part.positions!) {
      const pocket = near(slice, p, foot, k.margin / 2);
      for (const d of dirs) {
        // One-sided support along each flat's outward normal. Strategy "clearance": the pocket's flat is its
        // nominal outline's moved out by c. Strategy "scale": the pocket is nominal and the key s × nominal
        // about the centre. The outline's flat is the key's (square, rect, hex) or tangent to r (round).
        const gap = support(pocket, d) - support(keySlice, d);
        expect(Math.abs(gap - growth - support(outline, d) + s * support(section, d))).toBeLessThan(tol);
      }
      // Across x (the direction `width` is measured in) the gap per side is the declared clearance.
      const width = (pts: Array<[number, number]>) => support(pts, [1, 0]) + support(pts, [-1, 0]);
      const across = (width(pocket) - width(keySlice)) / 2;
      if (k.shape !== 'round') expect(Math.abs(across - manifest.clearancePerSide)).toBeLessThan(tol);
    }
  }
}
