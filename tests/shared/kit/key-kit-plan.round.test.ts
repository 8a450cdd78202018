import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { TriangleMesh } from '../../../shared/geometry/mesh';
import { buildKit } from '../../../shared/kit/build-kit';
import { keyKitPlan } from '../../../shared/kit/key-kit-plan';
import { kitRequestSchema, type ResolvedKeyKitRequest } from '../../../shared/schemas/kit-request';
import {
  boundaryGap,
  convexHull,
  edgeDistances,
  keyInFace,
  type Point,
  snapStep,
  solidTriangles,
} from '../../helpers/mesh/section-gap';
import { near, sliceMesh, support } from '../../helpers/mesh/slice-mesh';
import { readBinaryStl } from '../../helpers/mesh/stl-readers';

type Mesh = TriangleMesh | { readonly positions: Float64Array };

/** A round-key kit request: 8 mm keys and a 0.16 mm clearance per side unless `key` or `extra` say otherwise. */
const roundRequest = (key: Record<string, unknown> = {}, extra: Record<string, unknown> = {}) =>
  kitRequestSchema.parse({
    joint: 'key',
    material: 'PLA',
    fit: 'snug',
    clearance: 0.16,
    face: { shape: 'rect', width: 60, height: 40 },
    ...extra,
    key: { shape: 'round', width: 8, depth: 8, count: 4, ...key },
  }) as ResolvedKeyKitRequest;

function meshOf(bytes: Uint8Array): TriangleMesh {
  const { count, records } = readBinaryStl(bytes);
  const positions = new Float32Array(count * 9);
  for (let t = 0; t < count; t++) positions.set(records.subarray(12 * t + 3, 12 * t + 12), 9 * t);
  return { positions, normals: new Float32Array(count * 3) };
}

/** One height of one pocket: the pocket's and the key's sections there, centred on the pocket's axis. */
interface Cut {
  readonly z: number;
  readonly pocket: Point[];
  readonly key: Point[];
  /** True where the pocket is straight (below the entry flare) and the key at full section (between chamfers). */
  readonly straight: boolean;
}

/**
 * Slices the key file and both pocket-cutter files of a kit at five heights per half (in the entry flare,
 * the straight part and the key's chamfer), each pocket picked out by its declared position.
 * `exact`: the solids' float64 triangles before the STL snap; otherwise the written binary STL files.
 */
function cuts(
  request: ResolvedKeyKitRequest,
  exact: boolean,
): { kit: ReturnType<typeof buildKit>; cuts: Cut[]; tol: number } {
  const kit = buildKit(request);
  // buildKit meshes exactly these solids (meshKit → keyKitPlan); the STL files are them snapped to float32.
  const meshes: Mesh[] = exact
    ? keyKitPlan(request).parts.map((p) => solidTriangles(p.solid))
    : kit.files.slice(0, 3).map((f) => meshOf(f.bytes));
  // Snapped files move each corner up to half a grid step per axis: √2 × both steps bounds a gap's change.
  const tol = exact
    ? 1e-6
    : Math.SQRT2 * (snapStep(meshes[0] as TriangleMesh) + snapStep(meshes[1] as TriangleMesh)) + 1e-5;
  const k = request.key;
  const s = kit.manifest.keyScale ?? 1;
  const r = k.width / 2;
  const half = (s * (2 * k.depth - k.endGap)) / 2;
  // The key's axis on the bed (keyOnBed puts its lowest point at z = 0): a key with a flat rests on it, the
  // declared s·(r − flat) below the axis; a full round key is symmetric, so its axis is mid-height.
  const mid = sliceMesh(meshes[0]!, 0, 0.013).map(([, z]) => z);
  const axisZ = k.flat > 0 ? s * (r - k.flat) : (Math.min(...mid) + Math.max(...mid)) / 2;
  const flatness = exact ? 1e-9 : 1e-3;
  const mouth = k.width / 2 + kit.manifest.derived.pocketGrowthPerSide! + k.entryChamfer;
  // Any pocket lies within its mouth's corner circle, at most mouth / cos(π/8) (8 segments at the least).
  const foot = { kind: 'circle' as const, diameter: (2 * mouth) / Math.cos(Math.PI / 8) };
  const out: Cut[] = [];
  for (const [part, sign] of [
    [kit.manifest.parts[1]!, -1],
    [kit.manifest.parts[2]!, 1],
  ] as const) {
    for (const f of [0.03, 0.31, 0.57, 0.83, 0.99]) {
      const z = sign * f * half;
      const key = keyInFace(meshes[0]!, z, axisZ, flatness);
      const slice = sliceMesh(meshes[part.half === 'A' ? 1 : 2]!, 2, z);
      const straight = Math.abs(z) > k.entryChamfer && Math.abs(z) < half - s * k.chamfer;
      for (const p of part.positions!) {
        out.push({ z, key, straight, pocket: convexHull(near(slice, p, foot, k.margin / 2), flatness) });
      }
    }
  }
  return { kit, cuts: out, tol };
}

const across = (pts: readonly Point[], d: Point) => support(pts, d) + support(pts, [-d[0], -d[1]]);
const radius = (pts: readonly Point[]) => Math.max(...pts.map(([x, y]) => Math.hypot(x, y)));

const cases: Array<[string, Record<string, unknown>, Record<string, unknown>]> = [
  ['an 8 mm key, 0.16 mm clearance, 0.02 mm chords (default)', {}, {}],
  ['an 8 mm key, 0.16 mm clearance, 0.5 mm chords (coarse)', {}, { chordTolerance: 0.5 }],
  ['an 8 mm key with a 0.4 mm entry chamfer', { entryChamfer: 0.4 }, {}],
  ['an 8 mm key by the scale strategy', { strategy: 'scale' }, {}],
  ['an 8 mm key by the scale strategy, 0.5 mm chords', { strategy: 'scale' }, { chordTolerance: 0.5 }],
  ['an 8 mm key with a 0.8 mm flat', { flat: 0.8 }, {}],
  [
    'an 8 mm key with a 0.8 mm flat, 0.5 mm chords and an entry chamfer',
    { flat: 0.8, entryChamfer: 0.4 },
    { chordTolerance: 0.5 },
  ],
];

describe('keyKitPlan (round pockets, measured on the meshes)', () => {
  for (const [what, key, extra] of cases) {
    const request = roundRequest(key, extra);
    const k = request.key;

    it(`leaves at least the declared clearance between key and pocket at every height when ${what}`, () => {
      for (const exact of [true, false]) {
        const { kit, cuts: all, tol } = cuts(request, exact);
        const c = kit.manifest.clearancePerSide;
        expect(c).toBeCloseTo(0.16, 9);
        // Smallest distance from any corner or edge of the key's section to the pocket's boundary, and back.
        for (const cut of all) expect(boundaryGap(cut.key, cut.pocket)).toBeGreaterThanOrEqual(c - tol);
      }
    });

    it(`puts every flat of the pocket on the circle r + growth and every key corner on its circle when ${what}`, () => {
      const { kit, cuts: all } = cuts(request, true);
      const s = kit.manifest.keyScale ?? 1;
      const growth = kit.manifest.derived.pocketGrowthPerSide!;
      const r = k.width / 2;
      for (const cut of all.filter((x) => x.straight)) {
        // Elementary geometry: a polygon whose every edge line lies at distance a from the centre circumscribes
        // the circle of radius a (each edge is tangent to it). The flat of a flatted key is its own line,
        // r − flat out, moved by the growth like every other edge.
        const flatAt = r - k.flat + growth;
        const leftmost = Math.min(...cut.pocket.map(([x]) => x));
        const distances = edgeDistances(cut.pocket);
        distances.forEach((d, i) => {
          const ends = [cut.pocket[i]!, cut.pocket[(i + 1) % cut.pocket.length]!];
          const isFlat = k.flat > 0 && ends.every(([x]) => Math.abs(x - leftmost) < 1e-9);
          expect(Math.abs(d - (isFlat ? flatAt : r + growth))).toBeLessThan(1e-6);
        });
        if (k.flat > 0) expect(Math.abs(leftmost + flatAt)).toBeLessThan(1e-6);
        // Elementary geometry: a polygon with every corner at distance ρ from the centre is inscribed in the
        // circle of radius ρ; the key's circle is its declared diameter × its scale.
        for (const [x, y] of cut.key) expect(Math.abs(Math.hypot(x, y) - s * r)).toBeLessThan(1e-6);
      }
    });

    it(`declares a pocket size equal to the mesh's flat-to-flat and a key size equal to its corner-to-corner when ${what}`, () => {
      for (const exact of [true, false]) {
        const { kit, cuts: all, tol } = cuts(request, exact);
        const m = kit.manifest;
        const declaredPocket = m.request.joint === 'key' ? m.request.key.width + 2 * m.derived.pocketGrowthPerSide! : 0;
        const declaredKey = k.width * (m.keyScale ?? 1);
        // Both files are measured to 1e-6 mm before the STL snap, to the snap's bound (< 0.001 mm) after it.
        const within = exact ? 1e-6 : Math.max(tol, 1e-6);
        expect(within).toBeLessThan(0.001);
        for (const cut of all.filter((x) => x.straight)) {
          expect(Math.abs(2 * radius(cut.key) - declaredKey)).toBeLessThan(within);
          if (k.flat > 0) continue;
          // n is a multiple of 4 with flats facing ±x and ±y (segmentsForRadius): those are flat-to-flat.
          expect(Math.abs(across(cut.pocket, [1, 0]) - declaredPocket)).toBeLessThan(within);
          expect(Math.abs(across(cut.pocket, [0, 1]) - declaredPocket)).toBeLessThan(within);
        }
      }
    });
  }

  it('measures an 8 mm pocket at 8.32 mm flat to flat for a 0.16 mm clearance where it was 8.281 mm', () => {
    const { kit, cuts: all } = cuts(roundRequest(), false);
    const straight = all.filter((x) => x.straight);
    expect(straight.length).toBeGreaterThan(0);
    // 8 + 2 × 0.16 (derived); before the fix the flats were at 4·cos(π/32) + 0.16 = 4.1407 (8.2815 across).
    for (const cut of straight) expect(across(cut.pocket, [1, 0])).toBeCloseTo(8.32, 3);
    // The cutter's declared bounding box (0.001 mm steps) spans the pockets' flats across x.
    const xs = kit.manifest.parts[1]!.positions!.map(([x]) => x);
    const bbox = kit.manifest.parts[1]!.bbox;
    expect(bbox.max[0] - bbox.min[0]).toBeCloseTo(Math.max(...xs) - Math.min(...xs) + 8.32, 2);
  });

  it('leaves (1 − s)·(r − flat) at the flat, as its warning says, when a key with a flat is scaled', () => {
    const request = roundRequest({ flat: 0.8, strategy: 'scale' });
    const { kit, cuts: all } = cuts(request, true);
    const s = kit.manifest.keyScale!;
    // A scale about the axis moves each point by (1 − s) × its distance from it (derived): the flat is
    // 3.2 mm out, the circle 4 mm. The circle keeps the declared clearance; the flat gets 0.128 mm.
    const atFlat = (1 - s) * (4 - 0.8);
    expect(atFlat).toBeCloseTo(0.128, 9);
    expect(kit.manifest.warnings.join(' ')).toMatch(/but 0\.128 mm at its 0\.8 mm flat/);
    for (const cut of all.filter((x) => x.straight)) {
      expect(Math.abs(boundaryGap(cut.key, cut.pocket) - atFlat)).toBeLessThan(1e-6);
      expect(support(cut.pocket, [1, 0]) - support(cut.key, [1, 0])).toBeGreaterThanOrEqual(
        kit.manifest.clearancePerSide - 1e-6,
      );
    }
  });

  it('leaves at least the clearance at every height for any diameter, clearance and chord tolerance', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 3, max: 40, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.double({ min: 0.001, max: 0.5, noNaN: true }),
        fc.constantFrom('clearance', 'scale', 'flat'),
        (width, clearance, chordTolerance, variant) => {
          const key = {
            width,
            count: 1,
            ...(variant === 'scale' ? { strategy: 'scale' } : {}),
            ...(variant === 'flat' ? { flat: Math.max(0.02, width / 8) } : {}),
          };
          const face = { shape: 'rect', width: 1.5 * width + 12, height: 1.5 * width + 12 };
          const request = roundRequest(key, { clearance, chordTolerance, face });
          for (const exact of [true, false]) {
            const { kit, cuts: all, tol } = cuts(request, exact);
            const c = kit.manifest.clearancePerSide;
            for (const cut of all) expect(boundaryGap(cut.key, cut.pocket)).toBeGreaterThanOrEqual(c - tol);
          }
        },
      ),
      { numRuns: 25 },
    );
  });
});
