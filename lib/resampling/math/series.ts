import { lazyWasmModule } from '../wasm-module';
import { SERIES_SUMS_WASM } from './series-sums-wasm';

/**
 * The engine's one-off passes over a series of doubles in WebAssembly (series-sums.wat): the
 * moments of the replicates, the mean and lag-1 sums of a data column, the runs of equal values
 * in a sorted column. Each runs once per request, so on the command line it runs on a cold
 * start, where V8's unoptimized loops cost milliseconds per 10⁴ values. The same terms in the
 * same order as the JavaScript loops beside each caller, so the same bits (series.test.ts);
 * those loops run below SERIES_WASM_MIN values and wherever WebAssembly is missing.
 */

/** From this many values up the passes run in WebAssembly. */
export const SERIES_WASM_MIN = 256;

interface SumsExports {
  memory: WebAssembly.Memory;
  shiftedSum(x: number, n: number, shift: number): number;
  centralSums(x: number, n: number, shift: number, meanShifted: number, out: number): void;
  finiteSum(x: number, n: number, out: number): number;
  lag1Sums(x: number, n: number, mean: number, out: number): void;
  runs(x: number, n: number, out: number): void;
}

/** A series copied into the module's memory; valid until the next loadSeries on this thread. */
export interface LoadedSeries {
  /** Σ (x[i] − shift) */
  shiftedSum(shift: number): number;
  /** With d = x[i] − shift − meanShifted: [Σd², Σd²·d, Σd²·d²] */
  centralSums(shift: number, meanShifted: number): [number, number, number];
  /** The sum in order, or { notFinite: index } for the first value that is not finite. */
  finiteSum(): { sum: number } | { notFinite: number };
  /** [Σ(xₜ − mean)², Σ(xₜ − mean)(xₜ₊₁ − mean)] as lag1Autocorrelation adds them (n ≥ 1). */
  lag1Sums(mean: number): [number, number];
  /** For a sorted series: [distinct values, longest run of equal ones] (NaN = NaN, −0 = +0). */
  runs(): [number, number];
}

const OUT = 0;
const X = 64;
const sumsModule = lazyWasmModule(SERIES_SUMS_WASM);
/** The module's one instance on this thread (its memory grows to the longest series). */
let sums: SumsExports | null | undefined;

function module(): SumsExports | null {
  if (sums === undefined) {
    const mod = sumsModule();
    try {
      sums = mod ? (new WebAssembly.Instance(mod).exports as unknown as SumsExports) : null;
    } catch {
      sums = null;
    }
  }
  return sums;
}

/** x copied into WebAssembly memory, or null (fewer than SERIES_WASM_MIN values, or no WebAssembly). */
export function loadSeries(x: ArrayLike<number>): LoadedSeries | null {
  const n = x.length;
  if (n < SERIES_WASM_MIN) return null;
  const k = module();
  if (!k) return null;
  try {
    const need = X + 8 * n - k.memory.buffer.byteLength;
    if (need > 0) k.memory.grow(Math.ceil(need / 65536));
  } catch {
    return null;
  }
  const buffer = k.memory.buffer;
  new Float64Array(buffer, X, n).set(x);
  const out = new Float64Array(buffer, OUT, 4);
  const outInt = new Int32Array(buffer, OUT, 2);
  return {
    shiftedSum: (shift) => k.shiftedSum(X, n, shift),
    centralSums(shift, meanShifted) {
      k.centralSums(X, n, shift, meanShifted, OUT);
      return [out[0], out[1], out[2]];
    },
    finiteSum() {
      const bad = k.finiteSum(X, n, OUT);
      return bad >= 0 ? { notFinite: bad } : { sum: out[0] };
    },
    lag1Sums(mean) {
      k.lag1Sums(X, n, mean, OUT);
      return [out[0], out[1]];
    },
    runs() {
      k.runs(X, n, OUT);
      return [outInt[0], outInt[1]];
    },
  };
}
