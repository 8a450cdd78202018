import type { EdgeIndex } from './edge-index';

/**
 * Visits the edges listed in the cell block [i0..i1] × [j0..j1] of an edge index, then in rings
 * of cells around it, each edge once, until no unvisited edge can be nearer than the best found:
 * cells r rings out are at least (r − 1) cells away from anything in the block. Never costs much
 * more than measuring every edge: a ring with more cells than there are edges ends in a full pass.
 *
 * @param index - the edge index
 * @param i0 - first column of the block (inclusive; likewise i1, j0, j1)
 * @param outside - how far the query lies outside the index's grid, mm (0 inside)
 * @param visit - measures edge k and returns the best squared distance so far, mm²
 * @example
 * scanNearEdges(index, 3, 3, 5, 5, 0, (k) => (best2 = Math.min(best2, measure(k))));
 */
export function scanNearEdges(
  index: EdgeIndex,
  i0: number,
  i1: number,
  j0: number,
  j1: number,
  outside: number,
  visit: (k: number) => number,
): void {
  const tick = ++index.tick[0]!;
  const { gx, gy, cellStart, cellEdges, stamp } = index;
  let best2 = Infinity;
  const cellEdgesOf = (i: number, j: number) => {
    if (i < 0 || j < 0 || i >= gx || j >= gy) return;
    const c = j * gx + i;
    for (let e = cellStart[c]!; e < cellStart[c + 1]!; e++) {
      const k = cellEdges[e]!;
      if (stamp[k] === tick) continue;
      stamp[k] = tick;
      best2 = visit(k);
    }
  };
  for (let r = 0; r <= Math.max(gx, gy); r++) {
    const lb = Math.max(outside, (r - 1) * index.cell);
    if (lb > 0 && lb * lb >= best2) return;
    // Far from every edge the rings hold mostly empty cells: once a ring has more cells than the
    // polygon has edges, measuring the remaining edges directly is cheaper.
    if (2 * (i1 - i0 + j1 - j0 + 4 * r) > index.ring.n) {
      for (let k = 0; k < index.ring.n; k++) if (stamp[k] !== tick) visit(k);
      return;
    }
    forEachRingCell(i0, i1, j0, j1, r, cellEdgesOf);
  }
}

/** The cells r rings out from the block [i0..i1] × [j0..j1] (the block itself for r = 0). */
function forEachRingCell(
  i0: number,
  i1: number,
  j0: number,
  j1: number,
  r: number,
  cell: (i: number, j: number) => void,
): void {
  if (r === 0) {
    for (let j = j0; j <= j1; j++) for (let i = i0; i <= i1; i++) cell(i, j);
    return;
  }
  for (let i = i0 - r; i <= i1 + r; i++) {
    cell(i, j0 - r);
    cell(i, j1 + r);
  }
  for (let j = j0 - r + 1; j <= j1 + r - 1; j++) {
    cell(i0 - r, j);
    cell(i1 + r, j);
  }
}
