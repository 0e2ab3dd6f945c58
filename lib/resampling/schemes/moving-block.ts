import * as z from 'zod/mini';
import { movingBlockMeanFromStarts } from '../structured/block-sums';
import { addMovingBlockCountsFromStarts, blockCount } from '../structured/moving-block-counts';
import { chooseBlockLength } from './block-length-choice';
import { seriesStrata } from './series-strata';
import { meanFastPath } from './block-mean-fast-path';
import { defineScheme } from './types';

/**
 * Moving-block bootstrap, circular variant: the series (rows in order; each group on its
 * own for two-group statistics) is rebuilt from ⌈n/ℓ⌉ blocks of ℓ consecutive rows, each
 * starting at a uniform row and wrapping past the end (Künsch 1989; Politis & Romano 1992's
 * circular block bootstrap; as R's tsboot(sim = "fixed") with its default endcorr = TRUE).
 * Keeps the dependence within blocks, so the SE of a mean of a correlated series is not
 * understated as with rows drawn one by one. `blockLength: "auto"` uses the Politis &
 * White (2004) rule with the Patton, Politis & White (2009) correction.
 */
const schema = z.strictObject({
  name: z.literal('moving-block'),
  blockLength: z._default(
    z.union([z.number().check(z.int('blockLength must be a whole number'), z.gte(1, 'blockLength must be at least 1')), z.literal('auto')], {
      error: 'blockLength must be a whole number of rows or "auto"',
    }),
    'auto',
  ),
});

export const movingBlock = defineScheme({
  name: 'moving-block',
  schema,
  labelColumns: () => [],
  prepare(ctx, s) {
    const strata = seriesStrata(ctx);
    const choice = chooseBlockLength(ctx, strata, s.blockLength, 'circular', 'scheme.blockLength');
    const l = choice.value;
    const counts = new Int32Array(ctx.n);
    const fast = meanFastPath(ctx, strata);
    const blocks = strata.map((units) => blockCount(units.length, l));
    const starts = new Int32Array(Math.max(...blocks));
    return {
      description: `moving-block bootstrap (circular), blocks of ${l} consecutive rows${choice.method === 'auto' ? ' (length chosen by the Politis–White rule)' : ''}${strata.length > 1 ? ', within each group' : ''}`,
      plainResampling: false,
      // block sums of the mean cost O(n/ℓ) per replicate
      workPerReplicate: fast ? 4 * Math.ceil(ctx.n / l) : undefined,
      details: { variant: 'circular', blockLength: l, blockLengthMethod: choice.method, ...(choice.auto ? { auto: choice.auto } : {}) },
      replicate(rng) {
        // block starts by the engine's unbiased bulk index draws, series after series
        if (fast) {
          rng.fillIndices(starts, 0, fast[0].m, blocks[0]);
          const a = movingBlockMeanFromStarts(fast[0], l, starts);
          if (fast.length === 1) return a;
          rng.fillIndices(starts, 0, fast[1].m, blocks[1]);
          return a - movingBlockMeanFromStarts(fast[1], l, starts);
        }
        counts.fill(0);
        strata.forEach((units, j) => {
          rng.fillIndices(starts, 0, units.length, blocks[j]);
          addMovingBlockCountsFromStarts(units, l, starts, counts);
        });
        return ctx.statistic.fromCounts(counts, ctx.n);
      },
    };
  },
});
