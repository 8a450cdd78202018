import type { PolygonRing } from './polygon-ring';

/**
 * Crossing-number inside test of (x, y) against the edges listed for one row of an edge index:
 * the row's list holds every edge whose y-range overlaps the row, so it holds every edge that a
 * horizontal ray at y can cross. Edge k joins point k to point k + 1.
 *
 * @param ring - the polygon
 * @param rows - the index's row lists (edges of row j at items[start[j] .. start[j + 1]))
 * @param j - the row holding y, or -1 when y is outside the polygon's height
 * @returns true when (x, y) is inside
 * @example
 * rowParity(ring, rows, 3, 12.5, 4); // true when (12.5, 4) is inside
 */
export function rowParity(
  ring: PolygonRing,
  rows: { start: Int32Array; items: Int32Array },
  j: number,
  x: number,
  y: number,
): boolean {
  if (j < 0) return false;
  const { xs, ys, n } = ring;
  let odd = false;
  for (let e = rows.start[j]!; e < rows.start[j + 1]!; e++) {
    const k = rows.items[e]!;
    const k1 = k === n - 1 ? 0 : k + 1;
    const ya = ys[k]!;
    const yb = ys[k1]!;
    if (ya > y !== yb > y && x < xs[k]! + ((y - ya) * (xs[k1]! - xs[k]!)) / (yb - ya)) odd = !odd;
  }
  return odd;
}
