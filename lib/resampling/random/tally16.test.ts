import { describe, expect, it } from 'vitest';
import { createRng, type Rng } from './rng';
import { kernelOf, tallyArena } from './tally-kernel';

describe('the WebAssembly tally loops (tally16.wat)', () => {
  it('draw exactly what the JavaScript loops draw: the same counts, then the same generator and lane states', () => {
    for (const m of [1, 2, 7, 1000, 10_000, 65_536]) {
      for (const times of [1, 2, 511, 512, 513, 999, 3000, 10_001]) {
        const arena = tallyArena(m);
        expect(arena).not.toBeNull();
        const viaWasm = arena!.counts;
        expect(kernelOf(viaWasm)).toBeDefined();
        const viaJs = new Int32Array(m);
        const a = createRng('tally16', `m${m}t${times}`);
        const b = createRng('tally16', `m${m}t${times}`);
        // twice, so the second call starts from the state the first one left
        for (let round = 0; round < 2; round++) {
          a.addCounts(viaWasm, m, times, null);
          b.addCounts(viaJs, m, times, null);
        }
        expect(Array.from(viaWasm)).toEqual(Array.from(viaJs));
        expect(viaJs.reduce((s, c) => s + c, 0)).toBe(2 * times);
        expect(a.int32()).toBe(b.int32());
        expect(nextIndices(a, m)).toEqual(nextIndices(b, m));
      }
    }
  });

  it('with unit lists (strata) as well', () => {
    const n = 5000;
    const strata = [Int32Array.from({ length: 1200 }, (_, i) => 3 * i + 1), Int32Array.from({ length: 3 }, (_, i) => i * 1000), Int32Array.from({ length: 777 }, (_, i) => n - 1 - i)];
    const arena = tallyArena(n, strata.reduce((s, u) => s + u.length, 0))!;
    const wasmUnits = strata.map((u) => arena.copy(u));
    const viaJs = new Int32Array(n);
    const a = createRng('tally16', 'strata');
    const b = createRng('tally16', 'strata');
    for (let s = 0; s < strata.length; s++) {
      a.addCounts(arena.counts, strata[s].length, strata[s].length, wasmUnits[s]);
      b.addCounts(viaJs, strata[s].length, strata[s].length, strata[s]);
    }
    expect(Array.from(arena.counts)).toEqual(Array.from(viaJs));
    expect(a.int32()).toBe(b.int32());
    expect(nextIndices(a, n)).toEqual(nextIndices(b, n));
    expect(() => arena.copy(new Int32Array(1))).toThrow(RangeError);
  });
});

/** The next 20 indices below m: the lane generators' state after the calls compared. */
function nextIndices(rng: Rng, m: number): number[] {
  const out = new Int32Array(20);
  rng.fillIndices(out, 0, m, 20);
  return Array.from(out);
}
