/**
 * A polygon outline prepared for repeated queries: coordinates in flat arrays, repeated points
 * removed, implicitly closed (the last point joins the first).
 */
export type PolygonRing = {
  readonly xs: Float64Array;
  readonly ys: Float64Array;
  /** For each kept point, its index in the caller's list (to name points in messages). */
  readonly source: Int32Array;
  readonly n: number;
};

/**
 * Prepares polygon points for the layout maths. Drops a point equal to the one before it, and a
 * closing point equal to the first, so no edge has zero length. Does not check the shape; see
 * `validatePolygon` for that.
 *
 * @param points - [x, y] in mm, either winding, open or closed
 * @returns the ring; `n` may be below 3 when the points were degenerate
 * @example
 * polygonRing([[0, 0], [10, 0], [10, 10], [0, 0]]).n; // 3
 */
export function polygonRing(points: ReadonlyArray<readonly [number, number]>): PolygonRing {
  const xs: number[] = [];
  const ys: number[] = [];
  const source: number[] = [];
  points.forEach(([x, y], index) => {
    const last = xs.length - 1;
    if (last >= 0 && xs[last] === x && ys[last] === y) return;
    xs.push(x);
    ys.push(y);
    source.push(index);
  });
  while (xs.length > 1 && xs[0] === xs[xs.length - 1] && ys[0] === ys[ys.length - 1]) {
    xs.pop();
    ys.pop();
    source.pop();
  }
  return {
    xs: Float64Array.from(xs),
    ys: Float64Array.from(ys),
    source: Int32Array.from(source),
    n: xs.length,
  };
}
