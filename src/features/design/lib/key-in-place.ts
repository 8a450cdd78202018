import type { TriangleMesh } from '../../../../shared/geometry/mesh';

/**
 * Stands a key from `key.stl` (laid on the bed: axis along x, lowest point at z = 0) back up in the joint
 * frame: axis along z, centred on the origin, as it sits in the two pockets. It inverts the kit's bed map
 * (x, y, z) → (z, −y, x − minX): a bed corner (X, Y, Z) goes to (Z + minX, −Y, X). The key's +x side reaches
 * exactly half its printed width (square, rect, hex across flats, round diameter), which gives minX.
 *
 * @param bed - the key mesh as the kit file holds it, mm
 * @param halfWidth - half the key's printed width across x, mm (scaled keys: half width × scale)
 * @returns a new mesh; the input is not changed
 * @example
 * keyInPlace(meshes[0], 5); // a 10 mm square key spanning z from −7.8 to 7.8
 */
export function keyInPlace(bed: TriangleMesh, halfWidth: number): TriangleMesh {
  const p = bed.positions;
  let maxZ = -Infinity;
  for (let i = 2; i < p.length; i += 3) maxZ = Math.max(maxZ, p[i]!);
  const minX = halfWidth - maxZ;
  const positions = new Float32Array(p.length);
  for (let i = 0; i < p.length; i += 3) {
    positions[i] = p[i + 2]! + minX;
    positions[i + 1] = -p[i + 1]!;
    positions[i + 2] = p[i]!;
  }
  const n = bed.normals;
  const normals = new Float32Array(n.length);
  for (let i = 0; i < n.length; i += 3) {
    normals[i] = n[i + 2]!;
    normals[i + 1] = -n[i + 1]!;
    normals[i + 2] = n[i]!;
  }
  return { positions, normals };
}
