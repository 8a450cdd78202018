import Module from 'manifold-3d';
import type { TriangleMesh } from '../../../shared/geometry/mesh';
import { weld } from './edge-check';

type Wasm = Awaited<ReturnType<typeof Module>>;
let wasm: Wasm | undefined;

/** Loads manifold-3d's WASM once per test file (about 30 ms). */
export async function loadManifold(): Promise<Wasm> {
  if (!wasm) {
    wasm = await Module();
    wasm.setup();
  }
  return wasm;
}

/**
 * Hands a mesh to manifold-3d (an independent manifold library) after welding corners by exact float32
 * coordinates, without its own merge step, and reports its status and volume. A mesh that is not a
 * closed 2-manifold makes the constructor throw; the message is returned as the status then.
 */
export function manifoldOf(m: Wasm, mesh: TriangleMesh): { status: string; volume: number } {
  const { vertProperties, triVerts } = weld(mesh);
  try {
    const solid = new m.Manifold(new m.Mesh({ numProp: 3, vertProperties, triVerts }));
    const result = { status: String(solid.status()), volume: solid.volume() };
    solid.delete();
    return result;
  } catch (error) {
    return { status: error instanceof Error ? error.message : String(error), volume: NaN };
  }
}
