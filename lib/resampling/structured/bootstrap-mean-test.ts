export type MeanTestAlternative = 'two-sided' | 'less' | 'greater';

export interface BootstrapMeanTest {
  name: 'bootstrap-mean';
  alternative: MeanTestAlternative;
  nullValue: number;
  /** t = (x̄ − μ₀) / (s/√n) on the data */
  observed: number;
  pValue: number;
  count: number;
  /** resamples with a finite t* (a resample of identical values has none) */
  total: number;
  monteCarloError: number;
}

/**
 * Bootstrap test of H₀: mean = μ₀ (Efron & Tibshirani 1993, "An Introduction to the
 * Bootstrap", §16.4, Algorithm 16.2).
 *
 * The data are shifted to obey the null, z̃_i = x_i − x̄ + μ₀, resampled with replacement B
 * times, and the studentized statistic t* = (z̄* − μ₀) / (s* / √n) (s with divisor n − 1) is
 * compared with t_obs = (x̄ − μ₀) / (s/√n):
 *   greater: t* ≥ t_obs,  less: t* ≤ t_obs,  two-sided: |t*| ≥ |t_obs|
 *   p = (count + 1) / (B + 1), Monte Carlo error √(p(1 − p)/B)
 * (the +1 rule of Davison & Hinkley 1997, §4.2.2, eq. 4.11, which keeps the test's level).
 * Studentizing makes the test second-order accurate (Hall 1992, §3.12).
 *
 * Indices ⌊u·n⌋ for u = random(). Cost: O(B·n). Throws RangeError for fewer than 3 values,
 * non-finite input or data with no spread (t_obs undefined).
 */
export function bootstrapMeanTest(
  x: ArrayLike<number>,
  nullValue: number,
  B: number,
  random: () => number,
  alternative: MeanTestAlternative = 'two-sided',
): BootstrapMeanTest {
  const n = x.length;
  if (n < 3) throw new RangeError('a bootstrap test of the mean needs at least 3 values');
  if (!Number.isFinite(nullValue)) throw new RangeError('the null value must be a finite number');
  let sum = 0;
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(x[i])) throw new RangeError(`value ${i + 1} is not a finite number`);
    sum += x[i];
  }
  const mean = sum / n;
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (x[i] - mean) ** 2;
  const sd = Math.sqrt(ss / (n - 1));
  if (!(sd > 0)) throw new RangeError('all values are equal: the t statistic is undefined');
  const observed = (mean - nullValue) / (sd / Math.sqrt(n));
  const z = new Float64Array(n);
  for (let i = 0; i < n; i++) z[i] = x[i] - mean + nullValue;
  const tol = 1.4901161193847656e-8 * Math.abs(observed);
  let count = 0;
  let total = 0;
  for (let b = 0; b < B; b++) {
    let s1 = 0;
    let s2 = 0;
    // one pass: shifted sums around μ₀ keep the variance numerically stable
    for (let i = 0; i < n; i++) {
      const d = z[Math.floor(random() * n)] - nullValue;
      s1 += d;
      s2 += d * d;
    }
    const m = s1 / n;
    const v = (s2 - n * m * m) / (n - 1);
    if (!(v > 1e-28 * (s2 / n + 1e-300))) continue;
    const t = m / Math.sqrt(v / n);
    total++;
    if (alternative === 'greater' ? t >= observed - tol : alternative === 'less' ? t <= observed + tol : Math.abs(t) >= Math.abs(observed) - tol) count++;
  }
  const pValue = (count + 1) / (total + 1);
  return {
    name: 'bootstrap-mean',
    alternative,
    nullValue,
    observed,
    pValue,
    count,
    total,
    monteCarloError: total > 0 ? Math.sqrt((pValue * (1 - pValue)) / total) : 0,
  };
}
