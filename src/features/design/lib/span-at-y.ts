/**
 * Where the line at height `y` crosses a convex outline: the least and greatest x of the chord, mm.
 *
 * @param outline - a convex polygon [x, y] in mm, either winding
 * @param y - height of the line, mm
 * @returns [minX, maxX]; [NaN, NaN] when the line misses the outline
 * @example
 * spanAtY([[-5, -5], [5, -5], [5, 5], [-5, 5]], 0); // [-5, 5]
 */
export function spanAtY(outline: ReadonlyArray<readonly [number, number]>, y: number): [number, number] {
  let min = Infinity;
  let max = -Infinity;
  outline.forEach(([x0, y0], i) => {
    const [x1, y1] = outline[(i + 1) % outline.length]!;
    if ((y0 - y) * (y1 - y) > 0) return;
    // A horizontal edge on the line gives both its ends; any other edge gives its one crossing.
    const xs = y0 === y1 ? [x0, x1] : [x0 + ((y - y0) / (y1 - y0)) * (x1 - x0)];
    for (const x of xs) {
      min = Math.min(min, x);
      max = Math.max(max, x);
    }
  });
  return min <= max ? [min, max] : [NaN, NaN];
}
