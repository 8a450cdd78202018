/**
 * The width of a set of points: the narrowest strip between two parallel lines that holds them
 * all, in mm. Zero when they all lie on one line. Convex hull (monotone chain), then for each hull
 * edge the farthest hull point from it; the narrowest strip always has a side along a hull edge.
 *
 * @param points - [x, y] in mm
 * @returns the width in mm
 * @example
 * pointSetWidth([[0, 0], [10, 0], [5, 2]]); // 2
 */
export function pointSetWidth(points: ReadonlyArray<readonly [number, number]>): number {
  const hull = convexHull(points);
  if (hull.length < 3) return 0;
  let width = Infinity;
  for (let i = 0; i < hull.length; i++) {
    const [ax, ay] = hull[i]!;
    const [bx, by] = hull[(i + 1) % hull.length]!;
    const len = Math.sqrt((bx - ax) ** 2 + (by - ay) ** 2);
    let far = 0;
    for (const [px, py] of hull) far = Math.max(far, Math.abs((bx - ax) * (py - ay) - (by - ay) * (px - ax)) / len);
    width = Math.min(width, far);
  }
  return width;
}

function convexHull(points: ReadonlyArray<readonly [number, number]>): Array<readonly [number, number]> {
  const sorted = [...points].sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  const cross = (o: readonly number[], a: readonly number[], b: readonly number[]) =>
    (a[0]! - o[0]!) * (b[1]! - o[1]!) - (a[1]! - o[1]!) * (b[0]! - o[0]!);
  const half = (list: Array<readonly [number, number]>) => {
    const out: Array<readonly [number, number]> = [];
    for (const p of list) {
      while (out.length >= 2 && cross(out[out.length - 2]!, out[out.length - 1]!, p) <= 0) out.pop();
      out.push(p);
    }
    out.pop();
    return out;
  };
  if (sorted.length < 3) return sorted;
  return [...half(sorted), ...half([...sorted].reverse())];
}
