import { describe, expect, it } from 'vitest';
import { jStat } from '@/tests/reference/support/jstat';
import { prepare } from '../engine/run-request';
import { distinctResamples } from './distinct-resamples';
import { enumeratedMoments, enumerateResamples } from './enumerate';
import { exactAnswer } from './exact';
import { exactOrderStatistic, orderStatisticWeights } from './order-statistic';

const nitrate = [4.1, 2.7, 6.3, 3.3, 5.0, 2.2, 7.9, 3.8, 4.6];

function problemFor(statistic: Record<string, unknown>, x: number[] = nitrate) {
  return prepare({ data: { x, g: x.map((_, i) => (i % 2 ? 'up' : 'down')) }, statistic, B: 100 });
}

describe('distinct resamples C(2n − 1, n)', () => {
  it('matches the binomial coefficient and the enumeration count', () => {
    // Source: Efron & Tibshirani (1993), Problem 6.6 — C(2n−1, n) distinct bootstrap samples;
    // jStat.combination for the binomial coefficient.
    for (let n = 1; n <= 12; n++) expect(distinctResamples(n)).toBe(Math.round(jStat.combination(2 * n - 1, n)));
    expect(distinctResamples(3)).toBe(10);
    for (const n of [2, 3, 5, 7]) {
      const p = problemFor({ name: 'mean', column: 'x' }, nitrate.slice(0, n));
      const e = enumerateResamples(p.statistic, p.strata)!;
      expect(e.values.length).toBe(distinctResamples(n));
      expect(e.weights.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    }
  });

  it('gives P(a given point is absent) = (1 − 1/n)ⁿ, tending to e⁻¹ ≈ 0.368', () => {
    // Source: Efron, B. (1983), JASA 78: 316–331 (the .632 estimator): P(x₁ ∉ x*) = (1 − 1/n)ⁿ → e⁻¹.
    for (const n of [3, 6, 9]) {
      const p = problemFor({ name: 'mean', column: 'x' }, nitrate.slice(0, n));
      // Evaluate "is unit 0 absent" on every resample through a probe statistic.
      const probe = { ...p.statistic, fromCounts: (c: Int32Array) => (c[0] === 0 ? 1 : 0) };
      const e = enumerateResamples(probe, p.strata)!;
      const absent = e.values.reduce((acc, v, i) => acc + v * e.weights[i], 0);
      expect(absent).toBeCloseTo((1 - 1 / n) ** n, 12);
    }
    expect((1 - 1 / 1e6) ** 1e6).toBeCloseTo(Math.exp(-1), 6);
    expect(Math.exp(-1)).toBeCloseTo(0.368, 3);
  });
});

describe('the mean: closed form = enumeration', () => {
  it('plug-in SE √Σ(x − x̄)² / n, bias 0', () => {
    // Source: Efron & Tibshirani (1993) eq. 6.9 / §5.2: the ideal bootstrap SE of the mean is the
    // plug-in SE σ̂/√n with σ̂² = Σ(x − x̄)²/n.
    const p = problemFor({ name: 'mean', column: 'x' });
    const exact = exactAnswer(p.statistic, p.scheme, 'mean')!;
    const n = nitrate.length;
    const m = nitrate.reduce((a, b) => a + b, 0) / n;
    const plugIn = Math.sqrt(nitrate.reduce((a, v) => a + (v - m) ** 2, 0)) / n;
    expect(exact.method).toBe('closed-form');
    expect(exact.se).toBeCloseTo(plugIn, 14);
    const e = enumeratedMoments(enumerateResamples(p.statistic, p.strata)!, p.statistic.estimate);
    expect(e.se).toBeCloseTo(plugIn, 12);
    expect(e.bias).toBeCloseTo(0, 12);
  });

  it('mean difference: √(σ̂²_a/n_a + σ̂²_b/n_b) = stratified enumeration', () => {
    const p = problemFor({ name: 'mean-difference', column: 'x', group: 'g', levels: ['down', 'up'] }, nitrate.slice(0, 8));
    const closed = exactAnswer(p.statistic, p.scheme, 'mean-difference')!;
    const e = enumeratedMoments(enumerateResamples(p.statistic, p.strata)!, p.statistic.estimate);
    expect(closed.method).toBe('closed-form');
    expect(e.se).toBeCloseTo(closed.se, 12);
  });
});

describe('Maritz–Jarrett: exact bootstrap distribution of the median (odd n)', () => {
  it('weights are the Beta-integral formula and sum to 1', () => {
    // Source: Maritz & Jarrett (1978), JASA 73: 194–196: for n = 2m + 1,
    // w_j = n!/(m!)² ∫_{(j−1)/n}^{j/n} t^m (1 − t)^m dt = I_{j/n}(m+1, m+1) − I_{(j−1)/n}(m+1, m+1),
    // the incomplete beta from jStat.ibeta (an outside implementation).
    const n = 9;
    const m = 4;
    const w = orderStatisticWeights(n, m + 1);
    for (let j = 1; j <= n; j++) {
      const ref = jStat.ibeta(j / n, m + 1, m + 1) - jStat.ibeta((j - 1) / n, m + 1, m + 1);
      expect(w[j - 1]).toBeCloseTo(ref, 9);
    }
    expect(w.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 14);
    // symmetric in j ↔ n + 1 − j
    expect(w[0]).toBeCloseTo(w[n - 1], 14);
  });

  it('equals full enumeration of all C(2n−1, n) resamples for n = 3, 5, 7, 9', () => {
    for (const n of [3, 5, 7, 9]) {
      const x = nitrate.slice(0, n);
      const p = problemFor({ name: 'median', column: 'x' }, x);
      const mj = exactAnswer(p.statistic, p.scheme, 'median')!;
      expect(mj.method).toBe('maritz-jarrett');
      const e = enumeratedMoments(enumerateResamples(p.statistic, p.strata)!, p.statistic.estimate);
      expect(mj.se).toBeCloseTo(e.se, 11);
      expect(mj.bias).toBeCloseTo(e.bias, 11);
    }
  });

  it('handles ties and other order statistics (quantile on a data point, the maximum)', () => {
    const x = [3, 3, 3, 5, 8, 8, 9];
    const p = problemFor({ name: 'quantile', column: 'x', p: 1 / 3 }, x);
    const os = exactAnswer(p.statistic, p.scheme, 'quantile')!;
    expect(os.method).toBe('order-statistic');
    const e = enumeratedMoments(enumerateResamples(p.statistic, p.strata)!, p.statistic.estimate);
    expect(os.se).toBeCloseTo(e.se, 11);
    const max = exactOrderStatistic(Float64Array.from(x).sort(), 7);
    // P(max* = x₍₇₎) = 1 − (6/7)⁷ (the point is present at least once)
    expect(orderStatisticWeights(7, 7)[6]).toBeCloseTo(1 - (6 / 7) ** 7, 12);
    expect(max.mean).toBeLessThan(9);
  });

  it('even n with C(2n−1, n) > 200,000 has no exact answer for the median', () => {
    const x = Array.from({ length: 12 }, (_, i) => i * 1.5 + (i % 3));
    const p = problemFor({ name: 'median', column: 'x' }, x);
    expect(exactAnswer(p.statistic, p.scheme, 'median')).toBeNull();
  });
});
