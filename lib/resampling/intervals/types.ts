/** What every interval method gets: the finite replicates, sorted, and their summaries. */
export interface IntervalInput {
  level: number;
  estimate: number;
  /** Finite replicates in ascending order. */
  sorted: Float64Array;
  mean: number;
  se: number;
  seMonteCarloError: number;
  /** BCa bias-correction (null when undefined). */
  z0: number | null;
  /** BCa acceleration from the jackknife (null when not computed or undefined). */
  acceleration: number | null;
  /** Studentized: sorted finite t* = (θ* − θ̂)/se*, and the SE of θ̂ by the same inner method. */
  studentized: { sortedT: Float64Array; se0: number } | null;
}

export interface IntervalOutcome {
  lower: number;
  upper: number;
  lowerMonteCarloError: number;
  upperMonteCarloError: number;
  /** An end point came from an extreme order statistic ((B+1)α outside (1, B)). */
  extreme: boolean;
}

/** Tail probabilities as R's boot.ci forms them: (1 − level)/2 and (1 + level)/2. */
export function tails(level: number): [number, number] {
  return [(1 - level) / 2, (1 + level) / 2];
}
