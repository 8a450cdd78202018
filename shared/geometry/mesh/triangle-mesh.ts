/**
 * A triangle soup in STL order: the form every Seamwright solid leaves `shared/geometry` in, so the
 * preview (three.js), the STL writers and the manifest all read the same plain typed arrays.
 *
 * - `positions`: 9 float32 per triangle (x, y, z of its three corners, counter-clockwise seen from
 *   outside), in mm.
 * - `normals`: 3 float32 per triangle, the unit outward normal.
 *
 * Triangle i's corners are `positions[9i … 9i + 8]` and its normal `normals[3i … 3i + 2]`.
 *
 * @example
 * const mesh = geom3ToMesh(keyPin({ shape: 'square', width: 10, keyLength: 15.6 }));
 * triangleCount(mesh); // 12
 */
export interface TriangleMesh {
  readonly positions: Float32Array;
  readonly normals: Float32Array;
}

/**
 * Number of triangles in a mesh.
 *
 * @param mesh - a {@link TriangleMesh}
 * @returns positions.length / 9
 * @example
 * triangleCount({ positions: new Float32Array(18), normals: new Float32Array(6) }); // 2
 */
export function triangleCount(mesh: TriangleMesh): number {
  return mesh.positions.length / 9;
}
