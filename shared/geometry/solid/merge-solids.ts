import jscad from '@jscad/modeling';
import type { Geom3 } from './jscad-types';

const { geom3 } = jscad.geometries;

/**
 * Puts several disjoint closed solids into one geom3 by concatenating their faces — no boolean, so no
 * T-junctions. Only for solids that neither touch nor overlap (pockets kept apart by a wall, parallel
 * rails): the result is then still a closed 2-manifold with one shell per solid.
 *
 * @param solids - closed solids that do not touch
 * @returns one geom3 holding every face, in the order given
 * @example
 * mergeSolids([pocketAt(-20, 0), pocketAt(20, 0)]); // one cutter file with two pockets
 */
export function mergeSolids(solids: readonly Geom3[]): Geom3 {
  return geom3.create(solids.flatMap((s) => geom3.toPolygons(s)));
}
