import { type ChunkRunner, chunkRunner, kernelOf, type TallyKernel, threshold16 } from '../random/tally-kernel';
import { lazyWasmModule } from '../wasm-module';
import { COUNT_SCAN_WASM } from './count-scan-wasm';

/**
 * Order statistics of a resample given as unit counts, read in one pass over the data in
 * sorted order: the resample's expanded ascending sequence has sorted[p] repeated
 * counts[order[p]] times, so the value at (0-based) rank r is the sorted[p] at which the
 * running count first exceeds r. Cost O(n) per call, no allocation. Counts in a tally arena
 * (random/tally-kernel.ts) are scanned in WebAssembly (count-scan.wat), others here.
 */

const pair = new Float64Array(2);
/** Running count through the position scanTo returned. */
let reached = 0;

/** scanTo in WebAssembly (count-scan.wat), bound to one tally arena's memory. */
interface Scanner {
  scan: (counts: number, order: number, r: number, m: number, out: number) => number;
  orderChunk: (counts: number, m: number, thr: number, st: number, order: number, sorted: number, reps: number, out: number, scr: number, quantile: number, p: number) => void;
  /** Where the scan leaves its running count (a cell placed in the arena). */
  out: Int32Array;
  /** Each order array's copy in the arena (null: no room left, scanned in JavaScript). */
  orders: Map<Int32Array, Int32Array | null>;
}

const scanModule = lazyWasmModule(COUNT_SCAN_WASM);
/** Per count array's buffer: its scanner, or null for counts outside any arena. */
const scanners = new WeakMap<ArrayBufferLike, Scanner | null>();

function scannerFor(counts: Int32Array): Scanner | null {
  let s = scanners.get(counts.buffer);
  if (s === undefined) {
    s = makeScanner(counts);
    scanners.set(counts.buffer, s);
  }
  return s;
}

function makeScanner(counts: Int32Array): Scanner | null {
  const kernel = kernelOf(counts);
  const mod = scanModule();
  if (!kernel || !mod) return null;
  try {
    const exports = new WebAssembly.Instance(mod, { env: { memory: kernel.memory }, tally: { add16: kernel.add16Export } }).exports;
    // 16 bytes of scratch: the running count, and a value (count-scan.wat)
    const out = kernel.place(new Int32Array(4));
    if (!out) return null;
    return { scan: exports.scanTo as Scanner['scan'], orderChunk: exports.orderChunk as Scanner['orderChunk'], out, orders: new Map() };
  } catch {
    return null;
  }
}

/** `order`'s copy in the arena of `counts` (placed on first use; null when there is no room). */
function placedOrder(s: Scanner, kernel: TallyKernel, order: Int32Array): Int32Array | null {
  let placed = s.orders.get(order);
  if (placed === undefined) {
    placed = kernel.place(order);
    s.orders.set(order, placed);
  }
  return placed;
}

/**
 * Whole replicates of the ordinary bootstrap of a median (p null) or a type-7 quantile p in
 * WebAssembly (count-scan.wat, orderChunk): each clears `counts`, draws all n units as
 * rng.addCounts(counts, n, n, null) does and reads the statistic as medianFromCounts /
 * quantileFromCounts do — the same values as one replicate at a time (count-scan.test.ts).
 * For counts in a tally arena with room for the order, the sorted values and `maxReps`
 * replicates; else null. The runner returns false (having drawn nothing) for more replicates.
 */
export function orderChunkRunner(counts: Int32Array, q: { sorted: Float64Array; order: Int32Array; p: number | null }, maxReps: number): ChunkRunner | null {
  const s = scannerFor(counts);
  const kernel = kernelOf(counts);
  if (!s || !kernel) return null;
  const n = counts.length;
  // orderChunk draws with the 16-bit lanes (add16): up to 2¹⁶ units
  if (q.order.length !== n || q.sorted.length !== n || n > 65536) return null;
  const order = placedOrder(s, kernel, q.order);
  const sorted = kernel.placeDoubles(q.sorted);
  if (!order || !sorted) return null;
  const threshold = threshold16(n);
  const quantile = q.p === null ? 0 : 1;
  const p = q.p ?? 0;
  const { orderChunk } = s;
  return chunkRunner(kernel, maxReps, (count, out) =>
    orderChunk(counts.byteOffset, n, threshold, kernel.state.byteOffset, order.byteOffset, sorted.byteOffset, count, out, s.out.byteOffset, quantile, p),
  );
}

/** The scan in WebAssembly when counts live in a tally arena with room for `order`; else -1. */
function scanInWasm(order: Int32Array, counts: Int32Array, r: number, m: number): number {
  const s = scannerFor(counts);
  if (!s) return -1;
  const placed = placedOrder(s, kernelOf(counts)!, order);
  if (!placed) return -1;
  const p = s.scan(counts.byteOffset, placed.byteOffset, r, m, s.out.byteOffset);
  reached = s.out[0];
  return p;
}

/**
 * First sorted position p whose running count exceeds r (m − 1 when none does; reached =
 * the running count through p). Four positions are summed per step and the last group is
 * then walked one by one: fewer tests in the loop, the same p (counts are whole numbers).
 */
function scanTo(order: Int32Array, counts: Int32Array, r: number, m: number): number {
  const w = scanInWasm(order, counts, r, m);
  if (w >= 0) return w;
  let cum = 0;
  let p = 0;
  for (const m4 = m - 3; p < m4; p += 4) {
    const s = counts[order[p]] + counts[order[p + 1]] + counts[order[p + 2]] + counts[order[p + 3]];
    if (cum + s > r) break;
    cum += s;
  }
  for (; p < m; p++) {
    cum += counts[order[p]];
    if (cum > r) break;
  }
  reached = cum;
  return p < m ? p : m - 1;
}

/** Values at ranks r and r+1 of the resample (0-based), written to the returned scratch pair. */
export function ranksPair(sorted: Float64Array, order: Int32Array, counts: Int32Array, r: number): Float64Array {
  const m = sorted.length;
  let p = scanTo(order, counts, r, m);
  pair[0] = sorted[p];
  if (reached > r + 1) {
    pair[1] = sorted[p];
    return pair;
  }
  for (p++; p < m; p++) {
    if (counts[order[p]] > 0) break;
  }
  pair[1] = p < m ? sorted[p] : pair[0];
  return pair;
}

/** Value at rank r (0-based) of the resample. */
export function rankValue(sorted: Float64Array, order: Int32Array, counts: Int32Array, r: number): number {
  return sorted[scanTo(order, counts, r, sorted.length)];
}

/**
 * Type-7 quantile (Hyndman & Fan 1996) of a resample of size `total`, computed as R's
 * quantile.default computes it: h = (total − 1)p, (1 − f)·x₍⌊h⌋₎ + f·x₍⌊h⌋+1₎.
 */
export function quantileFromCounts(sorted: Float64Array, order: Int32Array, counts: Int32Array, total: number, p: number): number {
  const index = (total - 1) * p;
  const lo = Math.floor(index);
  if (index === lo) return rankValue(sorted, order, counts, lo);
  const v = ranksPair(sorted, order, counts, lo);
  const a = v[0];
  const b = v[1];
  if (a === b) return a;
  const h = index - lo;
  return (1 - h) * a + h * b;
}

/** Median of a resample, as R's median(): the middle value, or the mean of the two middle ones. */
export function medianFromCounts(sorted: Float64Array, order: Int32Array, counts: Int32Array, total: number): number {
  if (total % 2 === 1) return rankValue(sorted, order, counts, (total - 1) / 2);
  const v = ranksPair(sorted, order, counts, total / 2 - 1);
  return (v[0] + v[1]) / 2;
}
