import Module, { type ManifoldToplevel } from 'manifold-3d';

let loading: Promise<ManifoldToplevel> | undefined;

/** manifold-3d's WASM module, loaded once per process on first use (about 30 ms). */
export function manifoldEngine(): Promise<ManifoldToplevel> {
  loading ??= Module().then((wasm) => {
    wasm.setup();
    return wasm;
  });
  return loading;
}
