import type { TriangleMesh } from './triangle-mesh';

/** An axis-aligned bounding box in mm. */
export interface Bounds3 {
  readonly min: [number, number, number];
  readonly max: [number, number, number];
}

/**
 * Axis-aligned bounding box of a mesh's corners.
 *
 * @param mesh - a {@link TriangleMesh} with at least one triangle
 * @returns min and max corners in mm
 * @example
 * meshBounds(geom3ToMesh(keyOnBed(keyPin({ shape: 'square', width: 10, keyLength: 16 }))));
 * // { min: [-8, -5, 0], max: [8, 5, 10] }
 */
export function meshBounds(mesh: TriangleMesh): Bounds3 {
  const p = mesh.positions;
  const min: [number, number, number] = [Infinity, Infinity, Infinity];
  const max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < p.length; i += 3) {
    for (let k = 0; k < 3; k++) {
      const v = p[i + k]!;
      if (v < min[k]!) min[k] = v;
      if (v > max[k]!) max[k] = v;
    }
  }
  return { min, max };
}
