import { manifoldToMesh, type TriangleMesh } from '../../shared/geometry/mesh';
import { loadManifold } from '../helpers/mesh/manifold-check';

type Wasm = Awaited<ReturnType<typeof loadManifold>>;
export { loadManifold };

/**
 * Builds one kit part with manifold-3d: the hull of each convex solid's points, then one union, then the
 * mesh as a TriangleMesh (positions and unit normals), ready for the same STL writer.
 */
export function buildPartWithManifold(
  m: Wasm,
  solids: Array<Array<[number, number, number]>>,
): { mesh: TriangleMesh; volume: number } {
  const hulls = solids.map((points) => m.Manifold.hull(points));
  const part = hulls.length === 1 ? hulls[0]! : m.Manifold.union(hulls);
  const mesh = manifoldToMesh(part.getMesh());
  const volume = part.volume();
  if (part !== hulls[0]) part.delete();
  hulls.forEach((h) => h.delete());
  return { mesh, volume };
}
