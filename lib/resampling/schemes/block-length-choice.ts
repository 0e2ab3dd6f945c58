import { BlockLengthError, optimalBlockLength } from '../blocklength';
import { EngineError } from '../errors';
import type { SchemeContext } from './types';

export interface BlockLengthChoice {
  /** the (mean) block length used */
  value: number;
  method: 'given' | 'auto';
  /** for "auto": the rule's m̂, bandwidth M, cap, and the uncapped value */
  auto?: { column: string; mHat: number; M: number; cap: number; raw: number | null; capped: boolean };
}

/**
 * Resolves a block length: a given number is checked against the shortest series; "auto"
 * runs the Politis & White (2004) rule with the Patton, Politis & White (2009) correction
 * (lib/resampling/blocklength) on every numeric column of every series and keeps the
 * largest value — the longest dependence decides, as for a multivariate series in the
 * authors' own code, which reports one length per column. The circular value serves the
 * moving-block scheme (rounded to a whole number), the stationary value the stationary
 * scheme.
 */
export function chooseBlockLength(
  ctx: SchemeContext,
  strata: Int32Array[],
  given: number | 'auto',
  kind: 'circular' | 'stationary',
  path: string,
): BlockLengthChoice {
  const shortest = Math.min(...strata.map((s) => s.length));
  const where = strata.length > 1 ? 'the smaller group' : 'the series';
  if (given !== 'auto') {
    if (given >= shortest) {
      throw new EngineError('invalid:request', `${path} is ${given} but ${where} has only ${shortest} values; the block length must be less than n (at most n/3 is usual)`, path);
    }
    return { value: given, method: 'given' };
  }
  let best: BlockLengthChoice | null = null;
  for (const [role, values] of Object.entries(ctx.data.values)) {
    for (const units of strata) {
      const series = Float64Array.from(units, (u) => values[u]);
      let r;
      try {
        r = optimalBlockLength(series);
      } catch (e) {
        if (e instanceof BlockLengthError) {
          throw new EngineError('invalid:data', `${path} "auto" cannot be chosen for column "${ctx.columnOf(role)}": ${e.message}; give a number instead`, path);
        }
        throw e;
      }
      const rawValue = kind === 'circular' ? r.raw.circular : r.raw.stationary;
      // the uncapped value is Infinity when the long-run variance estimate is 0: report null
      const raw = Number.isFinite(rawValue) ? rawValue : null;
      const chosen = kind === 'circular' ? r.circular : r.stationary;
      const value = kind === 'circular' ? Math.max(1, Math.round(chosen)) : chosen;
      if (!best || value > best.value) {
        best = { value, method: 'auto', auto: { column: ctx.columnOf(role), mHat: r.mHat, M: r.M, cap: r.cap, raw, capped: r.capped } };
      }
    }
  }
  if (!best) throw new EngineError('invalid:data', `${path} "auto" found no numeric column`, path);
  if (best.value >= shortest) {
    throw new EngineError('invalid:data', `${path} "auto" chose ${best.value}, not less than the ${shortest} values of ${where}`, path);
  }
  return best;
}
