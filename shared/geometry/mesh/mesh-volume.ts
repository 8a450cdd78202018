import type { TriangleMesh } from './triangle-mesh';

/**
 * Signed volume enclosed by a closed mesh, by the divergence theorem: the sum over triangles of
 * a · (b × c) / 6. Positive when every triangle faces outward; meaningless for an open mesh.
 *
 * @param mesh - a closed {@link TriangleMesh}
 * @returns volume in mm³ (negative if the mesh is inside out)
 * @example
 * meshVolume(geom3ToMesh(keyPin({ shape: 'square', width: 10, keyLength: 10 }))); // 1000
 */
export function meshVolume(mesh: TriangleMesh): number {
  const p = mesh.positions;
  let sum = 0;
  for (let i = 0; i < p.length; i += 9) {
    const ax = p[i]!,
      ay = p[i + 1]!,
      az = p[i + 2]!;
    const bx = p[i + 3]!,
      by = p[i + 4]!,
      bz = p[i + 5]!;
    const cx = p[i + 6]!,
      cy = p[i + 7]!,
      cz = p[i + 8]!;
    sum += ax * (by * cz - bz * cy) + ay * (bz * cx - bx * cz) + az * (bx * cy - by * cx);
  }
  return sum / 6;
}
