export type Alternative = 'two-sided' | 'less' | 'greater';

/**
 * Relative tolerance for ties between a relabelled statistic and the observed one:
 * √(machine ε) ≈ 1.49e-8, the default of R's `all.equal`. Why: the same mathematical
 * value computed from values in another order can differ in the last bits (0.1 + 0.2 vs
 * 0.3), and a tie lost that way would make p too small.
 */
export const TIE_TOLERANCE = 1.4901161193847656e-8;

/**
 * Is a relabelled statistic t at least as extreme as the observed one?
 *   greater:    t ≥ t_obs − tol
 *   less:       t ≤ t_obs + tol
 *   two-sided:  |t| ≥ |t_obs| − tol      (for statistics centred at 0 under the null,
 *                                         such as a difference of means or medians)
 * with tol = TIE_TOLERANCE · max(|t_obs|, scale). `scale` lets a caller whose observed
 * statistic may be exactly 0 give the size of the data (e.g. the largest |value|).
 */
export function asExtreme(t: number, observed: number, alternative: Alternative, tol: number): boolean {
  switch (alternative) {
    case 'greater':
      return t >= observed - tol;
    case 'less':
      return t <= observed + tol;
    case 'two-sided':
      return Math.abs(t) >= Math.abs(observed) - tol;
  }
}
