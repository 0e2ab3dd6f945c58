// A published BCa worked example: Efron, B. & Tibshirani, R. J. (1993), An Introduction to the
// Bootstrap, Chapman & Hall, §14.3 and Table 14.2 — the spatial test data (26 children, test A;
// their Table 14.1), statistic the plug-in variance θ̂ = Σ(x − x̄)²/n, 90% intervals from
// B = 2000 replicates.
//
// Published values used here — from memory of that table and text, so treat them as such:
//   θ̂ = 171.5, â = 0.061, ẑ₀ = 0.146, BCa (115.8, 259.6), percentile (100.8, 233.9).
// θ̂ and â are deterministic functions of the data and are checked tightly (they also confirm
// the data values); the interval end points and ẑ₀ carry the book's own Monte Carlo error
// (B = 2000), so they are checked within 3 Monte Carlo standard errors (the engine's estimate of
// the error at B = 2000, combined with its own at B = 20,000).
//
// The engine's `variance` has the n − 1 divisor; the plug-in variance is (n−1)/n times it. BCa
// and percentile intervals are transformation-respecting and â is scale-free, so the engine's
// end points are multiplied by 25/26 to compare.
import { describe, expect, it } from 'vitest';
import { runRequest } from '@/lib/resampling';

const testA = [48, 36, 20, 29, 42, 42, 20, 42, 22, 41, 45, 14, 6, 0, 33, 28, 34, 4, 32, 24, 47, 41, 24, 26, 30, 41];
const scale = 25 / 26;
const B = 20_000;

describe('Efron & Tibshirani (1993) Table 14.2: BCa for the variance of the spatial test data', () => {
  const r = runRequest({ data: { A: testA }, statistic: { name: 'variance', column: 'A' }, B, seed: 'spatial', intervals: { level: 0.9, methods: ['bca', 'percentile'] } });

  it('θ̂ = 171.5 and â = 0.061', () => {
    expect(r.estimate * scale).toBeCloseTo(171.5, 1);
    expect(Number(r.jackknife!.acceleration!.toFixed(3))).toBe(0.061);
  });

  const within = (ours: number, mc: number, published: number) => {
    const mcBook = mc * Math.sqrt(B / 2000);
    expect(Math.abs(ours - published)).toBeLessThanOrEqual(3 * Math.hypot(mc, mcBook));
  };

  it('BCa 90% interval ≈ (115.8, 259.6)', () => {
    const bca = r.intervals.bca!;
    within(bca.lower! * scale, bca.lowerMonteCarloError! * scale, 115.8);
    within(bca.upper! * scale, bca.upperMonteCarloError! * scale, 259.6);
  });

  it('percentile 90% interval ≈ (100.8, 233.9), and BCa sits to its right (positive ẑ₀ and â)', () => {
    const p = r.intervals.percentile!;
    within(p.lower! * scale, p.lowerMonteCarloError! * scale, 100.8);
    within(p.upper! * scale, p.upperMonteCarloError! * scale, 233.9);
    expect(r.intervals.bca!.lower!).toBeGreaterThan(p.lower!);
    expect(r.intervals.bca!.upper!).toBeGreaterThan(p.upper!);
  });

  it('ẑ₀ ≈ 0.146 within the Monte Carlo error of a proportion at B = 2000', () => {
    // sd(ẑ₀) ≈ √(p(1 − p)/B) / φ(z₀) for the book's B = 2000.
    const z = r.z0!;
    const p = 0.558;
    const sd = Math.sqrt((p * (1 - p)) / 2000) / (Math.exp(-(z * z) / 2) / Math.sqrt(2 * Math.PI));
    expect(Math.abs(z - 0.146)).toBeLessThanOrEqual(3 * sd);
  });
});
