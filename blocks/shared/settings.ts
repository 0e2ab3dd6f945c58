import { z } from 'zod';

/**
 * Settings pieces shared by the computing block types. Block settings live in the memo as
 * plain-JSON node attributes, so anything here may arrive forged from a shared document:
 * the server parses them again with these schemas before it computes anything.
 */

export const columnName = z.string().trim().min(1, 'choose a column').max(128, 'column names are at most 128 characters');

/** Which dataset, and which version: `versionId: null` follows the latest version. */
export const datasetRef = z.object({
  datasetId: z.number().int().positive(),
  versionId: z.number().int().positive().nullable(),
});
export type DatasetRef = z.infer<typeof datasetRef>;

/** Keeps only the rows whose `column` equals `value` (as text), e.g. site = downstream. */
export const rowFilter = z.object({ column: columnName, value: z.string().max(200) });
export type RowFilter = z.infer<typeof rowFilter>;

// B below 200 gives intervals whose end points move visibly between seeds; above 100,000
// a single block would hold a worker for minutes. Both are common practice, not theory.
export const replicateCount = z.number().int('B must be a whole number').min(100, 'B must be at least 100').max(100_000, 'B must be at most 100,000');
export const seed = z.string().trim().min(1, 'a seed is needed for reproducible results').max(64, 'the seed is at most 64 characters');
export const level = z.number().min(0.5, 'the level must be at least 0.5').max(0.999, 'the level must be at most 0.999');

export const INTERVAL_METHODS = ['normal', 'basic', 'percentile', 'bca', 'studentized'] as const;
export type IntervalMethod = (typeof INTERVAL_METHODS)[number];
export const intervalMethods = z.array(z.enum(INTERVAL_METHODS)).min(1, 'choose at least one interval method').max(5);

export const INTERVAL_LABEL: Record<IntervalMethod, string> = {
  normal: 'Normal',
  basic: 'Basic',
  percentile: 'Percentile',
  bca: 'BCa',
  studentized: 'Studentized',
};

const single = <N extends string>(name: N) => z.object({ name: z.literal(name), column: columnName });

/** The statistics of the engine contract (PRODUCT.md), in the same shape. */
export const statistic = z.discriminatedUnion('name', [
  single('mean'),
  single('median'),
  single('variance'),
  single('sd'),
  single('mad'),
  single('iqr'),
  single('geometric-mean'),
  single('cv'),
  z.object({ name: z.literal('trimmed-mean'), column: columnName, trim: z.number().min(0, 'trim must be at least 0').max(0.45, 'trim must be below 0.5 (it is cut from each end)') }),
  z.object({ name: z.literal('quantile'), column: columnName, p: z.number().gt(0, 'p must be above 0').lt(1, 'p must be below 1') }),
  z.object({ name: z.literal('correlation'), x: columnName, y: columnName, method: z.enum(['pearson', 'spearman']) }),
  z.object({ name: z.literal('ratio-of-means'), numerator: columnName, denominator: columnName }),
  z.object({ name: z.literal('regression-slope'), x: columnName, y: columnName }),
  z.object({ name: z.literal('regression-intercept'), x: columnName, y: columnName }),
]);
export type Statistic = z.infer<typeof statistic>;
export type StatisticName = Statistic['name'];

export const STATISTIC_LABEL: Record<StatisticName, string> = {
  mean: 'Mean',
  median: 'Median',
  variance: 'Variance',
  sd: 'Standard deviation',
  mad: 'Median absolute deviation',
  iqr: 'Interquartile range',
  'geometric-mean': 'Geometric mean',
  cv: 'Coefficient of variation',
  'trimmed-mean': 'Trimmed mean',
  quantile: 'Quantile',
  correlation: 'Correlation',
  'ratio-of-means': 'Ratio of means',
  'regression-slope': 'Regression slope',
  'regression-intercept': 'Regression intercept',
};

/** The columns a statistic reads, in order (used to check they exist and are numeric). */
export function statisticColumns(s: Statistic): string[] {
  switch (s.name) {
    case 'correlation':
    case 'regression-slope':
    case 'regression-intercept':
      return [s.x, s.y];
    case 'ratio-of-means':
      return [s.numerator, s.denominator];
    default:
      return [s.column];
  }
}

/** A statistic of a new name, keeping the columns already chosen where they fit. */
export function changeStatistic(prev: Statistic, name: StatisticName): Statistic {
  const cols = statisticColumns(prev);
  const a = cols[0] ?? '';
  const b = cols[1] ?? a;
  switch (name) {
    case 'trimmed-mean':
      return { name, column: a, trim: 0.1 };
    case 'quantile':
      return { name, column: a, p: 0.9 };
    case 'correlation':
      return { name, x: a, y: b, method: 'pearson' };
    case 'ratio-of-means':
      return { name, numerator: a, denominator: b };
    case 'regression-slope':
    case 'regression-intercept':
      return { name, x: a, y: b };
    default:
      return { name, column: a };
  }
}

/** Resampling schemes of the contract, minus the regression-only `residual`, plus it. */
export const scheme = z.discriminatedUnion('name', [
  z.object({ name: z.literal('ordinary') }),
  z.object({ name: z.literal('stratified'), by: columnName }),
  z.object({ name: z.literal('cluster'), by: columnName }),
  z.object({ name: z.literal('parametric'), family: z.enum(['normal', 'exponential', 'lognormal', 'poisson']) }),
  z.object({ name: z.literal('residual') }),
  z.object({ name: z.literal('moving-block'), blockLength: z.union([z.number().int().min(1).max(10_000), z.literal('auto')]) }),
  z.object({ name: z.literal('stationary'), meanBlockLength: z.union([z.number().min(1).max(10_000), z.literal('auto')]) }),
]);
export type Scheme = z.infer<typeof scheme>;
export type SchemeName = Scheme['name'];

export const SCHEME_LABEL: Record<SchemeName, string> = {
  ordinary: 'Ordinary (independent rows)',
  stratified: 'Stratified (within groups)',
  cluster: 'Cluster (whole groups)',
  parametric: 'Parametric',
  residual: 'Residuals (regression)',
  'moving-block': 'Moving blocks (series)',
  stationary: 'Stationary blocks (series)',
};

export function defaultScheme(name: SchemeName, columns: string[]): Scheme {
  switch (name) {
    case 'stratified':
    case 'cluster':
      return { name, by: columns[0] ?? '' };
    case 'parametric':
      return { name, family: 'normal' };
    case 'moving-block':
      return { name, blockLength: 'auto' };
    case 'stationary':
      return { name, meanBlockLength: 'auto' };
    default:
      return { name };
  }
}

/** A short random seed for a new block, so two new blocks do not share random draws by accident. */
export function newSeed(): string {
  const words = ['alder', 'birch', 'cedar', 'delta', 'eddy', 'fjord', 'gravel', 'heron', 'inlet', 'jetty', 'kelp', 'levee', 'marsh', 'nettle', 'oxbow', 'pebble', 'reed', 'silt', 'tide', 'weir'];
  const pick = () => words[Math.floor(Math.random() * words.length)];
  return `${pick()}-${pick()}-${Math.floor(Math.random() * 900 + 100)}`;
}

/** A block id: unique within a memo, stable across saves, copies and Yjs merges. */
export function newBlockId(): string {
  return globalThis.crypto.randomUUID();
}
