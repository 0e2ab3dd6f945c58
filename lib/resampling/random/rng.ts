import seedrandom from 'seedrandom';
import { kernelOf, type TallyKernel } from './tally-kernel';
import { uniformIndex as uniformIndex32 } from './uniform-index';

/** A seeded random source: 32-bit integers, doubles in [0, 1), and bulk index counts. */
export interface Rng {
  /** A uniformly distributed signed 32-bit integer. */
  int32(): number;
  /** A uniform double in [0, 1) with 53 random bits. */
  double(): number;
  /**
   * Adds `times` uniform draws from [0, m) to counts — counts[units[i]] (or counts[i]
   * without units). The bootstrap's hot loop. For m ≤ 2¹⁶ each 32-bit output gives two
   * indices, one from each 16-bit half by Lemire's method (exactly uniform; an unused half at
   * the end of a call is dropped); for larger m one index per output (uniform-index.ts).
   */
  addCounts(counts: Int32Array, m: number, times: number, units: Int32Array | null): void;
  /** Writes the same `times` indices addCounts would draw into out[offset…], in draw order. */
  fillIndices(out: Int32Array, offset: number, m: number, times: number): void;
}

/**
 * The engine's generator: Tyche-i (Neves, S. & Araujo, F. (2011), "Fast and small nonlinear
 * pseudorandom number generators for computer simulation", PPAM 2011, LNCS 7203: 92–101),
 * an add-rotate-xor generator built from the ChaCha quarter-round, period about 2¹²⁷.
 * Seeding is seedrandom's (`seedrandom.tychei(seed, { state: true })`); the recurrence is
 * then run here with its state in local variables, so the hot loop costs about 1–2 ns a
 * draw instead of a method call through seedrandom's closure. The stream is identical to
 * seedrandom's tychei output (random/rng.test.ts checks 10⁵ draws).
 *
 * Each random stream is seeded with the string `${seed}\u001f${stream}`: replicate chunk k
 * uses stream `chunk:k`, so a response does not depend on how chunks are spread over
 * worker threads. Nothing in the engine calls Math.random.
 */
export const RNG_NAME = 'tychei (Tyche-i, seeded by seedrandom 3.0.5)';

const TWO32 = 4294967296;
const TWO16 = 65536;
/** Up to this many units, each 32-bit output gives two indices (its 16-bit halves). */
export const SMALL_M = 65536;
/** Outputs per call of a 16-bit batch loop (addDirect16). */
const BATCH_16 = 256;

export class TycheI implements Rng {
  private a: number;
  private b: number;
  private c: number;
  private d: number;

  constructor(state: { a: number; b: number; c: number; d: number }) {
    this.a = state.a | 0;
    this.b = state.b | 0;
    this.c = state.c | 0;
    this.d = state.d | 0;
  }

  int32(): number {
    let b = this.b | 0;
    let c = this.c | 0;
    let d = this.d | 0;
    let a = this.a | 0;
    b = (b << 25) ^ (b >>> 7) ^ c;
    c = (c - d) | 0;
    d = (d << 24) ^ (d >>> 8) ^ a;
    a = (a - b) | 0;
    this.b = b = (b << 20) ^ (b >>> 12) ^ c;
    this.c = c = (c - d) | 0;
    this.d = (d << 16) ^ (c >>> 16) ^ a;
    return (this.a = (a - b) | 0);
  }

  double(): number {
    let result: number;
    do {
      const top = this.int32() >>> 11;
      const bot = (this.int32() >>> 0) / TWO32;
      result = (top + bot) / (1 << 21);
    } while (result === 0);
    return result;
  }

  addCounts(counts: Int32Array, m: number, times: number, units: Int32Array | null): void {
    if (m <= SMALL_M) {
      const kernel = kernelOf(counts);
      if (kernel && (units === null || units.buffer === counts.buffer)) this.addWasm16(kernel, counts, m, times, units);
      else if (units === null) this.addDirect16(counts, m, times);
      else this.addVia16(counts, m, times, units);
    } else if (units === null) this.addDirect32(counts, m, times);
    else this.addVia32(counts, m, times, units);
  }

  fillIndices(out: Int32Array, offset: number, m: number, times: number): void {
    // The reference path: one index at a time, in the order the fast loops below use.
    if (m <= SMALL_M) {
      const threshold = (TWO16 - m) % m;
      let k = 0;
      while (k < times) {
        const w = this.int32();
        for (let half = 0; half < 2 && k < times; half++) {
          const x = (half === 0 ? w >>> 16 : w & 0xffff) * m;
          if ((x & 0xffff) >= threshold) out[offset + k++] = x >>> 16;
        }
      }
      return;
    }
    for (let k = 0; k < times; k++) out[offset + k] = uniformIndex32(this, m);
  }

  // The loops below differ only in where a draw lands; they are kept separate so each stays
  // monomorphic in V8, with the generator state in local int32 variables.

  /**
   * addDirect16 / addVia16 run by the WebAssembly loops (tally-kernel.ts) on counts (and units)
   * in a kernel's memory: the state goes through the kernel's memory, and the batches and the
   * last single index are as in addDirect16, so the draws are the same.
   */
  private addWasm16(kernel: TallyKernel, counts: Int32Array, m: number, times: number, units: Int32Array | null): void {
    const state = kernel.state;
    state[0] = this.a;
    state[1] = this.b;
    state[2] = this.c;
    state[3] = this.d;
    const threshold = (TWO16 - m) % m;
    let k = 0;
    for (;;) {
      const q = (times - k) >> 1;
      if (q === 0) break;
      k += units === null ? kernel.direct16(counts.byteOffset, m, threshold, q) : kernel.via16(counts.byteOffset, m, threshold, q, units.byteOffset);
    }
    this.a = state[0];
    this.b = state[1];
    this.c = state[2];
    this.d = state[3];
    if (k < times) {
      const x = this.lastIndex16(m, threshold);
      counts[units === null ? x : units[x]]++;
    }
  }

  /** m ≤ 2¹⁶: two indices per 32-bit output, Lemire's method on each 16-bit half. */
  private addDirect16(counts: Int32Array, m: number, times: number): void {
    const threshold = (TWO16 - m) % m;
    let k = 0;
    // Outputs go in batches of q ≤ ⌊(times − k)/2⌋, which can accept at most times − k draws,
    // so each batch is a plain counted loop and each output in it has room for both halves;
    // within a batch, times − k stays ≥ 2, so stopping is only ever decided between batches
    // and the draws are the same, in the same order, as one output at a time. A last single
    // index takes the first acceptable half of the next outputs (lastIndex16).
    //
    // Batches are also capped at BATCH_16 outputs, so that the loop is many short calls
    // rather than one long one: V8 then optimizes the batch function as a whole after its
    // first calls, instead of running the loop in on-stack-replacement code compiled in the
    // middle of the first call, without type feedback for the code after the loop, which then
    // deoptimized and re-optimized again and again: on the command line the first chunks of
    // 500 replicates took 30–60 ms instead of 12 (bench/README.md). Count arrays in
    // WebAssembly memory skip these loops altogether (addWasm16).
    for (;;) {
      const q = Math.min((times - k) >> 1, BATCH_16);
      if (q === 0) break;
      k += this.direct16Batch(counts, m, threshold, q);
    }
    if (k < times) counts[this.lastIndex16(m, threshold)]++;
  }

  /** q outputs, both halves of each: draws accepted by Lemire's test land in counts; returns how many. */
  private direct16Batch(counts: Int32Array, m: number, threshold: number, q: number): number {
    let a = this.a | 0;
    let b = this.b | 0;
    let c = this.c | 0;
    let d = this.d | 0;
    let k = 0;
    // Branch-free: a rejected half adds 0 to a valid cell (its index x >>> 16 is below m
    // either way), since with m = 10⁴ about 8% of halves are rejected at random and a
    // mispredicted branch costs more than the add.
    for (let i = 0; i < q; i++) {
      b = (b << 25) ^ (b >>> 7) ^ c;
      c = (c - d) | 0;
      d = (d << 24) ^ (d >>> 8) ^ a;
      a = (a - b) | 0;
      b = (b << 20) ^ (b >>> 12) ^ c;
      c = (c - d) | 0;
      d = (d << 16) ^ (c >>> 16) ^ a;
      a = (a - b) | 0;
      const x1 = (a >>> 16) * m;
      const x2 = (a & 0xffff) * m;
      const g1 = accepted(x1, threshold);
      const g2 = accepted(x2, threshold);
      counts[x1 >>> 16] += g1;
      counts[x2 >>> 16] += g2;
      k += g1 + g2;
    }
    this.a = a;
    this.b = b;
    this.c = c;
    this.d = d;
    return k;
  }

  /** As addDirect16, each index mapped through units. */
  private addVia16(counts: Int32Array, m: number, times: number, units: Int32Array): void {
    const threshold = (TWO16 - m) % m;
    let k = 0;
    for (;;) {
      const q = Math.min((times - k) >> 1, BATCH_16);
      if (q === 0) break;
      k += this.via16Batch(counts, m, threshold, q, units);
    }
    if (k < times) counts[units[this.lastIndex16(m, threshold)]]++;
  }

  private via16Batch(counts: Int32Array, m: number, threshold: number, q: number, units: Int32Array): number {
    let a = this.a | 0;
    let b = this.b | 0;
    let c = this.c | 0;
    let d = this.d | 0;
    let k = 0;
    for (let i = 0; i < q; i++) {
      b = (b << 25) ^ (b >>> 7) ^ c;
      c = (c - d) | 0;
      d = (d << 24) ^ (d >>> 8) ^ a;
      a = (a - b) | 0;
      b = (b << 20) ^ (b >>> 12) ^ c;
      c = (c - d) | 0;
      d = (d << 16) ^ (c >>> 16) ^ a;
      a = (a - b) | 0;
      const x1 = (a >>> 16) * m;
      const x2 = (a & 0xffff) * m;
      const g1 = accepted(x1, threshold);
      const g2 = accepted(x2, threshold);
      counts[units[x1 >>> 16]] += g1;
      counts[units[x2 >>> 16]] += g2;
      k += g1 + g2;
    }
    this.a = a;
    this.b = b;
    this.c = c;
    this.d = d;
    return k;
  }

  /**
   * One index when one is left in an addCounts call: the first acceptable 16-bit half of the
   * next outputs, high half first; the other half of that output is dropped.
   */
  private lastIndex16(m: number, threshold: number): number {
    for (;;) {
      const w = this.int32();
      const x1 = (w >>> 16) * m;
      if ((x1 & 0xffff) >= threshold) return x1 >>> 16;
      const x2 = (w & 0xffff) * m;
      if ((x2 & 0xffff) >= threshold) return x2 >>> 16;
    }
  }

  /** m > 2¹⁶: one index per 32-bit output (uniform-index.ts). */
  private addDirect32(counts: Int32Array, m: number, times: number): void {
    let a = this.a | 0;
    let b = this.b | 0;
    let c = this.c | 0;
    let d = this.d | 0;
    const threshold = (TWO32 - m) % m;
    for (let k = 0; k < times; k++) {
      b = (b << 25) ^ (b >>> 7) ^ c;
      c = (c - d) | 0;
      d = (d << 24) ^ (d >>> 8) ^ a;
      a = (a - b) | 0;
      b = (b << 20) ^ (b >>> 12) ^ c;
      c = (c - d) | 0;
      d = (d << 16) ^ (c >>> 16) ^ a;
      a = (a - b) | 0;
      const x = (a >>> 0) * m;
      const hi = Math.floor(x / TWO32);
      if (x - hi * TWO32 < threshold) {
        k--;
        continue;
      }
      counts[hi]++;
    }
    this.a = a;
    this.b = b;
    this.c = c;
    this.d = d;
  }

  private addVia32(counts: Int32Array, m: number, times: number, units: Int32Array): void {
    let a = this.a | 0;
    let b = this.b | 0;
    let c = this.c | 0;
    let d = this.d | 0;
    const threshold = (TWO32 - m) % m;
    for (let k = 0; k < times; k++) {
      b = (b << 25) ^ (b >>> 7) ^ c;
      c = (c - d) | 0;
      d = (d << 24) ^ (d >>> 8) ^ a;
      a = (a - b) | 0;
      b = (b << 20) ^ (b >>> 12) ^ c;
      c = (c - d) | 0;
      d = (d << 16) ^ (c >>> 16) ^ a;
      a = (a - b) | 0;
      const x = (a >>> 0) * m;
      const hi = Math.floor(x / TWO32);
      if (x - hi * TWO32 < threshold) {
        k--;
        continue;
      }
      counts[units[hi]]++;
    }
    this.a = a;
    this.b = b;
    this.c = c;
    this.d = d;
  }
}

/**
 * Lemire's acceptance test on a 16-bit half, x = half·m: 1 when the low 16 bits are at least
 * the threshold 2¹⁶ mod m (keep the draw x >>> 16), else 0. Written as a sign bit so the hot
 * loops need no branch: both operands are below 2¹⁶, so the difference is negative exactly
 * when the draw is rejected.
 */
function accepted(x: number, threshold: number): number {
  return (((x & 0xffff) - threshold) >>> 31) ^ 1;
}

export function createRng(seed: string, stream: string): Rng {
  const prng = seedrandom.tychei(`${seed}\u001f${stream}`, { state: true });
  return new TycheI(prng.state() as unknown as { a: number; b: number; c: number; d: number });
}
