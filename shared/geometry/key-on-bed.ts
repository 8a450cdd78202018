import jscad from '@jscad/modeling';
import type { Geom3 } from './solid/jscad-types';

const { geom3, poly3 } = jscad.geometries;

/**
 * Lays a key built by `keyPin` (axis along z) down on the print bed: its axis along x, its lowest point at
 * z = 0, centred on x = 0 and y = 0 otherwise as built. The map (x, y, z) → (z, −y, x + lift) is a proper
 * rotation (a quarter turn about y, then a half turn about x), so faces stay outward; the cross-section's
 * −x side (a hex flat, a round key's flat or bottom facet) lands on the bed, and a rect key lies on its
 * `length` side. Layers then run along the key, which is strongest across the seam.
 *
 * @param key - a key pin in the joint frame
 * @returns the same key in the print-bed frame
 * @example
 * keyOnBed(keyPin({ shape: 'hex', width: 8, keyLength: 12 })); // min z = 0, spans x from −6 to 6
 */
export function keyOnBed(key: Geom3): Geom3 {
  const polygons = geom3.toPolygons(key);
  let minX = Infinity;
  for (const p of polygons) for (const v of p.vertices) minX = Math.min(minX, v[0]);
  return geom3.create(
    polygons.map((p) => poly3.create(p.vertices.map((v) => [v[2], v[1] === 0 ? 0 : -v[1], v[0] - minX]))),
  );
}
