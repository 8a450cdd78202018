import type { TriangleMesh } from './triangle-mesh';

/** The parts of a manifold-3d mesh this conversion reads (its `getMesh()` result). */
export interface IndexedMesh {
  readonly vertProperties: Float32Array;
  readonly triVerts: Uint32Array;
  readonly numProp: number;
}

/**
 * Unrolls an indexed manifold-3d mesh into Seamwright's triangle soup, with each triangle's unit normal from
 * its corners (counter-clockwise seen from outside, as manifold-3d stores them).
 *
 * @param mesh - `manifold.getMesh()`
 * @returns a {@link TriangleMesh} with the same triangles in the same order
 * @example
 * manifoldToMesh(wasm.Manifold.cube([10, 10, 10]).getMesh()).normals.length; // 36
 */
export function manifoldToMesh(mesh: IndexedMesh): TriangleMesh {
  const { vertProperties: verts, triVerts: tris, numProp } = mesh;
  const count = tris.length / 3;
  const positions = new Float32Array(count * 9);
  const normals = new Float32Array(count * 3);
  for (let t = 0; t < count; t++) {
    for (let c = 0; c < 3; c++) {
      const v = tris[3 * t + c]! * numProp;
      positions[9 * t + 3 * c] = verts[v]!;
      positions[9 * t + 3 * c + 1] = verts[v + 1]!;
      positions[9 * t + 3 * c + 2] = verts[v + 2]!;
    }
    const o = 9 * t;
    const [ux, uy, uz] = [
      positions[o + 3]! - positions[o]!,
      positions[o + 4]! - positions[o + 1]!,
      positions[o + 5]! - positions[o + 2]!,
    ];
    const [vx, vy, vz] = [
      positions[o + 6]! - positions[o]!,
      positions[o + 7]! - positions[o + 1]!,
      positions[o + 8]! - positions[o + 2]!,
    ];
    const nx = uy * vz - uz * vy;
    const ny = uz * vx - ux * vz;
    const nz = ux * vy - uy * vx;
    const length = Math.hypot(nx, ny, nz) || 1;
    normals[3 * t] = nx / length;
    normals[3 * t + 1] = ny / length;
    normals[3 * t + 2] = nz / length;
  }
  return { positions, normals };
}
