import { lowerBound } from './lower-bound';
import { lazyWasmModule } from '../wasm-module';
import { SORT_POSITIONS_WASM } from './sort-positions-wasm';

/**
 * Sorts units by value once, so order statistics of any resample can be read from counts
 * by one scan in sorted order (no sort per replicate). Ties keep unit order (stable).
 * Cost O(n log n). Returns the ascending values and, for each sorted position, its unit.
 *
 * Example: sortUnits([3, 1, 2]) → sorted [1, 2, 3], order [1, 2, 0].
 *
 * How: from WASM_MIN_KEYS keys up, a radix sort in WebAssembly (sort-positions.wat, wasmSorter).
 * Below that, or without WebAssembly: the values are sorted by the typed array's own sort (no
 * comparator called from JavaScript), then each unit, in ascending unit order, takes the next
 * free place among the positions of its value (a binary search for the first one) — the same
 * order as a stable comparison sort by value then unit, without a JavaScript comparator
 * called n·log n times, which on a cold start (code not yet optimized) cost ~15 ms for 10⁴
 * values. −0 and +0 count as equal, as with the comparison a − b. NaN has no place in an
 * order: with one among the values, the comparison sort below is used as it always was.
 */
export function sortUnits(values: ArrayLike<number>, units?: ArrayLike<number>): { sorted: Float64Array; order: Int32Array } {
  const m = units ? units.length : values.length;
  // Ties are broken by unit id, so units are visited in ascending id order.
  const ids = units ? Int32Array.from(units).sort() : null;
  // In WebAssembly the keys are written straight into the sorter's memory.
  const sorter = m >= WASM_MIN_KEYS ? wasmSorter(m) : null;
  const keys = sorter ? sorter.keys : new Float64Array(m);
  for (let j = 0; j < m; j++) {
    const v = values[ids ? ids[j] : j];
    if (v !== v) return sortByComparison(values, units);
    keys[j] = v;
  }
  if (sorter) {
    const placed = sorter.sort();
    if (ids) for (let i = 0; i < m; i++) placed.order[i] = ids[placed.order[i]];
    return placed;
  }
  const ascending = keys.slice().sort();
  const taken = new Int32Array(m);
  const order = new Int32Array(m);
  for (let j = 0; j < m; j++) {
    const p = lowerBound(ascending, keys[j]);
    order[p + taken[p]++] = ids ? ids[j] : j;
  }
  const sorted = new Float64Array(m);
  for (let i = 0; i < m; i++) sorted[i] = values[order[i]];
  return { sorted, order };
}

/** From this many keys up the sort runs in WebAssembly; fewer cost little either way. */
const WASM_MIN_KEYS = 256;
const sortModule = lazyWasmModule(SORT_POSITIONS_WASM);

/**
 * sortUnits' sort in WebAssembly (sort-positions.wat, a stable radix sort) for m keys: the
 * same order and values as the loops above (statistics tests compare them). A fresh memory of
 * 24 bytes per key and 8 KiB, whose first m f64 (`keys`) the caller fills; `sort` returns the
 * results as views on that memory (it never grows again, and nothing else holds it), with
 * `order` holding key indices (the caller maps them to units). Null where WebAssembly is
 * missing or the memory cannot be had; the JavaScript loops then run.
 */
function wasmSorter(m: number): { keys: Float64Array; sort: () => { sorted: Float64Array; order: Int32Array } } | null {
  const mod = sortModule();
  if (!mod) return null;
  let memory: WebAssembly.Memory;
  let sort: (m: number, keys: number, ia: number, ib: number, hist: number, sorted: number) => number;
  try {
    const instance = new WebAssembly.Instance(mod);
    memory = instance.exports.memory as WebAssembly.Memory;
    sort = instance.exports.sort as typeof sort;
    const need = 24 * m + 8192 - memory.buffer.byteLength;
    if (need > 0) memory.grow(Math.ceil(need / 65536));
  } catch {
    return null;
  }
  const buffer = memory.buffer;
  // f64 arrays first (8-byte aligned): the keys, the sorted keys; then the two i32 work arrays
  // and the histograms (zero in a new memory).
  return {
    keys: new Float64Array(buffer, 0, m),
    sort: () => {
      const orderAt = sort(m, 0, 16 * m, 20 * m, 24 * m, 8 * m);
      return { sorted: new Float64Array(buffer, 8 * m, m), order: new Int32Array(buffer, orderAt, m) };
    },
  };
}

/** The same order by a comparison sort: by value, then by unit. */
export function sortByComparison(values: ArrayLike<number>, units?: ArrayLike<number>): { sorted: Float64Array; order: Int32Array } {
  const m = units ? units.length : values.length;
  const idx = new Array<number>(m);
  for (let i = 0; i < m; i++) idx[i] = units ? units[i] : i;
  idx.sort((a, b) => values[a] - values[b] || a - b);
  const order = Int32Array.from(idx);
  const sorted = new Float64Array(m);
  for (let i = 0; i < m; i++) sorted[i] = values[order[i]];
  return { sorted, order };
}
