import type { Advice } from '../contract/response';
import { replicatesForSe } from './se-error';

/**
 * Advice on B. Monte Carlo errors shrink as 1/√B, so an end point whose Monte Carlo error is
 * e at B replicates needs B·(e / (f·se))² replicates to reach f·se. The SE's own requirement
 * comes from replicatesForSe. Common practice in the trade, for comparison: about 100–200
 * replicates are usually enough for a standard error, while interval end points need
 * 1,000–2,000 or more (Efron & Tibshirani 1993, §6.4 and §19.3).
 */
/** Advice above this is reported as this (it means: B will not fix it). */
export const ADVICE_CAP = 1e9;

export function adviseB(B: number, se: number, excessKurtosis: number, endPointErrors: number[]): Advice {
  const okSe = Number.isFinite(se) && se > 0;
  const se1 = okSe ? replicatesForSe(excessKurtosis, 0.01) : null;
  const se5 = okSe ? replicatesForSe(excessKurtosis, 0.05) : null;
  const errs = endPointErrors.filter((e) => Number.isFinite(e));
  const worst = errs.length ? Math.max(...errs) : null;
  const need = (f: number) => (okSe && worst !== null ? Math.min(ADVICE_CAP, Math.max(10, Math.ceil(B * (worst / (f * se)) ** 2))) : null);
  const iv1 = need(0.01);
  const iv5 = need(0.05);
  const parts: string[] = [];
  if (se1 !== null && se5 !== null) {
    parts.push(`For the SE: B = ${B} gives a Monte Carlo error of about ${pct(Math.sqrt((Math.max(excessKurtosis, -2) + 2) / (4 * B)))} of the SE; B ≥ ${se5} brings it under 5%, B ≥ ${se1} under 1%.`);
  }
  if (iv1 !== null && iv5 !== null && worst !== null) {
    parts.push(
      iv5 >= ADVICE_CAP
        ? 'For the interval end points: their Monte Carlo error is too large for any practical B; the interval itself is unstable here.'
        : `For the interval end points: the largest Monte Carlo error is ${pct(worst / se)} of the SE; B ≥ ${iv5} brings every end point under 5%, B ≥ ${iv1 >= ADVICE_CAP ? 'an impractical number' : iv1} under 1%.`,
    );
  }
  if (!parts.length) parts.push('No advice: the replicates have no spread.');
  return { seWithin1Percent: se1, seWithin5Percent: se5, intervalsWithin1Percent: iv1, intervalsWithin5Percent: iv5, message: parts.join(' ') };
}

function pct(f: number): string {
  const p = f * 100;
  return `${p < 0.1 ? p.toFixed(2) : p < 10 ? p.toFixed(1) : p.toFixed(0)}%`;
}
