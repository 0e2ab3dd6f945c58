import * as z from 'zod/mini';
import { EngineError } from '../errors';
import type { StatisticData } from '../statistics/types';
import { leastSquaresLine } from '../structured/least-squares-line';
import { fillResidualResponse, residualPool } from '../structured/residual-pool';
import { defineScheme } from './types';

/**
 * Residual resampling for a least-squares line (fixed design): keep x as observed, build
 * y* = ŷ + ε* with ε* drawn with replacement from the residuals, refit, recompute
 * (Efron & Tibshirani 1993, §9.5; Davison & Hinkley 1997, Algorithm 6.1). `residuals`:
 * "modified" (default) divides each by √(1 − hᵢ), hᵢ the leverage, and centres them, so
 * they have the errors' variance (Davison & Hinkley eq. 6.9); "raw" uses them as they are
 * (SEs smaller by about √((n − 2)/n)). The alternative, resampling cases (rows), is the
 * `ordinary` scheme; the response says which one was used.
 */
const schema = z.strictObject({
  name: z.literal('residual'),
  residuals: z._default(z.enum(['modified', 'raw'], { error: 'residuals must be modified or raw' }), 'modified'),
});

const REGRESSION = ['regression-slope', 'regression-intercept'];

export const residual = defineScheme({
  name: 'residual',
  schema,
  labelColumns: () => [],
  prepare(ctx, s) {
    if (!REGRESSION.includes(ctx.statisticName)) {
      throw new EngineError('invalid:request', `the residual scheme is for regression-slope and regression-intercept, not ${ctx.statisticName}`, 'scheme.name');
    }
    const { x, y } = ctx.data.values;
    let line;
    try {
      line = leastSquaresLine(x, y);
    } catch (e) {
      throw new EngineError('invalid:data', `no least-squares line: ${(e as Error).message}`, 'statistic.x');
    }
    const pool = residualPool(line.residuals, s.residuals === 'modified' ? line.leverages : null);
    const yStar = new Float64Array(ctx.n);
    const sim: StatisticData = { n: ctx.n, values: { x, y: yStar } };
    const maxLeverage = line.leverages.reduce((m, h) => Math.max(m, h), 0);
    return {
      description: `residual bootstrap (fixed design: x kept, ${s.residuals === 'modified' ? 'leverage-adjusted' : 'raw'} residuals resampled with replacement and added to the fitted line)`,
      plainResampling: false,
      details: { regression: 'residual', residuals: s.residuals, intercept: line.intercept, slope: line.slope, maxLeverage },
      replicate(rng) {
        fillResidualResponse(line.fitted, pool, () => rng.double(), yStar);
        return ctx.evaluate(sim);
      },
    };
  },
});
