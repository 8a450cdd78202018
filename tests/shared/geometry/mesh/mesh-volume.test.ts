import { describe, expect, it } from 'vitest';
import { meshVolume } from '../../../../shared/geometry/mesh';
import type { TriangleMesh } from '../../../../shared/geometry/mesh';

/** A unit tetrahedron with outward faces: volume 1/6 (derived). */
function tetra(flip = false): TriangleMesh {
  const v = [
    [0, 0, 0],
    [1, 0, 0],
    [0, 1, 0],
    [0, 0, 1],
  ];
  const faces = [
    [0, 2, 1],
    [0, 1, 3],
    [0, 3, 2],
    [1, 2, 3],
  ].map((f) => (flip ? [f[0]!, f[2]!, f[1]!] : f));
  return { positions: new Float32Array(faces.flatMap((f) => f.flatMap((i) => v[i]!))), normals: new Float32Array(12) };
}

describe('meshVolume', () => {
  it('gives 1/6 when the mesh is an outward unit tetrahedron', () => {
    expect(meshVolume(tetra())).toBeCloseTo(1 / 6, 12);
  });

  it('gives a negative volume when every face points inward', () => {
    expect(meshVolume(tetra(true))).toBeCloseTo(-1 / 6, 12);
  });
});
