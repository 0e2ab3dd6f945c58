import type * as z from 'zod/mini';
import type { Rng } from '../random/rng';
import type { PreparedStatistic, StatisticData } from '../statistics/types';

/**
 * How resampling schemes plug into the engine. A scheme is one file exporting a
 * `SchemeDefinition`, listed once in `registry.ts`.
 *
 * `prepare` gets the prepared statistic and the cleaned label columns the scheme asked for,
 * and returns a `PreparedScheme` whose `replicate(rng)` draws one bootstrap data set and
 * returns the statistic on it. Schemes that resample units with replacement also expose
 * `counting` (the strata and the last resample's counts): the engine then offers the
 * studentized interval (inner SE on each resample), exact enumeration and index export.
 */
export interface SchemeContext {
  statistic: PreparedStatistic;
  /** Number of units. */
  n: number;
  /** Cleaned label column for each unit (the columns named by `labelColumns`). */
  labels(column: string): string[];
  /** The cleaned data the statistic was prepared on (block lengths, model fits, regression). */
  data: StatisticData;
  /** θ on new data of the same shape — for schemes that make new values (parametric, residual). */
  evaluate(data: StatisticData): number;
  /** The statistic's name (`mean`, `regression-slope`, …). */
  statisticName: string;
  /** Request column of a numeric role, and original row of a unit, for messages. */
  columnOf(role: string): string;
  rowOf(unit: number): number;
  /** Two-group statistics: the two levels, in the order of `statistic.groups`. */
  groupLevels?: readonly [string, string];
}

export interface CountingScheme {
  /** Units of each stratum; every unit belongs to exactly one stratum. */
  readonly strata: readonly Int32Array[];
  /** Counts of the most recent resample drawn by replicate() or fillCounts(). */
  readonly counts: Int32Array;
  /** Draws one resample into `counts` (zeroed first). */
  fillCounts(rng: Rng, counts: Int32Array): void;
  /** Draws one resample as a list of n unit indices, with exactly the draws fillCounts makes. */
  drawIndices(rng: Rng, out: Int32Array): void;
}

export interface PreparedScheme {
  /** Words for the methods paragraph, e.g. "ordinary bootstrap (resampling rows)". */
  readonly description: string;
  replicate(rng: Rng): number;
  /**
   * `count` replicates at once into theta[offset…], the same values as `count` calls of
   * replicate(rng) (a counting scheme of a median or quantile, in WebAssembly: count-scan.ts).
   * False when it cannot, having drawn nothing: the caller then calls replicate.
   */
  replicateMany?(rng: Rng, theta: Float64Array, offset: number, count: number): boolean;
  readonly counting?: CountingScheme;
  /** Closed-form and order-statistic exact answers assume plain resampling of the sample. */
  readonly plainResampling: boolean;
  /**
   * Rough cost of one replicate in index draws, when it is not n (the O(n/ℓ) block sums or
   * O(G) cluster sums of the mean): lib/compute uses it to decide whether worker threads pay.
   */
  readonly workPerReplicate?: number;
  /** Settings the scheme resolved (block length chosen, fitted parameters …), copied to the response's `scheme`. */
  readonly details?: Record<string, unknown>;
}

export interface SchemeDefinition<S extends { name: string } = { name: string }, T extends z.ZodMiniType = z.ZodMiniType> {
  readonly name: S['name'];
  readonly schema: T;
  /** Label columns the scheme reads (e.g. `by`), with the request field naming each. */
  labelColumns(settings: S): { column: string; path: string }[];
  prepare(ctx: SchemeContext, settings: S): PreparedScheme;
}

export function defineScheme<T extends z.ZodMiniObject<{ name: z.ZodMiniLiteral<string> }>>(def: SchemeDefinition<z.output<T>, T>): SchemeDefinition<z.output<T>, T> {
  return def;
}
