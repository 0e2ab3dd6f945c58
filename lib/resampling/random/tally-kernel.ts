import { lazyWasmModule } from '../wasm-module';
import type { Rng } from './rng';
import { TALLY16_WASM } from './tally16-wasm';

/**
 * The WebAssembly tally loops (tally16.wat) and the memory they count into. A scheme that
 * tallies draws into a count array asks for one here (tallyArena): the array is then a view on
 * a small block of WebAssembly memory of its own, with room for the generator state and for
 * unit lists, and TycheI.addCounts (rng.ts) runs the loop in WebAssembly whenever the counts
 * (and units) it is given live in such a block — the same draws, in the same order, as its
 * JavaScript loops, which remain for every other array and wherever WebAssembly is missing.
 */

export interface TallyKernel {
  /** The four lane generators' state (vectors a, b, c, d; TycheI.laneState), read and written by the loops. */
  state: Int32Array;
  /**
   * A whole addCounts call for m ≤ 2¹⁶: `times` draws below m tallied into counts (byte offset),
   * each index x at counts[units[x]] when units (a byte offset) is given, else at counts[x].
   */
  add16(counts: number, m: number, threshold: number, times: number, units: number | null): void;
  /** The block's memory (other kernels over its arrays instantiate against it: statistics/count-scan.ts). */
  memory: WebAssembly.Memory;
  /** tally16.wat's add16 itself, for other modules to import (count-scan.wat). */
  add16Export: WebAssembly.ImportValue;
  /** A copy of `values` in the block's free room, or null when there is none left. */
  place(values: Int32Array): Int32Array | null;
  /** The same for doubles (8-byte aligned). */
  placeDoubles(values: Float64Array): Float64Array | null;
}

export interface TallyArena {
  /** The count array (zeroed), a view on the block's memory. */
  counts: Int32Array;
  /** A copy of `values` in the block's memory (for unit lists passed to addCounts). */
  copy(values: Int32Array): Int32Array;
}

const kernels = new WeakMap<ArrayBufferLike, TallyKernel>();
const tallyModule = lazyWasmModule(TALLY16_WASM);

/** The lanes' state (four vectors of four i32), then 16 bytes of scratch for the loops' tail. */
const LANE_STATE_BYTES = 64;
const STATE_BYTES = LANE_STATE_BYTES + 16;
const PAGE = 65536;
const SPARE_PER_UNIT = 4;
const SPARE_FIXED = 2048;

/**
 * A block for a count array of n cells and up to `unitCells` cells of unit lists, or null when
 * WebAssembly is not available (callers then use a plain Int32Array). It keeps room for
 * SPARE_PER_UNIT·n + SPARE_FIXED + `extraCells` more cells that kernels over the counts may
 * place arrays in (statistics/count-scan.ts: the sorted order a statistic scans the counts in,
 * the sorted values, a chunk of replicates; for cluster counts, tables over all rows).
 */
export function tallyArena(n: number, unitCells = 0, extraCells = 0): TallyArena | null {
  const mod = tallyModule();
  if (!mod) return null;
  const end = STATE_BYTES + 4 * (n + unitCells + SPARE_PER_UNIT * n + SPARE_FIXED + extraCells);
  let memory: WebAssembly.Memory;
  let exports: {
    add16(cnt: number, m: number, thr: number, times: number, st: number, units: number, via: number): void;
  };
  try {
    // The memory never grows: growing would detach the views handed out.
    memory = new WebAssembly.Memory({ initial: Math.max(1, Math.ceil(end / PAGE)) });
    exports = new WebAssembly.Instance(mod, { env: { memory } }).exports as unknown as typeof exports;
  } catch {
    // Each memory reserves address space of its own; should that ever run out, plain arrays do.
    return null;
  }
  const buffer = memory.buffer;
  let next = STATE_BYTES + 4 * n;
  const place = (values: Int32Array): Int32Array | null => {
    if (next + 4 * values.length > end) return null;
    const view = new Int32Array(buffer, next, values.length);
    view.set(values);
    next += 4 * values.length;
    return view;
  };
  const placeDoubles = (values: Float64Array): Float64Array | null => {
    const at = (next + 7) & ~7;
    if (at + 8 * values.length > end) return null;
    const view = new Float64Array(buffer, at, values.length);
    view.set(values);
    next = at + 8 * values.length;
    return view;
  };
  kernels.set(buffer, {
    state: new Int32Array(buffer, 0, LANE_STATE_BYTES / 4),
    add16: (cnt, m, thr, times, units) => exports.add16(cnt, m, thr, times, 0, units ?? 0, units === null ? 0 : 1),
    memory,
    add16Export: exports.add16,
    place,
    placeDoubles,
  });
  return {
    counts: new Int32Array(buffer, STATE_BYTES, n),
    copy(values) {
      // unit lists first (the caller places them right after making the block)
      if (next + 4 * values.length > STATE_BYTES + 4 * (n + unitCells)) throw new RangeError('tallyArena: no room left for these units');
      return place(values)!;
    },
  };
}

/** The kernel whose memory holds this array, if any. */
export function kernelOf(a: Int32Array): TallyKernel | undefined {
  return kernels.get(a.buffer);
}

/**
 * Lemire's rejection threshold for an index below m drawn from 16 bits, 2¹⁶ mod m (m ≤ 2¹⁶):
 * the generator's 16-bit loops, here and in rng.ts, reject a draw whose low part falls below it.
 */
export function threshold16(m: number): number {
  return (65536 - m) % m;
}

/** `count` replicates into theta[offset…]; false, having drawn nothing, when it cannot. */
export type ChunkRunner = (rng: Rng, theta: Float64Array, offset: number, count: number) => boolean;

/**
 * Whole chunks of replicates drawn by a WebAssembly function over a kernel's memory
 * (statistics/count-scan.ts, schemes/cluster-chunks.ts): room for maxReps doubles is placed in
 * the arena, and `run(count, out)` draws `count` replicates with the generator's lanes in the
 * kernel's state, writing them at byte offset `out`; the runner copies them to theta. Null
 * when the arena has no room left.
 */
export function chunkRunner(kernel: TallyKernel, maxReps: number, run: (count: number, out: number) => void): ChunkRunner | null {
  const out = kernel.placeDoubles(new Float64Array(maxReps));
  if (!out) return null;
  return (rng, theta, offset, count) => {
    if (count > maxReps) return false;
    rng.withLanes(kernel.state, () => run(count, out.byteOffset));
    theta.set(out.subarray(0, count), offset);
    return true;
  };
}
