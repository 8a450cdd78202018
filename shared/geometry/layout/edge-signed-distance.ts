import type { EdgeIndex } from './edge-index';
import { pointSegmentDistance2 } from './point-segment-distance2';
import { scanNearEdges } from './scan-near-edges';

/**
 * Signed distance from (x, y) to a polygon outline through its edge index, in mm: positive
 * inside, negative outside. Same result as `ringSignedDistance`, but only nearby edges are measured.
 *
 * @param index - the polygon's edge index
 * @returns the signed distance in mm
 * @example
 * edgeSignedDistance(edgeIndex(polygonRing([[-5, -5], [5, -5], [5, 5], [-5, 5]])), 0, 0); // 5
 */
export function edgeSignedDistance(index: EdgeIndex, x: number, y: number): number {
  const { xs, ys, n } = index.ring;
  let best2 = Infinity;
  const i = index.col(x);
  const j = index.row(y);
  scanNearEdges(index, i, i, j, j, index.outside(x, x, y, y), (k) => {
    const k1 = k === n - 1 ? 0 : k + 1;
    const d2 = pointSegmentDistance2(x, y, xs[k]!, ys[k]!, xs[k1]!, ys[k1]!);
    if (d2 < best2) best2 = d2;
    return best2;
  });
  const d = Math.sqrt(best2);
  return index.inside(x, y) ? d : -d;
}
