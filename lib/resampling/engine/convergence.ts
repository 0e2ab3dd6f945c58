import type { ConvergencePoint } from '../contract/response';
import type { IntervalMethod } from '../contract/schema';
import { INTERVALS } from '../intervals/registry';
import { biasCorrection } from '../intervals/bca';
import { finiteSorted } from '../math/finite-sorted';
import { moments } from '../math/moments';
import { seMonteCarloError } from '../montecarlo/se-error';

/**
 * Convergence series: SE, bias and interval end points from the first B' replicates, for
 * B' on a 1–2–5 log grid (10, 20, 50, 100, …) up to B, and B itself — so a block can draw
 * SE against B and show where the numbers settle. BCa reuses the full acceleration;
 * studentized uses the first B' t*. Cost O(B log B) per grid point.
 */
export function convergenceGrid(B: number): number[] {
  const grid: number[] = [];
  for (let p = 10; p < B; p *= 10) {
    for (const f of [1, 2, 5]) if (p * f < B) grid.push(p * f);
  }
  grid.push(B);
  return grid;
}

export function convergenceSeries(
  theta: Float64Array,
  innerT: Float64Array | null,
  estimate: number,
  level: number,
  methods: IntervalMethod[],
  acceleration: number | null,
  se0: number | null,
  finite: (x: number) => number | null,
): ConvergencePoint[] {
  const out: ConvergencePoint[] = [];
  for (const b of convergenceGrid(theta.length)) {
    const prefix = finiteSorted(theta.subarray(0, b));
    if (prefix.length < 2) {
      out.push({ B: b, se: null, bias: null, intervals: {} });
      continue;
    }
    const m = moments(prefix);
    const tPrefix = innerT ? finiteSorted(innerT.subarray(0, b)) : null;
    const input = {
      level,
      estimate,
      sorted: prefix,
      mean: m.mean,
      se: m.sd,
      seMonteCarloError: seMonteCarloError(m.sd, m.excessKurtosis, prefix.length),
      z0: biasCorrection(prefix, estimate),
      acceleration,
      studentized: tPrefix && se0 !== null ? { sortedT: tPrefix, se0 } : null,
    };
    const intervals: ConvergencePoint['intervals'] = {};
    for (const method of methods) {
      const r = INTERVALS[method](input);
      intervals[method] = { lower: r ? finite(r.lower) : null, upper: r ? finite(r.upper) : null };
    }
    out.push({ B: b, se: finite(m.sd), bias: finite(m.mean - estimate), intervals });
  }
  return out;
}
