import * as z from 'zod/mini';
import { stationaryMean } from '../structured/block-sums';
import { addStationaryCounts } from '../structured/stationary-counts';
import { chooseBlockLength } from './block-length-choice';
import { seriesStrata } from './series-strata';
import { meanFastPath } from './block-mean-fast-path';
import { defineScheme } from './types';

/**
 * Stationary bootstrap (Politis & Romano 1994): like the circular block bootstrap but with
 * block lengths drawn from a geometric distribution with mean `meanBlockLength`
 * (1 + Geometric(1/ℓ̄), as R's tsboot(sim = "geom")), which makes the resampled series
 * stationary. `meanBlockLength: "auto"` uses the Politis & White (2004) rule with the
 * Patton, Politis & White (2009) correction for the stationary bootstrap.
 */
const schema = z.strictObject({
  name: z.literal('stationary'),
  meanBlockLength: z._default(
    z.union([z.number().check(z.gte(1, 'meanBlockLength must be at least 1')), z.literal('auto')], { error: 'meanBlockLength must be a number of rows (at least 1) or "auto"' }),
    'auto',
  ),
});

export const stationary = defineScheme({
  name: 'stationary',
  schema,
  labelColumns: () => [],
  prepare(ctx, s) {
    const strata = seriesStrata(ctx);
    const choice = chooseBlockLength(ctx, strata, s.meanBlockLength, 'stationary', 'scheme.meanBlockLength');
    const l = choice.value;
    const counts = new Int32Array(ctx.n);
    const fast = meanFastPath(ctx, strata);
    return {
      description: `stationary bootstrap, geometric block lengths with mean ${round(l)} rows${choice.method === 'auto' ? ' (chosen by the Politis–White rule)' : ''}${strata.length > 1 ? ', within each group' : ''}`,
      plainResampling: false,
      // block sums of the mean cost O(n/ℓ) per replicate
      workPerReplicate: fast ? 4 * Math.ceil(ctx.n / l) : undefined,
      details: { variant: 'circular', meanBlockLength: l, blockLengthMethod: choice.method, ...(choice.auto ? { auto: choice.auto } : {}) },
      replicate(rng) {
        const random = () => rng.double();
        if (fast) {
          const a = stationaryMean(fast[0], l, random);
          return fast.length === 1 ? a : a - stationaryMean(fast[1], l, random);
        }
        counts.fill(0);
        for (const units of strata) addStationaryCounts(units, l, random, counts);
        return ctx.statistic.fromCounts(counts, ctx.n);
      },
    };
  },
});

function round(x: number): string {
  return Number.isInteger(x) ? String(x) : x.toFixed(2);
}
