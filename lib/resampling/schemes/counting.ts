import type { Rng } from '../random/rng';
import { tallyArena } from '../random/tally-kernel';
import { CHUNK_SIZE } from '../replicates/chunks';
import { orderChunkRunner } from '../statistics/count-scan';
import type { PreparedStatistic } from '../statistics/types';
import type { CountingScheme, PreparedScheme } from './types';

/** From this many units up, count arrays live in WebAssembly memory. */
const WASM_MIN_UNITS = 256;

/**
 * Resampling units with replacement within strata (one stratum = the ordinary bootstrap):
 * each stratum of size m gets m independent uniform draws from its own units, so stratum
 * sizes are fixed (Davison & Hinkley 1997, §3.2.1). Draws go stratum by stratum in unit
 * order, and straight into a count array — no index array, no copy of the data.
 * Cost: n index draws plus one evaluation of the statistic per replicate.
 */
export function countingScheme(statistic: PreparedStatistic, strata: Int32Array[], description: string, plainResampling: boolean): PreparedScheme {
  const n = statistic.n;
  // Each stratum lists its units in ascending order (the callers build them so: all units, or
  // strataFromKeys), so one stratum of n units is every unit in order — no pass over it to check
  // (a pass over 10⁴ units was hot enough on a cold start for V8 to compile it, in each thread).
  const single = strata.length === 1 && strata[0].length === n;
  // Counts (and, with strata, the unit lists the draws go through) in WebAssembly memory, where
  // the generator's tally loop runs in WebAssembly (random/tally-kernel.ts); plain arrays
  // without it. The same draws either way. Small samples stay in JavaScript: for them a call
  // into WebAssembly per stratum costs more than its few draws.
  const arena = n >= WASM_MIN_UNITS ? tallyArena(n, single ? 0 : strata.reduce((a, s) => a + s.length, 0)) : null;
  const counts = arena ? arena.counts : new Int32Array(n);
  const drawUnits = arena && !single ? strata.map((s) => arena.copy(s)) : strata;

  function fillCounts(rng: Rng, c: Int32Array): void {
    c.fill(0);
    if (single) {
      rng.addCounts(c, n, n, null);
      return;
    }
    for (let s = 0; s < drawUnits.length; s++) {
      const units = drawUnits[s];
      rng.addCounts(c, units.length, units.length, units);
    }
  }

  function drawIndices(rng: Rng, out: Int32Array): void {
    let pos = 0;
    for (let s = 0; s < strata.length; s++) {
      const units = strata[s];
      const m = units.length;
      rng.fillIndices(out, pos, m, m);
      for (let k = 0; k < m; k++) out[pos + k] = units[out[pos + k]];
      pos += m;
    }
  }

  const counting: CountingScheme = { strata, counts, fillCounts, drawIndices };
  // A median or quantile of all n units: whole chunks in WebAssembly, the same values.
  const many = single && arena && statistic.countsQuantile ? orderChunkRunner(counts, statistic.countsQuantile, CHUNK_SIZE) : null;
  return {
    description,
    plainResampling,
    counting,
    replicate(rng: Rng): number {
      fillCounts(rng, counts);
      return statistic.fromCounts(counts, n);
    },
    ...(many ? { replicateMany: many } : {}),
  };
}

/** Splits units into strata by a key per unit (strata in first appearance order, units ascending in each). */
export function strataFromKeys(keys: ArrayLike<string | number>): Int32Array[] {
  const map = new Map<string | number, number[]>();
  for (let i = 0; i < keys.length; i++) {
    const k = keys[i];
    let list = map.get(k);
    if (!list) map.set(k, (list = []));
    list.push(i);
  }
  return [...map.values()].map((l) => Int32Array.from(l));
}
