import jscad from '@jscad/modeling';
import type { Geom3, Poly3 } from './jscad-types';
import type { Vec2, Vec3 } from '../units';

const { geom3, poly3 } = jscad.geometries;

/** One cross-section of a loft: a convex, counter-clockwise ring in the (u, v) plane at height `w`. */
export interface LoftSlice {
  /** Position along the loft axis, in mm; slices must be given in ascending order. */
  readonly w: number;
  /** Corners in mm, counter-clockwise seen from +w; every slice has the same number of corners. */
  readonly ring: readonly Vec2[];
}

/** Maps loft coordinates (u, v, w) to model coordinates; must be a proper rigid motion (no mirror). */
export type LoftPlacement = (u: number, v: number, w: number) => Vec3;

const identity: LoftPlacement = (u, v, w) => [u, v, w];

/**
 * Builds a closed solid by joining convex cross-sections stacked along an axis, without booleans: corner i
 * of one slice joins corner i of the next by two triangles, and the first and last slices close the ends as
 * single convex polygons. Every edge is shared by exactly two faces in opposite directions and no vertex
 * lies on another face's edge (no T-junctions), so the mesh is a closed, outward 2-manifold.
 *
 * @param slices - two or more slices, `w` strictly ascending, rings of equal length (≥ 3 corners)
 * @param place - maps (u, v, w) to (x, y, z); default the identity (rings in xy, axis along +z). It must
 *   not mirror, or every face turns inside out.
 * @returns a JSCAD geom3 with outward faces
 * @example
 * const square = [[-5, -5], [5, -5], [5, 5], [-5, 5]] as const;
 * loftSolid([{ w: 0, ring: square }, { w: 10, ring: square }]); // a 10 mm cube, 1000 mm³
 */
export function loftSolid(slices: readonly LoftSlice[], place: LoftPlacement = identity): Geom3 {
  const rings = slices.map((s) => s.ring.map(([u, v]) => [...place(u, v, s.w)] as [number, number, number]));
  const polygons: Poly3[] = [];
  // Bottom cap seen from below: reverse the counter-clockwise order so its normal points along −w.
  polygons.push(poly3.create([...rings[0]!].reverse()));
  for (let s = 0; s + 1 < rings.length; s++) {
    const a = rings[s]!;
    const b = rings[s + 1]!;
    const n = a.length;
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n;
      // Split each side quad on the same diagonal; the quads need not be planar.
      polygons.push(poly3.create([a[i]!, a[j]!, b[j]!]), poly3.create([a[i]!, b[j]!, b[i]!]));
    }
  }
  polygons.push(poly3.create(rings[rings.length - 1]!));
  return geom3.create(polygons);
}
