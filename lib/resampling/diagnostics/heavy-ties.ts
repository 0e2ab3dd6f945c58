import { loadSeries } from '../math/series';
import type { Diagnostic } from './types';

/**
 * Heavy ties: when fewer than half the values are distinct, or one value holds 20% of the
 * rows or more, resamples of order-based statistics (median, quantiles, MAD) take few
 * distinct values and the bootstrap distribution is lumpy, so quantile-based intervals
 * jump with B and the seed. Thresholds are common practice.
 */
export const heavyTies: Diagnostic = ({ problem }) => {
  const worst: string[] = [];
  for (const [role, values] of Object.entries(problem.data.values)) {
    const n = values.length;
    // Distinct values and the longest run of equal ones, read from a sorted copy (the typed
    // array's own sort, then one pass) rather than a Map of counts: the same numbers, equal
    // as a Map's keys are (−0 = +0, NaN = NaN), at a fraction of the cost on a cold start.
    const sorted = Float64Array.from(values).sort();
    let distinct = 0;
    let top = 0;
    // The pass in WebAssembly from SERIES_WASM_MIN values up (math/series.ts): the same runs.
    const w = loadSeries(sorted);
    if (w) [distinct, top] = w.runs();
    else for (let i = 0; i < n; ) {
      const v = sorted[i];
      let j = i + 1;
      while (j < n && (sorted[j] === v || (sorted[j] !== sorted[j] && v !== v))) j++;
      distinct++;
      if (j - i > top) top = j - i;
      i = j;
    }
    if (distinct < n / 2 || top >= 0.2 * n) {
      const column = columnOf(problem, role);
      worst.push(`${column} has ${distinct} distinct values in ${n} rows (the most common value ${top} times)`);
    }
  }
  if (!worst.length) return null;
  return {
    code: 'heavy-ties',
    message: `Heavy ties: ${worst.join('; ')}. The bootstrap distribution of a median or quantile is then lumpy; prefer the exact answer or a smooth statistic, and check results at a larger B.`,
  };
};

function columnOf(problem: Parameters<Diagnostic>[0]['problem'], role: string): string {
  const need = problem.statisticDef.numericColumns(problem.request.statistic).find((c) => c.role === role);
  return need ? need.column : role;
}
