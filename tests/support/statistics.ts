/**
 * Every statistic of the engine's contract once, on columns the caller names, so a test
 * that must cover them all cannot fall behind the contract in one copy only: `x` for the
 * one-sample statistics, `y` beside it for the correlation and the ratio y/x, `group` with
 * two `levels` splitting x, and `regression` as predictor and response.
 */
export function everyStatistic(c: {
  x: string;
  y: string;
  group: string;
  levels: [string, string];
  regression: { x: string; y: string };
  /** the quantile's p */
  p: number;
  /** also a correlation with no method named (the Pearson default), before Spearman's */
  pearson: boolean;
}) {
  const two = { column: c.x, group: c.group, levels: c.levels };
  return [
    { name: 'mean', column: c.x },
    { name: 'median', column: c.x },
    { name: 'trimmed-mean', column: c.x, trim: 0.2 },
    { name: 'quantile', column: c.x, p: c.p },
    { name: 'variance', column: c.x },
    { name: 'sd', column: c.x },
    { name: 'mad', column: c.x },
    { name: 'iqr', column: c.x },
    { name: 'geometric-mean', column: c.x },
    { name: 'cv', column: c.x },
    ...(c.pearson ? [{ name: 'correlation', x: c.x, y: c.y }] : []),
    { name: 'correlation', x: c.x, y: c.y, method: 'spearman' },
    { name: 'ratio-of-means', numerator: c.y, denominator: c.x },
    { name: 'mean-difference', ...two },
    { name: 'median-difference', ...two },
    { name: 'regression-slope', x: c.regression.x, y: c.regression.y },
    { name: 'regression-intercept', x: c.regression.x, y: c.regression.y },
  ];
}
