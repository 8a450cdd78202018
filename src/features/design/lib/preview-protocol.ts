import type { PreviewKit } from './preview-kit';

/** Messages from the design screen to the preview worker. The request is sent as entered; the worker parses it. */
export type ToPreviewWorker =
  | { readonly type: 'build'; readonly id: number; readonly request: unknown }
  | { readonly type: 'stl'; readonly id: number; readonly request: unknown; readonly file: string };

/** Messages back: a built preview, one STL file's bytes, or why the build failed. */
export type FromPreviewWorker =
  | { readonly type: 'built'; readonly id: number; readonly kit: PreviewKit; readonly buildMs: number }
  | { readonly type: 'stl'; readonly id: number; readonly file: string; readonly bytes: Uint8Array }
  | { readonly type: 'failed'; readonly id: number; readonly code: string; readonly message: string };

/** The typed-array buffers of a preview, handed over to the page without copying. */
export function transferablesOf(kit: PreviewKit): ArrayBuffer[] {
  const meshes = [...kit.meshes, ...(kit.keyInPlace ? [kit.keyInPlace] : [])];
  return meshes.flatMap((m) => [m.positions.buffer as ArrayBuffer, m.normals.buffer as ArrayBuffer]);
}
