import type * as z from 'zod/mini';

/**
 * How statistics plug into the engine. A statistic is one file exporting a
 * `StatisticDefinition`, listed once in `registry.ts`.
 *
 * Resamples are described by counts: `counts[i]` is how many times unit i (a row of the
 * cleaned data) appears in the resample, and `total` is Σ counts. Every statistic in the
 * contract is a function of the multiset of rows, so counts describe ordinary, stratified,
 * cluster and block resamples alike, and also the jackknife (one count set to 0) and the
 * exact enumeration (all compositions of n). Schemes that make new values (parametric,
 * residual) call `prepare` on the new data instead.
 */
export interface StatisticData {
  /** Number of units (rows) after missing and non-finite values were left out. */
  n: number;
  /** Cleaned numeric columns by role (`x`, `y`, `numerator`, …), each of length n. */
  values: Record<string, Float64Array>;
  /** Two-group statistics: 0 for units of levels[0], 1 for levels[1]. */
  group?: Int32Array;
}

export interface ColumnNeed {
  /** Role the statistic gives the column (key into StatisticData.values). */
  role: string;
  /** Column name in the request's data. */
  column: string;
  /** Request field that named the column, for error messages (`statistic.column`). */
  path: string;
}

export interface GroupNeed {
  column: string;
  path: string;
  levels: readonly [string, string];
  levelsPath: string;
}

export interface PreparedStatistic {
  readonly n: number;
  /** θ̂, the statistic on the observed data. */
  readonly estimate: number;
  /** θ on the resample with the given unit counts (Σ counts = total). May return NaN. */
  fromCounts(counts: Int32Array, total: number): number;
  /** Fast leave-one-out values θ₍ᵢ₎ (optional; the jackknife falls back to fromCounts). */
  leaveOneOut?(): Float64Array;
  /** Two-group statistics: group (0/1) of each unit; the schemes resample within groups. */
  readonly groups?: Int32Array;
  /**
   * Set when the statistic is one order statistic of the sample, x₍k₎ with 1-based rank k
   * (the median of an odd sample, a type-7 quantile that falls on a data point, the
   * minimum, the maximum): the exact bootstrap distribution then has a closed form.
   */
  readonly orderStatistic?: { sorted: Float64Array; rank: number };
  /**
   * Set when fromCounts is R's median (p null) or the type-7 quantile p of the resample, read
   * from these sorted values and units (count-scan.ts): a counting scheme can then draw and
   * evaluate whole chunks of replicates in WebAssembly (schemes/counting.ts).
   */
  readonly countsQuantile?: { sorted: Float64Array; order: Int32Array; p: number | null };
  /** Ideal-bootstrap answer in closed form under ordinary resampling, if one exists. */
  closedForm?(): { se: number; bias: number; method: string } | null;
}

export interface StatisticDefinition<S extends { name: string } = { name: string }, T extends z.ZodMiniType = z.ZodMiniType> {
  readonly name: S['name'];
  readonly schema: T;
  /** Numeric columns it reads. */
  numericColumns(settings: S): ColumnNeed[];
  /** Two-group statistics: the grouping column and its two levels. */
  groupColumn?(settings: S): GroupNeed;
  /** Words for messages and the methods paragraph, e.g. "median of x". */
  describe(settings: S): string;
  /** Fewest units (per group for two-group statistics) it needs. */
  readonly minUnits: number;
  /**
   * A non-smooth statistic (median, quantiles, MAD): its jackknife is inconsistent
   * (Efron & Tibshirani 1993, §11.6), which the engine warns about when it uses one.
   */
  readonly nonSmooth?: boolean;
  /** Resampling handles this statistic badly (the sample maximum or minimum). */
  isExtreme?(settings: S, n: number): boolean;
  /** Throws EngineError for data it cannot use (e.g. non-positive values for a geometric mean). */
  validate?(data: StatisticData, settings: S, where: (role: string, unit: number) => string): void;
  prepare(data: StatisticData, settings: S): PreparedStatistic;
}

/** Helper so each file can declare its definition with full typing. */
export function defineStatistic<T extends z.ZodMiniObject<{ name: z.ZodMiniLiteral<string> }>>(def: StatisticDefinition<z.output<T>, T>): StatisticDefinition<z.output<T>, T> {
  return def;
}
