import Module from 'manifold-3d';
import type { TriangleMesh } from '../../shared/geometry/mesh';

type Wasm = Awaited<ReturnType<typeof Module>>;
let wasm: Wasm | undefined;

/** Loads manifold-3d's WASM once. */
export async function loadManifold(): Promise<Wasm> {
  if (!wasm) {
    wasm = await Module();
    wasm.setup();
  }
  return wasm;
}

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
  const raw = part.getMesh();
  const volume = part.volume();
  const mesh = toTriangleMesh(raw.vertProperties, raw.triVerts, raw.numProp);
  if (part !== hulls[0]) part.delete();
  hulls.forEach((h) => h.delete());
  return { mesh, volume };
}

function toTriangleMesh(verts: Float32Array, tris: Uint32Array, numProp: number): TriangleMesh {
  const count = tris.length / 3;
  const positions = new Float32Array(count * 9);
  const normals = new Float32Array(count * 3);
  for (let t = 0; t < count; t++) {
    for (let c = 0; c < 3; c++) {
      const v = tris[3 * t + c]! * numProp;
      positions.set([verts[v]!, verts[v + 1]!, verts[v + 2]!], 9 * t + 3 * c);
    }
    const p = positions.subarray(9 * t, 9 * t + 9);
    const [ux, uy, uz] = [p[3]! - p[0]!, p[4]! - p[1]!, p[5]! - p[2]!];
    const [vx, vy, vz] = [p[6]! - p[0]!, p[7]! - p[1]!, p[8]! - p[2]!];
    const [nx, ny, nz] = [uy * vz - uz * vy, uz * vx - ux * vz, ux * vy - uy * vx];
    const len = Math.hypot(nx, ny, nz) || 1;
    normals.set([nx / len, ny / len, nz / len], 3 * t);
  }
  return { positions, normals };
}
