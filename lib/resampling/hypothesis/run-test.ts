import type { TestResult } from '../contract/response';
import { EngineError } from '../errors';
import type { Problem } from '../engine/problem';
import { PermutationError, permutationTest } from '../permutation';
import { createRng } from '../random/rng';
import { bootstrapMeanTest } from '../structured/bootstrap-mean-test';

/**
 * Runs the request's `test`, if any, on the prepared problem; null when none was asked.
 * Each test draws from its own random stream (seed + "test:<name>"), so adding a test
 * leaves the bootstrap replicates unchanged. Throws EngineError naming `test.*` fields.
 */
export function runTest(problem: Problem): TestResult | null {
  const t = problem.request.test;
  if (!t) return null;
  const { B, seed } = problem.request;
  const rng = createRng(seed, `test:${t.name}`);
  if (t.name === 'permutation') {
    const groups = problem.data.group;
    const roles = Object.keys(problem.data.values);
    if (!groups || roles.length !== 1) {
      throw new EngineError('invalid:request', `a permutation test needs a two-group statistic such as mean-difference or median-difference, not ${problem.request.statistic.name}`, 'test.name');
    }
    const x = problem.data.values[roles[0]];
    const a = x.filter((_, i) => groups[i] === 0);
    const b = x.filter((_, i) => groups[i] === 1);
    const n = a.length + b.length;
    const pooled = new Float64Array(n);
    const group = new Int32Array(n);
    for (let i = a.length; i < n; i++) group[i] = 1;
    const data = { n, values: { [roles[0]]: pooled }, group };
    const def = problem.statisticDef;
    const settings = problem.request.statistic;
    // any two-group statistic: re-prepared on each relabelling; the difference of means directly
    const statistic =
      def.name === 'mean-difference'
        ? (ga: Float64Array, gb: Float64Array) => {
            let sa = 0;
            let sb = 0;
            for (let i = 0; i < ga.length; i++) sa += ga[i];
            for (let i = 0; i < gb.length; i++) sb += gb[i];
            return sa / ga.length - sb / gb.length;
          }
        : (ga: Float64Array, gb: Float64Array) => {
            pooled.set(ga, 0);
            pooled.set(gb, ga.length);
            return def.prepare(data, settings).estimate;
          };
    let scale = 0;
    for (let i = 0; i < x.length; i++) scale = Math.max(scale, Math.abs(x[i]));
    try {
      const r = permutationTest(a, b, statistic, { alternative: t.alternative, B, random: () => rng.double(), scale });
      return {
        name: 'permutation',
        alternative: r.alternative,
        pValue: r.pValue,
        method: r.method,
        count: r.count,
        total: r.total,
        monteCarloError: r.monteCarloError,
        observed: r.observed,
        ...(r.allTied ? { note: 'all values are equal: every relabelling gives the same statistic' } : {}),
        ...(r.nonFinite ? { undefinedRelabellings: r.nonFinite } : {}),
      };
    } catch (e) {
      if (e instanceof PermutationError) throw new EngineError('invalid:data', `permutation test: ${e.message}`, 'test');
      throw e;
    }
  }
  if (problem.request.statistic.name !== 'mean') {
    throw new EngineError('invalid:request', `the bootstrap-mean test is for the mean statistic, not ${problem.request.statistic.name}`, 'test.name');
  }
  try {
    const r = bootstrapMeanTest(problem.data.values.x, t.nullValue, B, () => rng.double(), t.alternative);
    return {
      name: 'bootstrap-mean',
      alternative: r.alternative,
      pValue: r.pValue,
      method: 'monte-carlo',
      count: r.count,
      total: r.total,
      monteCarloError: r.monteCarloError,
      observed: r.observed,
      nullValue: r.nullValue,
    };
  } catch (e) {
    if (e instanceof RangeError) throw new EngineError('invalid:data', `bootstrap-mean test: ${e.message}`, 'test');
    throw e;
  }
}
