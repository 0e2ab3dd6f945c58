import * as z from 'zod/mini';
import { EngineError } from '../errors';
import { FAMILIES, FitError, type FittedModel, fitFamily } from '../fit';
import { simulate } from '../fit/simulate';
import type { StatisticData } from '../statistics/types';
import { defineScheme } from './types';

/**
 * Parametric bootstrap: fit the family by maximum likelihood (lib/resampling/fit), draw B
 * samples of the same size from the fitted model, recompute the statistic on each
 * (Efron & Tibshirani 1993, §6.5; Davison & Hinkley 1997, §2.2). For a two-group
 * statistic each group gets its own fit and keeps its size. Works for statistics of one
 * numeric column. The fitted parameters are reported in the response (`scheme.fits`).
 * For the mean under an exponential model the ideal SE is x̄/√n.
 */
const schema = z.strictObject({
  name: z.literal('parametric'),
  family: z.enum(FAMILIES, { error: `family must be one of ${FAMILIES.join(', ')}` }),
});

export const parametric = defineScheme({
  name: 'parametric',
  schema,
  labelColumns: () => [],
  prepare(ctx, s) {
    const roles = Object.keys(ctx.data.values);
    if (roles.length !== 1) {
      throw new EngineError('invalid:request', `the parametric scheme fits one column; the ${ctx.statisticName} statistic uses ${roles.length} (${roles.map(ctx.columnOf).join(', ')})`, 'scheme.name');
    }
    const role = roles[0];
    const x = ctx.data.values[role];
    const groups = ctx.data.group;
    const parts: Int32Array[] = groups
      ? [0, 1].map((g) => Int32Array.from(Array.from(groups.keys()).filter((i) => groups[i] === g)))
      : [Int32Array.from({ length: ctx.n }, (_, i) => i)];
    const fits: FittedModel[] = parts.map((units, k) => {
      try {
        return fitFamily(s.family, Float64Array.from(units, (u) => x[u]));
      } catch (e) {
        if (!(e instanceof FitError)) throw e;
        const where = groups ? ` in group "${ctx.groupLevels?.[k] ?? k}"` : '';
        const col = ctx.columnOf(role);
        const what = e.index !== undefined ? `data.${col}[${ctx.rowOf(units[e.index])}] ${e.reason}` : e.reason;
        throw new EngineError(
          'invalid:data',
          `the ${s.family} family cannot be fitted to column "${col}"${where}: ${what}`,
          'scheme.family',
        );
      }
    });
    const buffers = parts.map((u) => new Float64Array(u.length));
    const values = new Float64Array(ctx.n);
    const sim: StatisticData = { n: ctx.n, values: { [role]: values }, group: groups };
    return {
      description: `parametric bootstrap from a ${s.family} model fitted by maximum likelihood${groups ? ' to each group' : ''}`,
      plainResampling: false,
      details: {
        family: s.family,
        fits: fits.map((f, k) => ({ ...(groups ? { group: ctx.groupLevels?.[k] } : {}), parameters: f.parameters, logLikelihood: f.logLikelihood, n: f.n })),
      },
      replicate(rng) {
        for (let k = 0; k < parts.length; k++) {
          simulate(fits[k], buffers[k], () => rng.double());
          const units = parts[k];
          for (let j = 0; j < units.length; j++) values[units[j]] = buffers[k][j];
        }
        return ctx.evaluate(sim);
      },
    };
  },
});
