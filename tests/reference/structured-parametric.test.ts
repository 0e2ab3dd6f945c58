import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { EngineError, runRequest } from '@/lib/resampling';
import { runR } from './structured-r';

// Outside reference: boot(..., sim = "parametric") from R's boot package with
// MASS::fitdistr fits (structured-parametric.R beside this file, run live). Two Monte Carlo
// SEs from B = 20,000 each differ by about SE/√B ≈ 0.7% (1 sd) for smooth statistics; we
// allow 4%, and 8% for medians and variances (heavier-tailed replicates).
const R: Record<string, number[]> = {};
for (const line of runR(readFileSync(new URL('./structured-parametric.R', import.meta.url), 'utf8')).split('\n')) {
  const m = /^(\S+) :(.*)$/.exec(line.trim());
  if (m) R[m[1]] = m[2].trim().split(/\s+/).map(Number);
}
const B = 20_000;
const run = (x: number[], family: string, statistic: string) =>
  runRequest({ data: { x }, statistic: { name: statistic, column: 'x' }, scheme: { name: 'parametric', family }, B, seed: 'parametric' });
type Fits = { family: string; fits: { parameters: Record<string, number>; logLikelihood: number; n: number }[] };

describe('parametric scheme against R boot(sim = "parametric")', () => {
  it('exponential, mean of airquality$Ozone: SE ≈ R and ≈ the closed form x̄/√n; reports the fitted rate', () => {
    const x = R.ozone;
    const r = run(x, 'exponential', 'mean');
    const [rSe, rate] = R.ozone_exp_mean;
    const xbar = x.reduce((a, b) => a + b) / x.length;
    // closed form: Var(X̄*) = (1/λ̂)²/n = x̄²/n under the fitted exponential
    expect(Math.abs(r.se! / (xbar / Math.sqrt(x.length)) - 1)).toBeLessThan(0.03);
    expect(Math.abs(r.se! / rSe - 1)).toBeLessThan(0.04);
    const s = r.scheme as unknown as Fits;
    expect(s.family).toBe('exponential');
    expect(s.fits[0].parameters.rate).toBeCloseTo(rate, 12);
    expect(r.exact).toBeNull(); // closed forms of the engine are for plain resampling only
  });

  it('normal, median of nhtemp: SE ≈ R; fitted mean and sd (divisor n) = MASS::fitdistr', () => {
    const r = run(R.nhtemp, 'normal', 'median');
    const [rSe, mean, sd] = R.nhtemp_norm_median;
    expect(Math.abs(r.se! / rSe - 1)).toBeLessThan(0.08);
    const p = (r.scheme as unknown as Fits).fits[0].parameters;
    expect(p.mean).toBeCloseTo(mean, 10);
    expect(p.sd).toBeCloseTo(sd, 10);
  });

  it('lognormal, median of rivers: SE ≈ R', () => {
    const r = run(R.rivers, 'lognormal', 'median');
    const [rSe, meanlog, sdlog] = R.rivers_lnorm_median;
    expect(Math.abs(r.se! / rSe - 1)).toBeLessThan(0.08);
    expect((r.scheme as unknown as Fits).fits[0].parameters).toEqual({ meanlog: expect.closeTo(meanlog, 10), sdlog: expect.closeTo(sdlog, 10) });
  });

  it('poisson, variance of warpbreaks$breaks: SE ≈ R; mean: SE ≈ √(λ̂/n)', () => {
    const r = run(R.breaks, 'poisson', 'variance');
    expect(Math.abs(r.se! / R.breaks_pois_var[0] - 1)).toBeLessThan(0.08);
    const m = run(R.breaks, 'poisson', 'mean');
    const lambda = R.breaks_pois_var[1];
    expect(Math.abs(m.se! / Math.sqrt(lambda / R.breaks.length) - 1)).toBeLessThan(0.03);
  });

  it('two-group statistics fit each group on its own', () => {
    const data = { x: [...R.ozone.slice(0, 30), ...R.ozone.slice(30, 70)], g: [...Array(30).fill('up'), ...Array(40).fill('down')] };
    const r = runRequest({ data, statistic: { name: 'mean-difference', column: 'x', group: 'g', levels: ['up', 'down'] }, scheme: { name: 'parametric', family: 'exponential' }, B: 4000, seed: 'p2' });
    const fits = (r.scheme as unknown as { fits: { group: string; n: number }[] }).fits;
    expect(fits.map((f) => [f.group, f.n])).toEqual([
      ['up', 30],
      ['down', 40],
    ]);
    // closed form: √(x̄₁²/n₁ + x̄₂²/n₂)
    const m = (v: number[]) => v.reduce((a, b) => a + b) / v.length;
    const want = Math.sqrt(m(R.ozone.slice(0, 30)) ** 2 / 30 + m(R.ozone.slice(30, 70)) ** 2 / 40);
    expect(Math.abs(r.se! / want - 1)).toBeLessThan(0.05);
  });
});

describe('families that cannot fit the data', () => {
  const fail = (x: unknown[], family: string) => {
    try {
      runRequest({ data: { nitrate: x }, statistic: { name: 'mean', column: 'nitrate' }, scheme: { name: 'parametric', family }, B: 100 });
    } catch (e) {
      return e as EngineError;
    }
    throw new Error('expected an error');
  };
  it('names the field and the row', () => {
    const neg = fail([1.2, 3.4, -0.5, 2], 'exponential');
    expect(neg.path).toBe('scheme.family');
    expect(neg.message).toMatch(/data\.nitrate\[2\] is negative \(-0\.5\)/);
    expect(fail([1, 2.5, 3], 'poisson').message).toMatch(/data\.nitrate\[1\] is not a whole number/);
    expect(fail([1, 0, 3], 'lognormal').message).toMatch(/needs values > 0/);
    expect(fail([2, 2, 2], 'normal').message).toMatch(/all values are equal/);
    expect(fail([1, 2, 3], 'gamma').path).toBe('scheme.family');
  });
  it('refuses statistics of two columns', () => {
    expect(() =>
      runRequest({ data: { x: [1, 2, 3, 4], y: [2, 1, 4, 3] }, statistic: { name: 'correlation', x: 'x', y: 'y' }, scheme: { name: 'parametric', family: 'normal' }, B: 100 }),
    ).toThrow(/fits one column/);
  });
});
