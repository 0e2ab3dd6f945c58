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
    const counts = new Map<number, number>();
    let top = 0;
    for (let i = 0; i < n; i++) {
      const c = (counts.get(values[i]) ?? 0) + 1;
      counts.set(values[i], c);
      if (c > top) top = c;
    }
    if (counts.size < n / 2 || top >= 0.2 * n) {
      const column = columnOf(problem, role);
      worst.push(`${column} has ${counts.size} distinct values in ${n} rows (the most common value ${top} times)`);
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
