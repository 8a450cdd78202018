import type { TriangleMesh } from '../../shared/geometry/mesh';

/**
 * Splits a part's mesh into its connected solids (corners welded by exact position) and returns each
 * solid's corner points. Every reference-kit solid is a convex loft, so the hull of these points is the
 * solid itself: manifold-3d can build the same solids from the same points the loft builder starts from.
 */
export function convexComponents(mesh: TriangleMesh): Array<Array<[number, number, number]>> {
  const ids = new Map<string, number>();
  const points: Array<[number, number, number]> = [];
  const parent: number[] = [];
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
  const idOf = (k: number) => {
    const p = mesh.positions;
    const key = `${p[k]},${p[k + 1]},${p[k + 2]}`;
    let id = ids.get(key);
    if (id === undefined) {
      id = points.length;
      ids.set(key, id);
      points.push([p[k]!, p[k + 1]!, p[k + 2]!]);
      parent.push(id);
    }
    return id;
  };
  for (let t = 0; t < mesh.positions.length; t += 9) {
    const [a, b, c] = [idOf(t), idOf(t + 3), idOf(t + 6)];
    parent[find(b)] = find(a);
    parent[find(c)] = find(a);
  }
  const groups = new Map<number, Array<[number, number, number]>>();
  points.forEach((point, i) => {
    const root = find(i);
    if (!groups.has(root)) groups.set(root, []);
    groups.get(root)!.push(point);
  });
  return [...groups.values()];
}
