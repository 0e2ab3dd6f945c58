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
 * How: the values are sorted by the typed array's own sort (no comparator called from
 * JavaScript), then each unit, in ascending unit order, takes the next free place among the
 * positions of its value (a binary search for the first one) — the same order as a stable
 * comparison sort by value then unit, without a JavaScript comparator called n·log n times,
 * which on a cold start (code not yet optimized) cost ~15 ms for 10⁴ values; the placing
 * loops themselves, unoptimized on a cold start, cost ~7 ms more, so from WASM_MIN_KEYS keys
 * up they run in WebAssembly (placeInWasm). −0 and +0 count as equal, as with the
 * comparison a − b. NaN has no place in an order: with one among the values, the
 * comparison sort below is used as it always was.
 */
export function sortUnits(values: ArrayLike<number>, units?: ArrayLike<number>): { sorted: Float64Array; order: Int32Array } {
  const m = units ? units.length : values.length;
  // Ties are broken by unit id, so units are visited in ascending id order.
  const ids = units ? Int32Array.from(units).sort() : null;
  const keys = new Float64Array(m);
  for (let j = 0; j < m; j++) {
    const v = values[ids ? ids[j] : j];
    if (v !== v) return sortByComparison(values, units);
    keys[j] = v;
  }
  const ascending = keys.slice().sort();
  const placed = m >= WASM_MIN_KEYS ? placeInWasm(ascending, keys) : null;
  if (placed) {
    if (ids) for (let i = 0; i < m; i++) placed.order[i] = ids[placed.order[i]];
    return placed;
  }
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

/** From this many keys up the placing loops run in WebAssembly; fewer cost little either way. */
const WASM_MIN_KEYS = 256;
const positionsModule = lazyWasmModule(SORT_POSITIONS_WASM);

/**
 * The placing loops of sortUnits in WebAssembly (sort-positions.wat): the same order and
 * values as the loops above (statistics tests compare them), computed in a fresh memory of
 * 32 bytes per key. Null where WebAssembly is missing or the memory cannot be had; the
 * JavaScript loops then run. `order` holds key indices (the caller maps them to units).
 */
function placeInWasm(ascending: Float64Array, keys: Float64Array): { sorted: Float64Array; order: Int32Array } | null {
  const mod = positionsModule();
  if (!mod) return null;
  const m = keys.length;
  let memory: WebAssembly.Memory;
  let positions: (asc: number, keys: number, m: number, taken: number, order: number, sorted: number) => void;
  try {
    const instance = new WebAssembly.Instance(mod);
    memory = instance.exports.memory as WebAssembly.Memory;
    positions = instance.exports.positions as typeof positions;
    const need = 32 * m - memory.buffer.byteLength;
    if (need > 0) memory.grow(Math.ceil(need / 65536));
  } catch {
    return null;
  }
  const buffer = memory.buffer;
  // f64 arrays first (8-byte aligned), then the i32 ones; a new memory is zeroed (taken).
  const asc = 0;
  const key = 8 * m;
  const sorted = 16 * m;
  const taken = 24 * m;
  const order = 28 * m;
  new Float64Array(buffer, asc, m).set(ascending);
  new Float64Array(buffer, key, m).set(keys);
  positions(asc, key, m, taken, order, sorted);
  return { sorted: new Float64Array(buffer, sorted, m).slice(), order: new Int32Array(buffer, order, m).slice() };
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
