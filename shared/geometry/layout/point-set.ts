/** Points in the face plane stored as flat arrays, for the hot loops of the layout search. */
export type PointSet = { readonly xs: Float64Array; readonly ys: Float64Array; readonly n: number };

/**
 * Packs coordinate lists into a {@link PointSet}.
 *
 * @param xs - x of each point (mm)
 * @param ys - y of each point (mm), same length as xs
 * @returns the point set
 * @example
 * pointSet([0, 10], [0, 0]).n; // 2
 */
export function pointSet(xs: ArrayLike<number>, ys: ArrayLike<number>): PointSet {
  return { xs: Float64Array.from(xs), ys: Float64Array.from(ys), n: xs.length };
}
