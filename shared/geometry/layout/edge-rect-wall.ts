import type { EdgeIndex } from './edge-index';
import { edgeSignedDistance } from './edge-signed-distance';
import { rectSegmentDistance2 } from './rect-segment-distance2';
import { scanNearEdges } from './scan-near-edges';

/** A touching or crossing pocket has no wall: a hair below zero, so even a 0 mm margin refuses it. */
const CROSSING_MM = 1e-6;

/**
 * Signed wall between the rectangle [cx − a, cx + a] × [cy − b, cy + b] and a polygon outline,
 * through the polygon's edge index, in mm: the distance to the nearest edge when the rectangle
 * lies inside, negative when it touches, crosses or lies outside. Never more than the wall the
 * best spot within distance d could have, minus d — the bound the candidate search prunes with.
 *
 * @param index - the polygon's edge index
 * @param a - half width of the rectangle (mm)
 * @param b - half height of the rectangle (mm)
 * @returns the signed wall in mm
 * @example
 * edgeRectWall(edgeIndex(polygonRing([[-10, -10], [10, -10], [10, 10], [-10, 10]])), 0, 0, 5, 5); // 5
 */
export function edgeRectWall(index: EdgeIndex, cx: number, cy: number, a: number, b: number): number {
  const { xs, ys, n } = index.ring;
  let best2 = Infinity;
  const [x0, x1, y0, y1] = [cx - a, cx + a, cy - b, cy + b];
  scanNearEdges(
    index,
    index.col(x0),
    index.col(x1),
    index.row(y0),
    index.row(y1),
    index.outside(x0, x1, y0, y1),
    (k) => {
      if (best2 === 0) return 0;
      const k1 = k === n - 1 ? 0 : k + 1;
      // Cheap reject: the edge's bounding box is already farther than the best edge so far.
      const sx = Math.max(0, Math.min(xs[k]!, xs[k1]!) - x1, x0 - Math.max(xs[k]!, xs[k1]!));
      const sy = Math.max(0, Math.min(ys[k]!, ys[k1]!) - y1, y0 - Math.max(ys[k]!, ys[k1]!));
      if (sx * sx + sy * sy >= best2) return best2;
      const d2 = rectSegmentDistance2(a, b, xs[k]! - cx, ys[k]! - cy, xs[k1]! - cx, ys[k1]! - cy);
      if (d2 < best2) best2 = d2;
      return best2;
    },
  );
  if (best2 === 0) {
    // How far the pocket crosses is costly to measure; the centre's distance to the edge less the
    // pocket's half-size bounds it from above, which is what the search's pruning needs, and it
    // still ranks spots (a pocket just over the edge beats one deep in a spike).
    return Math.min(-CROSSING_MM, edgeSignedDistance(index, cx, cy) - Math.min(a, b));
  }
  // No edge meets the rectangle, so it is wholly inside or wholly outside: its centre decides.
  const d = Math.sqrt(best2);
  return index.inside(cx, cy) ? d : -d;
}
