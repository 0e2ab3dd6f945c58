import * as ss from 'simple-statistics';
import { jStat as js } from '@/tests/reference/support/jstat';
import { describe, expect, it } from 'vitest';
import { finiteSorted } from './finite-sorted';
import { incompleteBeta } from './incomplete-beta';
import { logGamma } from './log-gamma';
import { moments } from './moments';
import { normalCdf } from './normal-cdf';
import { normalQuantile } from './normal-quantile';
import { quantileSorted } from './quantile-sorted';


describe('normal quantile (AS 241)', () => {
  it('agrees with jStat.normal.inv across (0, 1)', () => {
    // Source: jStat 1.9.6, jStat.normal.inv (an independent implementation).
    // jStat itself is accurate to about 1e-9 relative in the far tails, hence the looser check there.
    for (const p of [0.001, 0.01, 0.025, 0.05, 0.1, 0.3, 0.5, 0.7, 0.9, 0.95, 0.975, 0.99]) {
      expect(normalQuantile(p)).toBeCloseTo(js.normal.inv(p, 0, 1), 12);
    }
    for (const p of [1e-10, 1e-6, 0.999999]) {
      const ref = js.normal.inv(p, 0, 1);
      expect(Math.abs(normalQuantile(p) - ref) / Math.abs(ref)).toBeLessThan(1e-8);
    }
  });
  it('gives the textbook 1.959964 for 0.975 and is antisymmetric', () => {
    // Published table value z_{0.975} = 1.959964 (any normal table).
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 6);
    expect(normalQuantile(0.2)).toBeCloseTo(-normalQuantile(0.8), 14);
    expect(normalQuantile(0)).toBe(Number.NEGATIVE_INFINITY);
    expect(Number.isNaN(normalQuantile(1.5))).toBe(true);
  });
});

describe('normal cdf (Marsaglia 2004)', () => {
  it('agrees with jStat.normal.cdf', () => {
    // Source: jStat 1.9.6 jStat.normal.cdf (erfc based).
    for (const x of [-8, -5, -3, -1.96, -1, -0.3, 0, 0.4, 1, 1.645, 2.5, 4, 7]) expect(normalCdf(x)).toBeCloseTo(js.normal.cdf(x, 0, 1), 13);
  });
  it('inverts the quantile', () => {
    for (const p of [0.001, 0.025, 0.3, 0.5, 0.9, 0.999]) expect(normalCdf(normalQuantile(p))).toBeCloseTo(p, 14);
  });
});

describe('log-gamma and incomplete beta', () => {
  it('log-gamma matches jStat.gammaln and factorials', () => {
    // Source: jStat.gammaln; and Γ(n) = (n − 1)! exactly.
    for (const x of [0.1, 0.5, 1, 1.5, 3.3, 10, 57.2, 300]) expect(logGamma(x)).toBeCloseTo(js.gammaln(x), 9);
    expect(logGamma(6)).toBeCloseTo(Math.log(120), 12);
  });
  it('incomplete beta matches jStat.ibeta and the binomial tail', () => {
    // Source: jStat.ibeta; and P(Bin(n, p) ≥ k) = I_p(k, n − k + 1) summed directly.
    for (const [x, a, b] of [[0.3, 2, 5], [0.5, 10, 10], [0.01, 1, 30], [0.9, 50, 3], [0.42, 100, 101]] as const) {
      // jStat's continued fraction stops at about 1e-10.
      expect(incompleteBeta(x, a, b)).toBeCloseTo(js.ibeta(x, a, b), 9);
    }
    // Symmetry: I_{1/2}(a, a) = 1/2 exactly.
    expect(incompleteBeta(0.5, 10, 10)).toBeCloseTo(0.5, 13);
    const n = 15;
    const p = 0.37;
    const k = 6;
    let tail = 0;
    for (let j = k; j <= n; j++) tail += Math.exp(logGamma(n + 1) - logGamma(j + 1) - logGamma(n - j + 1)) * p ** j * (1 - p) ** (n - j);
    expect(incompleteBeta(p, k, n - k + 1)).toBeCloseTo(tail, 12);
  });
});

describe('moments and type-7 quantile', () => {
  it('moments match simple-statistics', () => {
    // Source: simple-statistics sampleVariance, sampleSkewness/Kurtosis use other divisors, so only
    // mean and variance are compared exactly; skewness is checked on a symmetric set.
    const x = [2.1, 3.5, 0.7, 9.9, 4.4, 4.4, 1.2, 6.8];
    const m = moments(x);
    expect(m.mean).toBeCloseTo(ss.mean(x), 13);
    expect(m.variance).toBeCloseTo(ss.sampleVariance(x), 12);
    expect(moments([1, 2, 3, 4, 5]).skewness).toBe(0);
    expect(moments([5, 5, 5]).variance).toBe(0);
  });
  it('type-7 quantile matches jStat.percentile (inclusive = type 7)', () => {
    // Source: jStat.percentile(a, k) interpolates at (n − 1)k, Hyndman–Fan type 7 — except in the top
    // interval, where jStat 1.9.6 returns the lower order statistic without interpolating, so p is
    // kept below (n − 2)/(n − 1) there; the top interval is checked by hand (R: quantile(x, 0.99) = 19.5275).
    const x = [0.5, 1.5, 2, 7, 7, 11, 13.25, 20];
    for (const p of [0, 0.1, 0.25, 0.5, 0.6, 0.75, 0.8, 1]) expect(quantileSorted(x, p)).toBeCloseTo(js.percentile(x, p), 12);
    expect(quantileSorted(x, 0.99)).toBeCloseTo(13.25 + 0.93 * 6.75, 12);
  });
});

describe('finiteSorted', () => {
  it('keeps the finite values, ascending, in a new array — as filter(Number.isFinite) then sort', () => {
    const x = new Float64Array([3, Number.NaN, -1, Number.POSITIVE_INFINITY, 2, -0, 0, Number.NEGATIVE_INFINITY, 2]);
    const out = finiteSorted(x);
    expect(Array.from(out)).toEqual(Array.from(x.filter((v) => Number.isFinite(v)).sort()));
    expect(Array.from(out)).toEqual([-1, -0, 0, 2, 2, 3]);
    expect(Object.is(out[1], -0)).toBe(true);
    // all finite: a sorted copy; the input is left as it was
    const y = new Float64Array([5, 1, 4]);
    const sortedY = finiteSorted(y);
    expect(Array.from(sortedY)).toEqual([1, 4, 5]);
    expect(Array.from(y)).toEqual([5, 1, 4]);
    expect(finiteSorted(y.subarray(1))).toEqual(new Float64Array([1, 4]));
    expect(finiteSorted(new Float64Array([Number.NaN])).length).toBe(0);
  });
});
