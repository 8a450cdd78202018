export type { TriangleMesh } from './triangle-mesh';
export { triangleCount } from './triangle-mesh';
export { geom3ToMesh } from './geom3-to-mesh';
export { meshVolume } from './mesh-volume';
export type { Bounds3 } from './mesh-bounds';
export { meshBounds } from './mesh-bounds';
export { manifoldToMesh, type IndexedMesh } from './manifold-to-mesh';
