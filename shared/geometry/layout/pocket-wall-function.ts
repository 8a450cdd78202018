import type { Face } from '../../schemas/face';
import type { Footprint } from './footprint';
import { edgeIndex } from './edge-index';
import { edgeRectWall } from './edge-rect-wall';
import { edgeSignedDistance } from './edge-signed-distance';
import { polygonRing } from './polygon-ring';

/** The wall in mm between a pocket centred at (x, y) and the face edge; negative when it pokes out. */
export type WallFunction = (x: number, y: number) => number;

/**
 * Builds the function that measures, for a pocket centred at (x, y), the thickness of the wall
 * between the pocket and the edge of the face, in mm. Exact wherever the pocket lies inside the
 * face, for every face and footprint kind (rect, circle, polygon × rect, circle); negative where it
 * does not. Moving the pocket by d raises the wall by at most d (for a rectangle crossing a
 * polygon's edge the negative value is an upper bound, see `edgeRectWall`); the candidate search
 * relies on that to skip places that cannot hold a pocket.
 *
 * @param face - the cut face (mm), a polygon already validated
 * @param footprint - the pocket outline (mm)
 * @returns the wall function
 * @example
 * const wall = pocketWallFunction({ shape: 'rect', width: 40, height: 20 }, { kind: 'circle', diameter: 10 });
 * wall(0, 0); // 5: 10 mm from the long edges, minus the 5 mm pocket radius
 */
export function pocketWallFunction(face: Face, footprint: Footprint): WallFunction {
  const a = footprint.kind === 'rect' ? footprint.width / 2 : footprint.diameter / 2;
  const b = footprint.kind === 'rect' ? footprint.height / 2 : a;
  const round = footprint.kind === 'circle';
  if (face.shape === 'rect') {
    const hw = face.width / 2;
    const hh = face.height / 2;
    // Inside a rectangle the nearest edge is straight across, so both footprints reduce to a min.
    return round
      ? (x, y) => Math.min(hw - Math.abs(x), hh - Math.abs(y)) - a
      : (x, y) => Math.min(hw - Math.abs(x) - a, hh - Math.abs(y) - b);
  }
  if (face.shape === 'circle') {
    const r = face.diameter / 2;
    // A rectangle is closest to the rim at the corner farthest from the centre.
    return round
      ? (x, y) => r - Math.sqrt(x * x + y * y) - a
      : (x, y) => {
          const cx = Math.abs(x) + a;
          const cy = Math.abs(y) + b;
          return r - Math.sqrt(cx * cx + cy * cy);
        };
  }
  // Polygons: edges bucketed once, so each query measures only the edges near the pocket.
  const index = edgeIndex(polygonRing(face.points));
  return round ? (x, y) => edgeSignedDistance(index, x, y) - a : (x, y) => edgeRectWall(index, x, y, a, b);
}
