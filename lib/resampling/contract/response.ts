import type { IntervalMethod } from './schema';

/** The engine's response (PRODUCT.md contract). No field is ever NaN: undefined values are null. */
export interface IntervalResult {
  level: number;
  lower: number | null;
  upper: number | null;
  /** Monte Carlo standard error of each end point (from B finite replicates). */
  lowerMonteCarloError: number | null;
  upperMonteCarloError: number | null;
}

export interface Warning {
  code: string;
  message: string;
}

export interface JackknifeResult {
  se: number | null;
  bias: number | null;
  acceleration: number | null;
  /** Empirical influence values lᵢ = (n−1)(θ̄₍·₎ − θ₍ᵢ₎) — only when `include` has "jackknife". */
  influence?: (number | null)[];
  /** Pseudo-values n·θ̂ − (n−1)·θ₍ᵢ₎ — only when `include` has "jackknife". */
  pseudoValues?: (number | null)[];
}

export interface ExactResult {
  se: number;
  bias: number;
  method: 'closed-form' | 'maritz-jarrett' | 'order-statistic' | 'enumeration';
  /** Number of distinct resamples (enumeration only). */
  resamples?: number;
}

export interface ConvergencePoint {
  B: number;
  se: number | null;
  bias: number | null;
  intervals: Partial<Record<IntervalMethod, { lower: number | null; upper: number | null }>>;
}

export interface Advice {
  /** Replicates that would bring the Monte Carlo error of the SE under 1% / 5% of the SE. */
  seWithin1Percent: number | null;
  seWithin5Percent: number | null;
  /** Replicates that would bring every interval end point's Monte Carlo error under 1% / 5% of the SE. */
  intervalsWithin1Percent: number | null;
  intervalsWithin5Percent: number | null;
  message: string;
}

/** Result of the request's `test` (permutation or bootstrap-mean), see hypothesis/run-test.ts. */
export interface TestResult {
  name: 'permutation' | 'bootstrap-mean';
  alternative: 'two-sided' | 'less' | 'greater';
  pValue: number;
  method: 'exact' | 'monte-carlo';
  /** Relabellings / resamples at least as extreme as the observed statistic. */
  count: number;
  /** Relabellings enumerated (exact) or drawn (Monte Carlo) with a defined statistic. */
  total: number;
  /** √(p(1 − p)/B) for Monte Carlo, 0 when exact. */
  monteCarloError: number;
  /** The observed test statistic (the two-group statistic; t for bootstrap-mean). */
  observed: number;
  nullValue?: number;
  note?: string;
  undefinedRelabellings?: number;
}

export interface EngineResponse {
  estimate: number;
  B: number;
  /** Finite replicates used (B minus replicates where the statistic was undefined). */
  replicatesUsed: number;
  se: number | null;
  bias: number | null;
  seMonteCarloError: number | null;
  /** IQR of the replicates / 1.349: an SE that far outlying replicates do not inflate. */
  robustSe: number | null;
  intervals: Partial<Record<IntervalMethod, IntervalResult>>;
  jackknife: JackknifeResult | null;
  z0: number | null;
  exact: ExactResult | null;
  replicates: (number | null)[] | null;
  convergence: ConvergencePoint[] | null;
  advice: Advice;
  warnings: Warning[];
  /** The scheme used and what it resolved: block length chosen, fitted parameters, clusters, residuals. */
  scheme: { name: string } & Record<string, unknown>;
  /** The request's hypothesis test, or null when none was asked. */
  test: TestResult | null;
  provenance: {
    engine: string;
    rng: string;
    seed: string;
    dataSha256: string;
    statistic: string;
    scheme: string;
    n: number;
    chunkSize: number;
    quantiles: string;
    z0Ties: string;
    studentizedSe?: string;
  };
}
