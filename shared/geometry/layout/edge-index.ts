import type { PolygonRing } from './polygon-ring';
import { rowParity } from './row-parity';

/** Most cells along a side of the index: bounds memory on very elongated outlines. */
const MAX_CELLS_PER_SIDE = 256;

/**
 * A polygon's edges bucketed on a uniform grid, so a wall query looks at nearby edges instead
 * of all of them. Edge k joins point k to point k + 1. Buckets are stored flat: the edges of
 * cell c are cellEdges[cellStart[c] .. cellStart[c + 1]), those overlapping row r likewise in
 * rowEdges. `stamp` and `tick` let one query skip an edge it has already measured (an edge
 * usually spans several cells); they are scratch space owned by this index, not shared state.
 */
export type EdgeIndex = {
  readonly ring: PolygonRing;
  readonly x0: number;
  readonly y0: number;
  readonly cell: number;
  readonly gx: number;
  readonly gy: number;
  readonly cellStart: Int32Array;
  readonly cellEdges: Int32Array;
  readonly rowStart: Int32Array;
  readonly rowEdges: Int32Array;
  readonly stamp: Int32Array;
  readonly tick: Int32Array;
  /** Column / row holding a coordinate (mm), clamped to the grid. */
  readonly col: (x: number) => number;
  readonly row: (y: number) => number;
  /** Distance in mm from the box [minX, maxX] × [minY, maxY] to the grid; 0 when they overlap. */
  readonly outside: (minX: number, maxX: number, minY: number, maxY: number) => number;
  /** Crossing-number inside test, against the edges of one row only. */
  readonly inside: (x: number, y: number) => boolean;
};

/**
 * Builds the edge index of a polygon: about 4 cells per edge, each edge entered in exactly the
 * cells its segment passes through (row by row), not its whole bounding box.
 *
 * @param ring - the prepared polygon (3 or more points)
 * @returns the index
 * @example
 * const index = edgeIndex(polygonRing(points)); // then edgeSignedDistance(index, x, y)
 */
export function edgeIndex(ring: PolygonRing): EdgeIndex {
  const { xs, ys, n } = ring;
  let [minX, minY, maxX, maxY] = [Infinity, Infinity, -Infinity, -Infinity];
  for (let k = 0; k < n; k++) {
    [minX, maxX] = [Math.min(minX, xs[k]!), Math.max(maxX, xs[k]!)];
    [minY, maxY] = [Math.min(minY, ys[k]!), Math.max(maxY, ys[k]!)];
  }
  const w = maxX - minX;
  const h = maxY - minY;
  const longest = Math.max(w, h);
  const cell = Math.max(Math.sqrt((w * h) / (4 * n)), longest / MAX_CELLS_PER_SIDE);
  const gx = Math.max(1, Math.min(MAX_CELLS_PER_SIDE, Math.ceil(w / cell)));
  const gy = Math.max(1, Math.min(MAX_CELLS_PER_SIDE, Math.ceil(h / cell)));
  const base = { ring, x0: minX, y0: minY, cell, gx, gy };
  const cells = bucket(base, gx * gy, (k, add) => forEachCell(base, k, (i, j) => add(j * gx + i)));
  const rows = bucket(base, gy, (k, add) => {
    const [j0, j1] = rowSpan(base, k);
    for (let j = j0; j <= j1; j++) add(j);
  });
  return {
    ...base,
    cellStart: cells.start,
    cellEdges: cells.items,
    rowStart: rows.start,
    rowEdges: rows.items,
    stamp: new Int32Array(n),
    tick: new Int32Array(1),
    col: (x) => clampIndex((x - minX) / cell, gx),
    row: (y) => clampIndex((y - minY) / cell, gy),
    outside: (bx0, bx1, by0, by1) => {
      const ox = Math.max(0, minX - bx1, bx0 - (minX + gx * cell));
      const oy = Math.max(0, minY - by1, by0 - (minY + gy * cell));
      return Math.sqrt(ox * ox + oy * oy);
    },
    inside: (x, y) =>
      rowParity(ring, rows, y < minY || y > minY + gy * cell ? -1 : clampIndex((y - minY) / cell, gy), x, y),
  };
}

type Base = Pick<EdgeIndex, 'ring' | 'x0' | 'y0' | 'cell' | 'gx' | 'gy'>;

/** Two passes (count, then fill) into compressed lists. */
function bucket(base: Base, buckets: number, each: (k: number, add: (b: number) => void) => void) {
  const start = new Int32Array(buckets + 1);
  for (let k = 0; k < base.ring.n; k++) each(k, (b) => start[b + 1]!++);
  for (let b = 0; b < buckets; b++) start[b + 1]! += start[b]!;
  const fill = start.slice(0, buckets);
  const items = new Int32Array(start[buckets]!);
  for (let k = 0; k < base.ring.n; k++) each(k, (b) => (items[fill[b]!++] = k));
  return { start, items };
}

/** Calls visit(i, j) for every cell edge k passes through. */
function forEachCell(base: Base, k: number, visit: (i: number, j: number) => void): void {
  const [j0, j1] = rowSpan(base, k);
  for (let j = j0; j <= j1; j++) {
    const [i0, i1] = colSpan(base, k, j);
    for (let i = i0; i <= i1; i++) visit(i, j);
  }
}

function rowSpan(base: Base, k: number): [number, number] {
  const { ys, n } = base.ring;
  const a = ys[k]!;
  const b = ys[(k + 1) % n]!;
  return [
    clampIndex((Math.min(a, b) - base.y0) / base.cell, base.gy),
    clampIndex((Math.max(a, b) - base.y0) / base.cell, base.gy),
  ];
}

/** The columns edge k covers within row j: the x-range of its part inside the row's band. */
function colSpan(base: Base, k: number, j: number): [number, number] {
  const { xs, ys, n } = base.ring;
  const [ax, ay, bx, by] = [xs[k]!, ys[k]!, xs[(k + 1) % n]!, ys[(k + 1) % n]!];
  let lo = Math.min(ax, bx);
  let hi = Math.max(ax, bx);
  if (ay !== by) {
    const bandLo = Math.max(Math.min(ay, by), base.y0 + j * base.cell);
    const bandHi = Math.min(Math.max(ay, by), base.y0 + (j + 1) * base.cell);
    const xa = ax + ((bandLo - ay) * (bx - ax)) / (by - ay);
    const xb = ax + ((bandHi - ay) * (bx - ax)) / (by - ay);
    // Widened by a hair so rounding cannot drop an edge from a cell it grazes.
    const pad = 1e-9 * (1 + Math.abs(base.cell));
    [lo, hi] = [Math.max(lo, Math.min(xa, xb) - pad), Math.min(hi, Math.max(xa, xb) + pad)];
  }
  return [clampIndex((lo - base.x0) / base.cell, base.gx), clampIndex((hi - base.x0) / base.cell, base.gx)];
}

function clampIndex(v: number, n: number): number {
  const k = Math.floor(v);
  return k < 0 ? 0 : k >= n ? n - 1 : k;
}
