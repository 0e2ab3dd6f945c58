import type { ExactResult } from '../contract/response';
import type { PreparedScheme } from '../schemes/types';
import type { PreparedStatistic } from '../statistics/types';
import { ENUMERATION_LIMIT, enumeratedMoments, enumerateResamples, enumerationSize } from './enumerate';
import { exactOrderStatistic } from './order-statistic';

/** Largest n for the order-statistic formula (n incomplete-beta evaluations). */
export const ORDER_STATISTIC_LIMIT = 200_001;

/**
 * The ideal (B = ∞) bootstrap answer when one exists, in order of preference: a closed form
 * (the mean, a difference of means), the exact order-statistic distribution (the median of
 * odd n — Maritz & Jarrett 1978 — and other single order statistics), and full enumeration
 * when there are at most 200,000 distinct resamples. Closed forms and the order-statistic
 * formula assume plain resampling of the whole sample (or of each group); enumeration
 * follows the scheme's strata. Null otherwise, or when the statistic is undefined on some
 * resample.
 */
export function exactAnswer(statistic: PreparedStatistic, scheme: PreparedScheme, statisticName: string): ExactResult | null {
  if (scheme.plainResampling && statistic.closedForm) {
    const c = statistic.closedForm();
    if (c && Number.isFinite(c.se) && Number.isFinite(c.bias)) return { se: c.se, bias: c.bias, method: 'closed-form' };
  }
  if (scheme.plainResampling && statistic.orderStatistic && !statistic.groups && statistic.n <= ORDER_STATISTIC_LIMIT) {
    const { sorted, rank } = statistic.orderStatistic;
    const r = exactOrderStatistic(sorted, rank);
    if (Number.isFinite(r.se)) {
      return { se: r.se, bias: r.bias, method: statisticName === 'median' ? 'maritz-jarrett' : 'order-statistic' };
    }
  }
  const strata = scheme.counting?.strata;
  if (strata && enumerationSize(strata) <= ENUMERATION_LIMIT) {
    const e = enumerateResamples(statistic, strata);
    if (e) {
      const m = enumeratedMoments(e, statistic.estimate);
      if (Number.isFinite(m.se) && Number.isFinite(m.bias)) return { se: m.se, bias: m.bias, method: 'enumeration', resamples: e.values.length };
    }
  }
  return null;
}
