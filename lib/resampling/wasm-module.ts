/**
 * One of the engine's committed WebAssembly modules (scripts/build-wasm.mjs), compiled on its
 * first use and kept for the thread. Null where WebAssembly is missing or refuses the module
 * (an engine without SIMD, say): every caller then runs the JavaScript loops it keeps beside
 * the module, which give the same results.
 */
export function lazyWasmModule(bytes: Uint8Array<ArrayBuffer>): () => WebAssembly.Module | null {
  let compiled: WebAssembly.Module | null | undefined;
  return () => {
    if (compiled === undefined) {
      try {
        compiled = typeof WebAssembly === 'object' ? new WebAssembly.Module(bytes) : null;
      } catch {
        compiled = null;
      }
    }
    return compiled;
  };
}
