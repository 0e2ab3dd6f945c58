import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runRequest } from '@/lib/resampling';
import { runR } from './structured-r';

// Outside reference: residual and case resampling of the least-squares slope on R's cars
// data with R's boot (structured-residual.R beside this file, run live, Davison & Hinkley
// 1997 §6.2.3), and the closed form Var*(b*) = mean(ε*²)/Sxx. Two Monte Carlo SEs from
// B = 20,000 each differ by ≈ 0.7% (1 sd); we allow 4%.
const R: Record<string, number[]> = {};
for (const line of runR(readFileSync(new URL('./structured-residual.R', import.meta.url), 'utf8')).split('\n')) {
  const m = /^(\S+) :(.*)$/.exec(line.trim());
  if (m) R[m[1]] = m[2].trim().split(/\s+/).map(Number);
}
const B = 20_000;
const data = { speed: R.speed, dist: R.dist };
const slope = { name: 'regression-slope', x: 'speed', y: 'dist' };

describe('residual scheme (fixed design) on cars', () => {
  it('modified residuals: SE ≈ R and ≈ the closed form; the response says residual resampling was used', () => {
    const r = runRequest({ data, statistic: slope, scheme: { name: 'residual' }, B, seed: 'cars' });
    expect(Math.abs(r.se! / R.cars_residual_modified[0] - 1)).toBeLessThan(0.04);
    expect(Math.abs(r.se! / R.cars_closed[0] - 1)).toBeLessThan(0.03);
    expect(r.estimate).toBeCloseTo(R.cars_residual_modified[2], 10);
    expect(r.scheme).toMatchObject({ name: 'residual', regression: 'residual', residuals: 'modified' });
    expect(r.warnings.map((w) => w.code)).toContain('regression-residual');
  });

  it('raw residuals: SE ≈ R and ≈ the closed form', () => {
    const r = runRequest({ data, statistic: slope, scheme: { name: 'residual', residuals: 'raw' }, B, seed: 'cars' });
    expect(Math.abs(r.se! / R.cars_residual_raw[0] - 1)).toBeLessThan(0.04);
    expect(Math.abs(r.se! / R.cars_closed[1] - 1)).toBeLessThan(0.03);
  });

  it('case resampling (ordinary): SE ≈ R boot over rows, with a note that cases were resampled', () => {
    const r = runRequest({ data, statistic: slope, B, seed: 'cars' });
    expect(Math.abs(r.se! / R.cars_cases[0] - 1)).toBeLessThan(0.04);
    expect(r.scheme).toEqual({ name: 'ordinary', regression: 'cases' });
    expect(r.warnings.map((w) => w.code)).toContain('regression-cases');
  });

  it('refuses a non-regression statistic', () => {
    expect(() => runRequest({ data, statistic: { name: 'mean', column: 'dist' }, scheme: { name: 'residual' }, B: 100 })).toThrow(/regression-slope/);
  });
});
