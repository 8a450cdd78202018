import type { TriangleMesh } from '../../../shared/geometry/mesh';
import { sliceMesh } from '../../helpers/mesh/slice-mesh';

/** Slice points (x, y) of a horizontal cut at height z inside a box around a centre. */
export function sliceNear(
  mesh: TriangleMesh,
  z: number,
  centre: readonly [number, number],
  halfX: number,
  halfY: number,
) {
  return sliceMesh(mesh, 2, z).filter(([x, y]) => Math.abs(x - centre[0]) < halfX && Math.abs(y - centre[1]) < halfY);
}

/** Width along x and y of a set of points. */
export function extent(points: ReadonlyArray<readonly [number, number]>) {
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  return { x: Math.max(...xs) - Math.min(...xs), y: Math.max(...ys) - Math.min(...ys) };
}
