import { describe, expect, it } from 'vitest';
import { SERIES_SUMS_WASM } from './math/series-sums-wasm';
import { TALLY16_WASM } from './random/tally16-wasm';
import { CLUSTER_CHUNKS_WASM } from './schemes/cluster-chunks-wasm';
import { COUNT_SCAN_WASM } from './statistics/count-scan-wasm';
import { SORT_POSITIONS_WASM } from './statistics/sort-positions-wasm';

const committed: Record<string, Uint8Array> = { TALLY16_WASM, SORT_POSITIONS_WASM, COUNT_SCAN_WASM, SERIES_SUMS_WASM, CLUSTER_CHUNKS_WASM };

describe('the committed WebAssembly modules', () => {
  it('each holds exactly what wabt compiles from its .wat (scripts/build-wasm.mjs)', async () => {
    // @ts-expect-error: a plain-JS build script without type declarations
    const { WASM_MODULES, compileWat } = await import('../../scripts/build-wasm.mjs');
    expect((WASM_MODULES as { name: string }[]).map((m) => m.name).sort()).toEqual(Object.keys(committed).sort());
    for (const m of WASM_MODULES as { wat: string; name: string }[]) {
      const bytes: Buffer = await compileWat(m.wat);
      expect(Array.from(bytes), m.wat).toEqual(Array.from(committed[m.name]));
    }
  });
});
