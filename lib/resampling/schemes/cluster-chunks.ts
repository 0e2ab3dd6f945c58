import { type ChunkRunner, chunkRunner, kernelOf, type TallyKernel, threshold16 } from '../random/tally-kernel';
import { lazyWasmModule } from '../wasm-module';
import { CLUSTER_CHUNKS_WASM } from './cluster-chunks-wasm';

/**
 * Whole chunks of replicates under the cluster bootstrap's first stage in WebAssembly
 * (cluster-chunks.wat), for the median and the mean of one set of clusters: each replicate
 * clears the G multiplicities, draws the clusters as rng.addCounts(multiplicity, G, G, null)
 * does and reads the statistic as the JavaScript fast path in cluster.ts reads it — the same
 * values as one replicate at a time (structured-schemes.test.ts). The multiplicities must
 * live in a tally arena (random/tally-kernel.ts) with room for the tables and a chunk of
 * replicates; the runners are null otherwise, and return false (having drawn nothing) for more
 * replicates than they were made for.
 */
/** The tables the median under first-stage cluster resampling is read from (cluster.ts). */
export interface ClusterMedianTables {
  /** The values in ascending order. */
  sorted: Float64Array;
  /** The cluster of each sorted value's row. */
  clusterSorted: Int32Array;
  /** The middle sorted position, ⌊m/2⌋, where the scan starts. */
  middle: number;
  /** Per cluster, its rows sorted before the middle. */
  below: Int32Array;
  /** Per cluster, its rows. */
  size: Int32Array;
}

interface Exports {
  clusterMedianChunk(cnt: number, G: number, thr: number, st: number, cs: number, sorted: number, m: number, mid: number, below: number, size: number, reps: number, out: number): void;
  clusterMeanChunk(cnt: number, G: number, thr: number, st: number, sums: number, rows: number, reps: number, out: number): void;
}

const chunkModule = lazyWasmModule(CLUSTER_CHUNKS_WASM);

/**
 * A runner over `multiplicity` (G ≤ 2¹⁶ cells in a tally arena) for chunks of up to maxReps:
 * `place` puts the statistic's tables in the arena and returns the call that draws `count`
 * replicates with rejection threshold `threshold` and writes them at byte offset `out` (null
 * when there is no room).
 */
function runner(
  multiplicity: Int32Array,
  maxReps: number,
  place: (kernel: TallyKernel, exports: Exports) => ((threshold: number, count: number, out: number) => void) | null,
): ChunkRunner | null {
  const kernel = kernelOf(multiplicity);
  const mod = chunkModule();
  const G = multiplicity.length;
  if (!kernel || !mod || G > 65536) return null;
  let exports: Exports;
  try {
    exports = new WebAssembly.Instance(mod, { env: { memory: kernel.memory }, tally: { add16: kernel.add16Export } }).exports as unknown as Exports;
  } catch {
    return null;
  }
  const call = place(kernel, exports);
  if (!call) return null;
  const threshold = threshold16(G);
  return chunkRunner(kernel, maxReps, (count, out) => call(threshold, count, out));
}

/** The median (clusterMedian in cluster.ts); null also when a resample's size could pass 2³¹ − 1. */
export function clusterMedianRunner(multiplicity: Int32Array, t: ClusterMedianTables, maxReps: number): ChunkRunner | null {
  const G = multiplicity.length;
  let largest = 0;
  for (let g = 0; g < t.size.length; g++) largest = Math.max(largest, t.size[g]);
  if (t.size.length !== G || t.below.length !== G || G * largest > 0x7fffffff) return null;
  return runner(multiplicity, maxReps, (kernel, x) => {
    const cs = kernel.place(t.clusterSorted);
    const sorted = kernel.placeDoubles(t.sorted);
    const below = kernel.place(t.below);
    const size = kernel.place(t.size);
    if (!cs || !sorted || !below || !size) return null;
    const m = t.sorted.length;
    return (threshold, count, out) =>
      x.clusterMedianChunk(multiplicity.byteOffset, G, threshold, kernel.state.byteOffset, cs.byteOffset, sorted.byteOffset, m, t.middle, below.byteOffset, size.byteOffset, count, out);
  });
}

/** The mean (clusterSums in cluster.ts) from the cluster totals and row counts. */
export function clusterMeanRunner(multiplicity: Int32Array, sums: Float64Array, rows: Float64Array, maxReps: number): ChunkRunner | null {
  const G = multiplicity.length;
  if (sums.length !== G || rows.length !== G) return null;
  return runner(multiplicity, maxReps, (kernel, x) => {
    const s = kernel.placeDoubles(sums);
    const r = kernel.placeDoubles(rows);
    if (!s || !r) return null;
    return (threshold, count, out) => x.clusterMeanChunk(multiplicity.byteOffset, G, threshold, kernel.state.byteOffset, s.byteOffset, r.byteOffset, count, out);
  });
}
