import { beforeAll, describe, expect, it } from 'vitest';
import { GeometryError } from '../../../shared/geometry/geometry-error';
import { buildKit, kitManifestSchema, summarizeKit } from '../../../shared/kit';
import { kitRequestSchema, type KitRequest } from '../../../shared/schemas/kit-request';
import { edgeCheck } from '../../helpers/mesh/edge-check';
import { loadManifold, manifoldOf } from '../../helpers/mesh/manifold-check';
import { readBinaryStl, threeParse } from '../../helpers/mesh/stl-readers';
import { dovetailBody, roundKeysBody, squareKeysBody } from './kit-fixtures';

const kits = {
  '8 square 10 mm keys': squareKeysBody,
  '8 round 8 mm keys': roundKeysBody,
  '3 dovetail rails': dovetailBody,
};

function meshOf(bytes: Uint8Array) {
  const { count, records } = readBinaryStl(bytes);
  const positions = new Float32Array(count * 9);
  for (let t = 0; t < count; t++) positions.set(records.subarray(12 * t + 3, 12 * t + 12), 9 * t);
  return { positions, normals: new Float32Array(count * 3) };
}

describe('buildKit', () => {
  let wasm: Awaited<ReturnType<typeof loadManifold>>;
  beforeAll(async () => {
    wasm = await loadManifold();
  });

  for (const [what, body] of Object.entries(kits)) {
    it(`writes STLs that three.js and manifold-3d accept and a manifest that describes them when the kit is ${what}`, () => {
      const { manifest, files } = buildKit(kitRequestSchema.parse(body));
      expect(kitManifestSchema.parse(manifest)).toEqual(manifest);
      expect(files.map((f) => f.name)).toEqual([...manifest.parts.map((p) => p.file), 'README.txt']);
      manifest.parts.forEach((part, i) => {
        const bytes = files[i]!.bytes;
        // Binary STL: 84 + 50·N bytes (StereoLithography Interface Specification, 1989, REFERENCES §3.1).
        expect(bytes.byteLength).toBe(84 + 50 * part.triangles);
        // An independent reader (three.js STLLoader) parses it to the same triangle count.
        expect(threeParse(bytes).length).toBe(part.triangles * 9);
        const mesh = meshOf(bytes);
        expect(edgeCheck(mesh)).toMatchObject({ unmatched: 0, repeated: 0, degenerate: 0 });
        // manifold-3d 3.5.4 accepts it as a manifold and agrees on its volume.
        const m = manifoldOf(wasm, mesh);
        expect(m.status).toBe('NoError');
        expect(Math.abs(m.volume - part.volumeMm3)).toBeLessThan(1e-3 + 1e-6 * part.volumeMm3);
      });
    });
  }

  it('lists one key file with the key count, and one pocket cutter per half with every pocket, when the joint is key', () => {
    const { manifest } = buildKit(kitRequestSchema.parse(squareKeysBody));
    const roles = manifest.parts.map((p) => [p.role, p.half, p.quantity]);
    expect(roles).toEqual([
      ['key', undefined, 8],
      ['pocket-cutter', 'A', 1],
      ['pocket-cutter', 'B', 1],
    ]);
    expect(manifest.parts[1]!.positions).toHaveLength(8);
    expect(manifest.parts[0]!.bbox.min[2]).toBe(0);
    expect(manifest.parts[1]!.bbox.max[2]).toBe(1);
    expect(manifest.parts[2]!.bbox.min[2]).toBe(-1);
    expect(manifest.units).toBe('mm');
    expect(manifest.request.joint === 'key' && manifest.request.key.strategy).toBe('clearance');
  });

  it('lists a rail file for half A and a slot cutter for half B when the joint is dovetail', () => {
    const { manifest } = buildKit(kitRequestSchema.parse(dovetailBody));
    expect(manifest.parts.map((p) => [p.role, p.half])).toEqual([
      ['rail', 'A'],
      ['slot-cutter', 'B'],
    ]);
    expect(manifest.parts[0]!.positions!.map(([x]) => x)).toEqual([-30, 0, 30]);
    expect(manifest.keyScale).toBeUndefined();
  });

  it('gives byte-identical files when the same request is built twice', () => {
    const a = buildKit(kitRequestSchema.parse(roundKeysBody));
    const b = buildKit(kitRequestSchema.parse(roundKeysBody));
    a.files.forEach((f, i) => expect(Buffer.from(f.bytes).equals(Buffer.from(b.files[i]!.bytes))).toBe(true));
  });

  it('writes ASCII STL with the same triangles when the format is ascii', () => {
    const binary = buildKit(kitRequestSchema.parse(squareKeysBody));
    const ascii = buildKit(kitRequestSchema.parse({ ...squareKeysBody, format: 'ascii' }));
    const text = new TextDecoder().decode(ascii.files[0]!.bytes);
    expect(text.startsWith('solid key\n')).toBe(true);
    expect(Array.from(threeParse(text))).toEqual(Array.from(threeParse(binary.files[0]!.bytes)));
  });

  it('throws a GeometryError with the numbers when the keys do not fit on the face', () => {
    const body: KitRequest = { ...squareKeysBody, face: { shape: 'rect', width: 12, height: 40 } };
    expect(() => buildKit(kitRequestSchema.parse(body))).toThrow(GeometryError);
    expect(() => buildKit(kitRequestSchema.parse(body))).toThrow(/12 mm/);
  });
});

describe('summarizeKit', () => {
  it('returns the same manifest as buildKit when no files are needed', () => {
    const request = kitRequestSchema.parse(dovetailBody);
    expect(summarizeKit(request)).toEqual(buildKit(request).manifest);
  });
});
