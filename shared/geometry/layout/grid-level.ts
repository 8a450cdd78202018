import type { Bounds } from './footprint';

/**
 * The first stage of the candidate search: a regular grid of nodes over a box, with the pocket
 * wall at each node. Node (i, j) is at (xs[i], ys[j]) and stored at index j * nx + i.
 */
export type GridLevel = {
  readonly nx: number;
  readonly ny: number;
  readonly xs: Float64Array;
  readonly ys: Float64Array;
  /** Node spacing in mm; 0 when the level has a single column (or row). */
  readonly stepX: number;
  readonly stepY: number;
  /** The wall at each node, in mm (NaN until evaluated). */
  readonly wall: Float64Array;
};

/**
 * Allocates a grid of nx × ny nodes spanning `bounds` edge to edge (so a box's corners are nodes),
 * with every wall still unknown (NaN). Node positions are computed from the box centre
 * outwards so a box symmetric about the origin gives exactly mirrored nodes.
 *
 * @param bounds - the box to cover (mm)
 * @param nx - nodes along x, at least 1 (1 puts the column at the box's centre)
 * @param ny - nodes along y, at least 1
 * @returns the empty level
 * @example
 * gridLevel({ minX: -1, minY: 0, maxX: 1, maxY: 0 }, 3, 1).xs; // [-1, 0, 1]
 */
export function gridLevel(bounds: Bounds, nx: number, ny: number): GridLevel {
  const xs = axisNodes(bounds.minX, bounds.maxX, nx);
  const ys = axisNodes(bounds.minY, bounds.maxY, ny);
  const wall = new Float64Array(nx * ny).fill(Number.NaN);
  return {
    nx,
    ny,
    xs,
    ys,
    stepX: nx > 1 ? (bounds.maxX - bounds.minX) / (nx - 1) : 0,
    stepY: ny > 1 ? (bounds.maxY - bounds.minY) / (ny - 1) : 0,
    wall,
  };
}

function axisNodes(lo: number, hi: number, n: number): Float64Array {
  const centre = (lo + hi) / 2;
  const half = (hi - lo) / 2;
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = n > 1 ? centre + (half * (2 * i - (n - 1))) / (n - 1) : centre;
  return out;
}
