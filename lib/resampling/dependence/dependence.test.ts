import { describe, expect, it } from 'vitest';
import { ar1Series as ar1 } from '@/tests/support/ar1';
import { runRNumbers } from '@/tests/reference/structured-r';
import { autocovariance, lag1Autocorrelation, repeatedIds, serialDependence } from './index';

// Series that R's datasets package ships; the numbers come from R itself at test time.
const SERIES = ['lynx', 'Nile', 'LakeHuron', 'nhtemp'] as const;
const fromR = runRNumbers(
  SERIES.map(
    (s) =>
      `emit("${s}", ${s}); emit("${s}_acov", acf(${s}, lag.max = 10, type = "covariance", plot = FALSE)$acf); ` +
      `emit("${s}_r1", acf(${s}, lag.max = 1, plot = FALSE)$acf[2]);`,
  ).join('\n'),
);


describe('autocovariance', () => {
  it.each(SERIES)('matches R acf(%s, type = "covariance") up to lag 10', (s) => {
    // Source: R 4.x stats::acf, divisor n, centred on the mean.
    const ours = autocovariance(fromR[s], 10);
    const theirs = fromR[`${s}_acov`];
    expect(theirs).toHaveLength(11);
    // Relative to R(0): the two sides add the same products in different orders.
    for (let k = 0; k <= 10; k++) expect(Math.abs(ours[k] - theirs[k]) / theirs[0]).toBeLessThan(1e-12);
  });

  it('gives the hand-worked value on 1..4 and does not change its input', () => {
    // By hand: centred −1.5, −0.5, 0.5, 1.5 → R(0) = 5/4, R(1) = 1.25/4.
    const x = Object.freeze([1, 2, 3, 4]);
    expect(Array.from(autocovariance(x, 2))).toEqual([1.25, 0.3125, -0.375]);
    expect(x).toEqual([1, 2, 3, 4]);
  });

  it('rejects empty input, non-finite values and bad lags', () => {
    expect(() => autocovariance([], 1)).toThrow(/at least one/);
    expect(() => autocovariance([1, NaN, 2], 1)).toThrow(/value 2/);
    expect(() => autocovariance([1, 2], -1)).toThrow(/maxLag/);
  });
});

describe('lag1Autocorrelation', () => {
  it.each(SERIES)('matches R acf(%s)$acf[2]', (s) => {
    expect(lag1Autocorrelation(fromR[s])).toBeCloseTo(fromR[`${s}_r1`][0], 12);
  });

  it('is exactly the ratio of the lag-1 and lag-0 autocovariances, bit for bit', () => {
    for (const s of [...SERIES.map((k) => fromR[k]), ar1(1001, 0.6, 'lag1-exact'), [1, 2], [-0.5, 1e6, 3, 3, 7]]) {
      const [c0, c1] = autocovariance(s, 1);
      expect(lag1Autocorrelation(s)).toBe(c1 / c0);
    }
    expect(() => lag1Autocorrelation([1, Number.NaN, 2])).toThrow(RangeError);
  });

  it('is undefined for constant or one-value data', () => {
    expect(lag1Autocorrelation([3, 3, 3, 3])).toBeNull();
    expect(lag1Autocorrelation([3])).toBeNull();
  });
});

describe('serialDependence (|r1| > 2/sqrt(n), common practice)', () => {
  it('flags the lynx series (r1 ≈ 0.71) and an AR(1) with φ = 0.6', () => {
    expect(serialDependence(fromR.lynx).clearlyNonZero).toBe(true);
    const s = serialDependence(ar1(200, 0.6, 'ar1-dep'));
    expect(s.r1!).toBeGreaterThan(0.4);
    expect(s.clearlyNonZero).toBe(true);
  });

  it('flags about 5% of independent normal series (the band is an approximate 95% band)', () => {
    // Under independence r1 ≈ N(−1/n, 1/n) (Bartlett 1946), so P(|r1| > 2/√n) ≈ 0.046.
    let flagged = 0;
    const trials = 400;
    for (let i = 0; i < trials; i++) if (serialDependence(ar1(100, 0, `wn-${i}`)).clearlyNonZero) flagged++;
    expect(flagged / trials).toBeGreaterThan(0.015);
    expect(flagged / trials).toBeLessThan(0.09);
  });

  it('says nothing for fewer than 10 values', () => {
    expect(serialDependence([1, 2, 3, 4, 5, 6, 7, 8, 9]).clearlyNonZero).toBe(false);
  });
});

describe('repeatedIds', () => {
  it('counts repeated subjects and calls a subject column cluster-like', () => {
    const ids = ['s1', 's1', 's2', 's3', 's3', 's3', 's4', 's5', 's6'];
    expect(repeatedIds(ids)).toEqual({ n: 9, distinct: 6, repeated: 2, maxCount: 3, meanCount: 1.5, clusterLike: true });
  });

  it('does not call a two-level treatment label cluster-like, nor unique ids', () => {
    expect(repeatedIds(['up', 'down', 'up', 'down', 'up', 'down']).clusterLike).toBe(false);
    expect(repeatedIds([1, 2, 3, 4, 5, 6, 7]).clusterLike).toBe(false);
  });

  it('skips missing values and compares numbers by their text', () => {
    const r = repeatedIds([1, '1', null, '', undefined, 2]);
    expect(r.n).toBe(3);
    expect(r.distinct).toBe(2);
    expect(r.repeated).toBe(1);
  });
});
