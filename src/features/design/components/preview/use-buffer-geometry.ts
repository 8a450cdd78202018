import { useEffect, useMemo } from 'react';
import { BufferAttribute, BufferGeometry } from 'three';
import type { RenderMesh } from '../../lib/render-mesh';

/** A three.js geometry over a worker-built mesh's buffers (no copy); disposed when the mesh is replaced. */
export function useBufferGeometry(mesh: RenderMesh | undefined): BufferGeometry | null {
  const geometry = useMemo(() => {
    if (!mesh) return null;
    const g = new BufferGeometry();
    g.setAttribute('position', new BufferAttribute(mesh.positions, 3));
    g.setAttribute('normal', new BufferAttribute(mesh.normals, 3));
    g.computeBoundingSphere();
    return g;
  }, [mesh]);
  useEffect(() => () => geometry?.dispose(), [geometry]);
  return geometry;
}
