import seedrandom from 'seedrandom';
import { kernelOf, type TallyKernel, threshold16 } from './tally-kernel';
import { uniformIndex as uniformIndex32 } from './uniform-index';

/** A seeded random source: 32-bit integers, doubles in [0, 1), and bulk index counts. */
export interface Rng {
  /** A uniformly distributed signed 32-bit integer. */
  int32(): number;
  /** A uniform double in [0, 1) with 53 random bits. */
  double(): number;
  /**
   * Adds `times` uniform draws from [0, m) to counts — counts[units[i]] (or counts[i]
   * without units). The bootstrap's hot loop. For m ≤ 2¹⁶ the indices come from four lane
   * generators stepped together, each output giving two indices, one from each 16-bit half by
   * Lemire's method (exactly uniform; the unused indices of a call's last step are dropped);
   * for larger m one index per output of the main generator (uniform-index.ts).
   */
  addCounts(counts: Int32Array, m: number, times: number, units: Int32Array | null): void;
  /** Writes the same `times` indices addCounts would draw into out[offset…], in draw order. */
  fillIndices(out: Int32Array, offset: number, m: number, times: number): void;
  /**
   * Runs f with the state of the generators that draw indices below 2¹⁶ copied into `state`
   * (16 int32: a, b, c, d of the four lanes, as tally16.wat reads them) and copied back after,
   * for WebAssembly loops that draw as addCounts does (count-scan.ts).
   */
  withLanes(state: Int32Array, f: () => void): void;
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
 *
 * Index draws below 2¹⁶ (every sample of up to 65,536 units) come instead from four more
 * Tyche-i generators of the stream, its lanes, seeded with `${seed}\u001f${stream}\u001flane:j`
 * (j = 0…3) and stepped together: step s gives the lanes' s-th outputs w₀…w₃, and with them
 * eight candidate indices in the order w₀ high half, w₀ low half, w₁ high half, …, w₃ low half.
 * One Tyche-i step is a chain of dependent operations; four independent ones run side by side
 * in one SIMD vector (tally16.wat) at about the cost of one, which halved the draws' cost
 * (bench/README.md). Each lane is exactly seedrandom's tychei for its seed string
 * (random/rng.test.ts rebuilds the indices from four seedrandom generators).
 */
export const RNG_NAME = 'tychei (Tyche-i, seeded by seedrandom 3.0.5; indices below 2^16 from four interleaved lane streams)';

const TWO32 = 4294967296;
/** Up to this many units, indices come from the four lanes, two per output (its 16-bit halves). */
export const SMALL_M = 65536;
/** Generators side by side for the 16-bit index draws (one SIMD vector of 32-bit lanes). */
const LANES = 4;
const LANE_WORDS = 4 * LANES;
/** Steps of the four lanes per call of a 16-bit batch loop in JavaScript (addJs16). */
const BATCH_16 = 64;

export class TycheI implements Rng {
  private a: number;
  private b: number;
  private c: number;
  private d: number;
  /** The four lane generators' state (laneState), null until the first 16-bit index draw. */
  private lanes: Int32Array | null = null;
  /** Scratch: the last few indices of an addCounts call (lastFew16). */
  private readonly few = new Int32Array(8);

  /** `laneSeed`: the seed string of this stream, from which its lane generators are seeded. */
  constructor(
    state: { a: number; b: number; c: number; d: number },
    private readonly laneSeed: string,
  ) {
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
      else this.addJs16(counts, m, times, units);
    } else if (units === null) this.addDirect32(counts, m, times);
    else this.addVia32(counts, m, times, units);
  }

  fillIndices(out: Int32Array, offset: number, m: number, times: number): void {
    // The reference path: one index at a time, in the order the fast loops below use (the
    // four lanes in local variables, each step's eight candidates written out in order).
    if (m <= SMALL_M) {
      if (times <= 0) return;
      const threshold = threshold16(m);
      const st = this.laneState();
      let a0 = st[0];
      let a1 = st[1];
      let a2 = st[2];
      let a3 = st[3];
      let b0 = st[4];
      let b1 = st[5];
      let b2 = st[6];
      let b3 = st[7];
      let c0 = st[8];
      let c1 = st[9];
      let c2 = st[10];
      let c3 = st[11];
      let d0 = st[12];
      let d1 = st[13];
      let d2 = st[14];
      let d3 = st[15];
      let k = 0;
      let x = 0;
      for (;;) {
        b0 = (b0 << 25) ^ (b0 >>> 7) ^ c0;
        c0 = (c0 - d0) | 0;
        d0 = (d0 << 24) ^ (d0 >>> 8) ^ a0;
        a0 = (a0 - b0) | 0;
        b0 = (b0 << 20) ^ (b0 >>> 12) ^ c0;
        c0 = (c0 - d0) | 0;
        d0 = (d0 << 16) ^ (c0 >>> 16) ^ a0;
        a0 = (a0 - b0) | 0;
        b1 = (b1 << 25) ^ (b1 >>> 7) ^ c1;
        c1 = (c1 - d1) | 0;
        d1 = (d1 << 24) ^ (d1 >>> 8) ^ a1;
        a1 = (a1 - b1) | 0;
        b1 = (b1 << 20) ^ (b1 >>> 12) ^ c1;
        c1 = (c1 - d1) | 0;
        d1 = (d1 << 16) ^ (c1 >>> 16) ^ a1;
        a1 = (a1 - b1) | 0;
        b2 = (b2 << 25) ^ (b2 >>> 7) ^ c2;
        c2 = (c2 - d2) | 0;
        d2 = (d2 << 24) ^ (d2 >>> 8) ^ a2;
        a2 = (a2 - b2) | 0;
        b2 = (b2 << 20) ^ (b2 >>> 12) ^ c2;
        c2 = (c2 - d2) | 0;
        d2 = (d2 << 16) ^ (c2 >>> 16) ^ a2;
        a2 = (a2 - b2) | 0;
        b3 = (b3 << 25) ^ (b3 >>> 7) ^ c3;
        c3 = (c3 - d3) | 0;
        d3 = (d3 << 24) ^ (d3 >>> 8) ^ a3;
        a3 = (a3 - b3) | 0;
        b3 = (b3 << 20) ^ (b3 >>> 12) ^ c3;
        c3 = (c3 - d3) | 0;
        d3 = (d3 << 16) ^ (c3 >>> 16) ^ a3;
        a3 = (a3 - b3) | 0;
        x = (a0 >>> 16) * m;
        if ((x & 0xffff) >= threshold) {
          out[offset + k++] = x >>> 16;
          if (k === times) break;
        }
        x = (a0 & 0xffff) * m;
        if ((x & 0xffff) >= threshold) {
          out[offset + k++] = x >>> 16;
          if (k === times) break;
        }
        x = (a1 >>> 16) * m;
        if ((x & 0xffff) >= threshold) {
          out[offset + k++] = x >>> 16;
          if (k === times) break;
        }
        x = (a1 & 0xffff) * m;
        if ((x & 0xffff) >= threshold) {
          out[offset + k++] = x >>> 16;
          if (k === times) break;
        }
        x = (a2 >>> 16) * m;
        if ((x & 0xffff) >= threshold) {
          out[offset + k++] = x >>> 16;
          if (k === times) break;
        }
        x = (a2 & 0xffff) * m;
        if ((x & 0xffff) >= threshold) {
          out[offset + k++] = x >>> 16;
          if (k === times) break;
        }
        x = (a3 >>> 16) * m;
        if ((x & 0xffff) >= threshold) {
          out[offset + k++] = x >>> 16;
          if (k === times) break;
        }
        x = (a3 & 0xffff) * m;
        if ((x & 0xffff) >= threshold) {
          out[offset + k++] = x >>> 16;
          if (k === times) break;
        }
      }
      st[0] = a0;
      st[1] = a1;
      st[2] = a2;
      st[3] = a3;
      st[4] = b0;
      st[5] = b1;
      st[6] = b2;
      st[7] = b3;
      st[8] = c0;
      st[9] = c1;
      st[10] = c2;
      st[11] = c3;
      st[12] = d0;
      st[13] = d1;
      st[14] = d2;
      st[15] = d3;
      return;
    }
    for (let k = 0; k < times; k++) out[offset + k] = uniformIndex32(this, m);
  }

  /**
   * The four lane generators of the 16-bit index draws, seeded on first use: lane j is
   * seedrandom's tychei for `${laneSeed}\u001flane:${j}` (state layout: a of lanes 0–3, then
   * b, c, d — as the WebAssembly loops read it).
   */
  private laneState(): Int32Array {
    if (this.lanes) return this.lanes;
    const lanes = new Int32Array(LANE_WORDS);
    for (let j = 0; j < LANES; j++) {
      const s = seedrandom.tychei(`${this.laneSeed}\u001flane:${j}`, { state: true }).state() as unknown as { a: number; b: number; c: number; d: number };
      lanes[j] = s.a;
      lanes[LANES + j] = s.b;
      lanes[2 * LANES + j] = s.c;
      lanes[3 * LANES + j] = s.d;
    }
    return (this.lanes = lanes);
  }

  // The loops below differ only in where a draw lands; they are kept separate so each stays
  // monomorphic in V8.

  /**
   * addJs16 and its last few indices, run as one WebAssembly call (add16 in
   * tally16.wat, tally-kernel.ts) on counts (and units) in a kernel's memory: the lane state
   * goes through the kernel's memory, and the batches and the tail are as in addJs16, so
   * the draws are the same.
   */
  private addWasm16(kernel: TallyKernel, counts: Int32Array, m: number, times: number, units: Int32Array | null): void {
    this.withLanes(kernel.state, () => kernel.add16(counts.byteOffset, m, threshold16(m), times, units === null ? null : units.byteOffset));
  }

  withLanes(state: Int32Array, f: () => void): void {
    const lanes = this.laneState();
    state.set(lanes);
    f();
    lanes.set(state);
  }

  /**
   * m ≤ 2¹⁶: each step of the four lane generators gives eight indices, Lemire's method on each
   * 16-bit half of each lane's output (lane 0 high half, lane 0 low half, lane 1 high half, …).
   */
  private addJs16(counts: Int32Array, m: number, times: number, units: Int32Array | null): void {
    const threshold = threshold16(m);
    let k = 0;
    // Steps go in batches of q ≤ ⌊(times − k)/8⌋, which can accept at most times − k draws,
    // so each batch is a plain counted loop and every index of every step in it has room;
    // stopping is only ever decided between batches, and the last few indices (fewer than
    // eight) are taken one by one (lastFew16): the same draws, in the same order, as one
    // index at a time (fillIndices).
    //
    // Batches are also capped at BATCH_16 steps, so that the loop is many short calls rather
    // than one long one: V8 then optimizes the batch function as a whole after its first
    // calls, instead of running the loop in on-stack-replacement code compiled in the middle of
    // the first call, which then deoptimized and re-optimized again and again (bench/README.md).
    // Count arrays in WebAssembly memory skip these loops altogether (addWasm16). With units,
    // each index x lands at counts[units[x]] (via16Batch); the two batch loops are kept
    // apart so each stays monomorphic in V8.
    const lanes = this.laneState();
    for (;;) {
      const q = Math.min((times - k) >> 3, BATCH_16);
      if (q === 0) break;
      k += units === null ? direct16Batch(lanes, counts, m, threshold, q) : via16Batch(lanes, counts, m, threshold, q, units);
    }
    if (k < times) this.lastFew16(counts, m, times - k, units);
  }

  /**
   * The last `need` (fewer than eight) indices of an addCounts call: drawn as fillIndices draws
   * them, one at a time (the rest of the last step's indices dropped), then tallied.
   */
  private lastFew16(counts: Int32Array, m: number, need: number, units: Int32Array | null): void {
    const few = this.few;
    this.fillIndices(few, 0, m, need);
    for (let i = 0; i < need; i++) counts[units === null ? few[i] : units[few[i]]]++;
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
  const streamSeed = `${seed}\u001f${stream}`;
  const prng = seedrandom.tychei(streamSeed, { state: true });
  return new TycheI(prng.state() as unknown as { a: number; b: number; c: number; d: number }, streamSeed);
}

/**
 * q steps of the four lanes, all eight halves of each: draws accepted by Lemire's test land in
 * counts; returns how many. Branch-free: a rejected half adds 0 to a valid cell (its index
 * x >>> 16 is below m either way), since with m = 10⁴ about 8% of halves are rejected at
 * random and a mispredicted branch costs more than the add. The order of the adds does not
 * matter here (only fillIndices and lastFew16 stop part-way through a step).
 */
function direct16Batch(st: Int32Array, counts: Int32Array, m: number, threshold: number, q: number): number {
  let k = 0;
  for (let j = 0; j < LANES; j++) {
    let a = st[j];
    let b = st[LANES + j];
    let c = st[2 * LANES + j];
    let d = st[3 * LANES + j];
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
    st[j] = a;
    st[LANES + j] = b;
    st[2 * LANES + j] = c;
    st[3 * LANES + j] = d;
  }
  return k;
}

/** As direct16Batch, each index x counted at counts[units[x]]. */
function via16Batch(st: Int32Array, counts: Int32Array, m: number, threshold: number, q: number, units: Int32Array): number {
  let k = 0;
  for (let j = 0; j < LANES; j++) {
    let a = st[j];
    let b = st[LANES + j];
    let c = st[2 * LANES + j];
    let d = st[3 * LANES + j];
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
    st[j] = a;
    st[LANES + j] = b;
    st[2 * LANES + j] = c;
    st[3 * LANES + j] = d;
  }
  return k;
}
