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
