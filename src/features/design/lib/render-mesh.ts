import type { TriangleMesh } from '../../../../shared/geometry/mesh';

/**
 * A mesh laid out the way a GPU draws it: the same corners as the kit file's {@link TriangleMesh}, with
 * each triangle's normal repeated on its three corners (flat shading, every facet as the STL has it).
 */
export interface RenderMesh {
  readonly positions: Float32Array;
  readonly normals: Float32Array;
}

/**
 * Repeats each triangle's normal on its corners. Runs in the worker so the page only hands buffers over.
 *
 * @param mesh - a kit mesh (9 floats per triangle, 3 normal floats per triangle)
 * @returns positions (shared, not copied) and per-corner normals
 */
export function toRenderMesh(mesh: TriangleMesh): RenderMesh {
  const n = mesh.normals;
  const normals = new Float32Array(mesh.positions.length);
  for (let t = 0; t < n.length / 3; t++) {
    for (let c = 0; c < 3; c++) {
      normals[t * 9 + c * 3] = n[t * 3]!;
      normals[t * 9 + c * 3 + 1] = n[t * 3 + 1]!;
      normals[t * 9 + c * 3 + 2] = n[t * 3 + 2]!;
    }
  }
  return { positions: mesh.positions, normals };
}
