import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { keyOnBed } from '../../../../shared/geometry/key-on-bed';
import { keyPin } from '../../../../shared/geometry/key-pin';
import { geom3ToMesh } from '../../../../shared/geometry/mesh';
import type { TriangleMesh } from '../../../../shared/geometry/mesh';
import { binaryStlByteLength, writeBinaryStl } from '../../../../shared/geometry/stl';
import { readBinaryStl, referenceStl, threeParse } from '../../../helpers/mesh/stl-readers';

function randomMesh(count: number, seed: number): TriangleMesh {
  let s = seed;
  const next = () => ((s = (s * 16807) % 2147483647) / 2147483647) * 200 - 100;
  return {
    positions: Float32Array.from({ length: 9 * count }, next),
    normals: Float32Array.from({ length: 3 * count }, next),
  };
}

describe('binaryStlByteLength', () => {
  it('is 84 + 50·N bytes when the mesh has N triangles', () => {
    // StereoLithography Interface Specification, 3D Systems 1989, via REFERENCES §3.1: 12 triangles → 684 bytes.
    expect(binaryStlByteLength(12)).toBe(684);
  });
});

describe('writeBinaryStl', () => {
  it('writes 84 + 50·N bytes, the count, every record and zero attributes when N is odd or even', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2001 }), fc.integer({ min: 1, max: 1e6 }), (count, seed) => {
        const mesh = randomMesh(count, seed);
        const bytes = writeBinaryStl(mesh);
        // Binary STL size 84 + 50·N (StereoLithography Interface Specification, 1989, REFERENCES §3.1).
        expect(bytes.byteLength).toBe(84 + 50 * count);
        const { count: read, records } = readBinaryStl(bytes);
        expect(read).toBe(count);
        const view = new DataView(bytes.buffer, bytes.byteOffset);
        for (let t = 0; t < count; t++) {
          for (let k = 0; k < 3; k++) expect(records[12 * t + k]).toBe(mesh.normals[3 * t + k]);
          for (let k = 0; k < 9; k++) expect(records[12 * t + 3 + k]).toBe(mesh.positions[9 * t + k]);
          expect(view.getUint16(84 + 50 * t + 48, true)).toBe(0);
        }
      }),
      { numRuns: 30 },
    );
  });

  it('never starts the header with "solid" when the header text asks for it', () => {
    const bytes = writeBinaryStl(randomMesh(1, 7), { header: 'solid trouble' });
    expect(new TextDecoder().decode(bytes.subarray(0, 5))).not.toBe('solid');
    expect(new TextDecoder().decode(writeBinaryStl(randomMesh(1, 7)).subarray(0, 5)).toLowerCase()).not.toBe('solid');
  });

  it('writes into the given buffer and returns a view of it when a target is passed', () => {
    const mesh = randomMesh(5, 3);
    const target = new ArrayBuffer(1000);
    const bytes = writeBinaryStl(mesh, { target });
    expect(bytes.buffer).toBe(target);
    expect(bytes.byteLength).toBe(334);
    expect(() => writeBinaryStl(mesh, { target: new ArrayBuffer(100) })).toThrow(RangeError);
  });

  it('matches @jscad/stl-serializer record for record, every vertex within 1e-4 mm, when given the same solid', () => {
    const solid = keyOnBed(keyPin({ shape: 'round', width: 8, keyLength: 15.6, chamfer: 0.4 }));
    const mine = readBinaryStl(writeBinaryStl(geom3ToMesh(solid)));
    const ref = readBinaryStl(referenceStl(solid));
    expect(mine.count).toBe(ref.count);
    for (let i = 0; i < ref.records.length; i++)
      expect(Math.abs(mine.records[i]! - ref.records[i]!)).toBeLessThanOrEqual(1e-4);
  });

  it('is read back by three.js STLLoader with the same corners when parsed by an independent reader', () => {
    const mesh = geom3ToMesh(keyOnBed(keyPin({ shape: 'hex', width: 8, keyLength: 12, chamfer: 0.4 })));
    expect(Array.from(threeParse(writeBinaryStl(mesh)))).toEqual(Array.from(mesh.positions));
  });
});
