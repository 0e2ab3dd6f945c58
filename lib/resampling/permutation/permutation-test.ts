import { asExtreme, TIE_TOLERANCE, type Alternative } from './as-extreme';
import { countRelabellings } from './count-relabellings';
import { PermutationError } from './permutation-error';

/** A two-group statistic: values of group A and of group B → a number. */
export type TwoGroupStatistic = (a: Float64Array, b: Float64Array) => number;

export interface PermutationOptions {
  alternative?: Alternative;
  /** relabellings drawn when enumeration is too large; default 9999 */
  B?: number;
  /** uniform [0, 1) source for the Monte Carlo branch (required when it is taken) */
  random?: () => number;
  /** enumerate exactly when C(n1 + n2, n1) ≤ this; default 200,000 */
  exactLimit?: number;
  /** size of the data for the tie tolerance (see asExtreme); default 0 */
  scale?: number;
}

export interface PermutationResult {
  name: 'permutation';
  alternative: Alternative;
  method: 'exact' | 'monte-carlo';
  observed: number;
  pValue: number;
  /** relabellings at least as extreme as the observed one (exact: includes the observed labelling) */
  count: number;
  /** relabellings looked at: C(n1 + n2, n1) when exact, B when Monte Carlo */
  total: number;
  /** √(p(1 − p)/B) for Monte Carlo, 0 when exact */
  monteCarloError: number;
  /** relabellings whose statistic was not finite (left out of count and total) */
  nonFinite: number;
  /** all pooled values equal: every relabelling gives the same statistic, p = 1 */
  allTied: boolean;
}

/**
 * Two-group permutation test (Fisher 1935; Pitman 1937): under the null hypothesis that
 * both groups come from one distribution, every split of the pooled n1 + n2 values into
 * groups of sizes n1 and n2 is equally likely.
 *
 * Exact when C(n1 + n2, n1) ≤ exactLimit (default 200,000): every split is enumerated (as
 * the lexicographic combinations of the pooled indices) and
 *   p = #{splits with T* as extreme as T_obs} / C(n1 + n2, n1)
 * — the observed split is one of them, so p ≥ 1/C.
 *
 * Otherwise Monte Carlo: B random splits (a partial Fisher–Yates shuffle of the pooled
 * indices for each) and
 *   p = (count + 1) / (B + 1),   Monte Carlo error √(p(1 − p)/B)
 * — the +1s count the observed split, which keeps the test exact in level (Davison &
 * Hinkley 1997, "Bootstrap Methods and their Application", §4.3, eq. 4.11; Phipson &
 * Smyth 2010, Stat. Appl. Genet. Mol. Biol. 9(1), art. 39).
 *
 * "As extreme" follows `asExtreme` (two-sided: |T*| ≥ |T_obs|) with a small relative tie
 * tolerance. The statistic receives reused buffers: it must not keep or change them.
 *
 * Cost: exact O(C · (N + cost of T)); Monte Carlo O(B · (N + cost of T)).
 * Throws PermutationError: an empty group, a non-finite value, a non-finite observed
 * statistic, or a bad B / missing random source when Monte Carlo is needed.
 *
 * @example permutationTest([1, 2], [3, 4], (a, b) => mean(a) - mean(b)).pValue // two-sided → 1/3
 */
export function permutationTest(
  groupA: ArrayLike<number>,
  groupB: ArrayLike<number>,
  statistic: TwoGroupStatistic,
  options: PermutationOptions = {},
): PermutationResult {
  const alternative = options.alternative ?? 'two-sided';
  if (alternative !== 'two-sided' && alternative !== 'less' && alternative !== 'greater') {
    throw new PermutationError('bad-alternative', `alternative must be two-sided, less or greater, not "${String(alternative)}"`);
  }
  const n1 = groupA.length;
  const n2 = groupB.length;
  if (n1 === 0 || n2 === 0) throw new PermutationError('empty-group', `both groups need at least one value (sizes ${n1} and ${n2})`);
  const N = n1 + n2;
  const pooled = new Float64Array(N);
  for (let i = 0; i < n1; i++) pooled[i] = groupA[i];
  for (let i = 0; i < n2; i++) pooled[n1 + i] = groupB[i];
  for (let i = 0; i < N; i++) {
    if (!Number.isFinite(pooled[i])) {
      const where = i < n1 ? `value ${i + 1} of the first group` : `value ${i - n1 + 1} of the second group`;
      throw new PermutationError('non-finite', `${where} is not a finite number`);
    }
  }
  const a = new Float64Array(n1);
  const b = new Float64Array(n2);
  a.set(pooled.subarray(0, n1));
  b.set(pooled.subarray(n1));
  const observed = statistic(a, b);
  if (!Number.isFinite(observed)) {
    throw new PermutationError('non-finite-statistic', 'the statistic is not a finite number on the observed groups (zero variance?)');
  }
  const tol = TIE_TOLERANCE * Math.max(Math.abs(observed), options.scale ?? 0);
  let allTied = true;
  for (let i = 1; i < N; i++) if (pooled[i] !== pooled[0]) allTied = false;

  const exactLimit = options.exactLimit ?? 200_000;
  const total = countRelabellings(n1, n2, exactLimit);
  const base = { name: 'permutation' as const, alternative, observed, allTied };

  if (total <= exactLimit) {
    const { count, nonFinite } = enumerate(pooled, n1, a, b, statistic, observed, alternative, tol);
    const looked = total - nonFinite;
    return { ...base, method: 'exact', pValue: count / looked, count, total: looked, monteCarloError: 0, nonFinite };
  }

  const B = options.B ?? 9999;
  if (!Number.isInteger(B) || B < 1) throw new PermutationError('bad-B', `B must be a positive whole number, not ${B}`);
  const random = options.random;
  if (!random) throw new PermutationError('bad-B', 'a random source is needed for a Monte Carlo permutation test');
  const perm = new Int32Array(N);
  for (let i = 0; i < N; i++) perm[i] = i;
  let count = 0;
  let nonFinite = 0;
  for (let r = 0; r < B; r++) {
    // partial Fisher–Yates: positions 0..n1−1 become a uniform random n1-subset; continuing
    // from the previous permutation keeps every draw uniform.
    for (let i = 0; i < n1; i++) {
      const j = i + Math.floor(random() * (N - i));
      const t = perm[i];
      perm[i] = perm[j];
      perm[j] = t;
    }
    for (let i = 0; i < n1; i++) a[i] = pooled[perm[i]];
    for (let i = n1; i < N; i++) b[i - n1] = pooled[perm[i]];
    const t = statistic(a, b);
    if (!Number.isFinite(t)) nonFinite++;
    else if (asExtreme(t, observed, alternative, tol)) count++;
  }
  const drawn = B - nonFinite;
  const pValue = (count + 1) / (drawn + 1);
  const monteCarloError = drawn > 0 ? Math.sqrt((pValue * (1 - pValue)) / drawn) : 0;
  return { ...base, method: 'monte-carlo', pValue, count, total: drawn, monteCarloError, nonFinite };
}

/** Every n1-subset of 0..N−1 in lexicographic order; counts splits as extreme as observed. */
function enumerate(
  pooled: Float64Array,
  n1: number,
  a: Float64Array,
  b: Float64Array,
  statistic: TwoGroupStatistic,
  observed: number,
  alternative: Alternative,
  tol: number,
): { count: number; nonFinite: number } {
  const N = pooled.length;
  const idx = new Int32Array(n1);
  for (let i = 0; i < n1; i++) idx[i] = i;
  const inA = new Uint8Array(N);
  let count = 0;
  let nonFinite = 0;
  for (;;) {
    inA.fill(0);
    for (let i = 0; i < n1; i++) {
      a[i] = pooled[idx[i]];
      inA[idx[i]] = 1;
    }
    let j = 0;
    for (let i = 0; i < N; i++) if (!inA[i]) b[j++] = pooled[i];
    const t = statistic(a, b);
    if (!Number.isFinite(t)) nonFinite++;
    else if (asExtreme(t, observed, alternative, tol)) count++;
    // next combination: rightmost index that can still move right
    let i = n1 - 1;
    while (i >= 0 && idx[i] === N - n1 + i) i--;
    if (i < 0) break;
    idx[i]++;
    for (let k = i + 1; k < n1; k++) idx[k] = idx[k - 1] + 1;
  }
  return { count, nonFinite };
}
