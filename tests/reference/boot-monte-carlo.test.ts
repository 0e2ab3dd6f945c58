// The engine and R's boot each with their own random numbers (R: set.seed + boot, from
// Debian's r-cran-boot) on data sets from R's `datasets` package: SE and interval end points
// must agree within Monte Carlo error — the engine's stated Monte Carlo errors (for the R side
// the same size is assumed, as both use B replicates of the same statistic), 4 combined SEs.
import { describe, expect, it } from 'vitest';
import { runRequest } from '@/lib/resampling';
import { hasR, keyValues, rDataset, rscript } from './support/r';

describe.skipIf(!hasR)('engine vs R boot, independent random numbers', () => {
  const cases = [
    { dataset: 'rivers', column: 'value', statistic: 'median' },
    { dataset: 'precip', column: 'value', statistic: 'sd' },
    { dataset: 'airquality', column: 'Wind', statistic: 'mean' },
  ];
  for (const c of cases) {
    it(`${c.statistic} of ${c.dataset}${c.column === 'value' ? '' : `$${c.column}`}`, () => {
      const B = 4000;
      const x = rDataset(c.dataset)[c.column] as number[];
      const ours = runRequest({ data: { x }, statistic: { name: c.statistic, column: 'x' }, B, seed: `mc-${c.dataset}`, intervals: { level: 0.95, methods: ['normal', 'percentile'] } });
      const theirs = keyValues(rscript('boot-own.R', [c.dataset, c.column, c.statistic, String(B), '20240', '0.95']));
      const tol = (mc: number) => 4 * Math.SQRT2 * mc;
      expect(Math.abs(ours.se! - theirs.se)).toBeLessThanOrEqual(tol(ours.seMonteCarloError!));
      for (const m of ['normal', 'percentile'] as const) {
        const iv = ours.intervals[m]!;
        expect(Math.abs(iv.lower! - theirs[`${m}.lower`])).toBeLessThanOrEqual(tol(iv.lowerMonteCarloError!) + 1e-12);
        expect(Math.abs(iv.upper! - theirs[`${m}.upper`])).toBeLessThanOrEqual(tol(iv.upperMonteCarloError!) + 1e-12);
      }
    }, 60_000);
  }
});
