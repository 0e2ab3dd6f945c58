import seedrandom from 'seedrandom';
import { describe, expect, it } from 'vitest';
import { runRNumbers } from '@/tests/reference/structured-r';
import {
  addClusterCounts,
  addMovingBlockCounts,
  addStationaryCounts,
  bootstrapMeanTest,
  fillResidualResponse,
  leastSquaresLine,
  residualPool,
} from './index';

const R = runRNumbers(`
emit("lynx", lynx); emit("nile", Nile)
fit <- lm(dist ~ speed, data = cars)
emit("speed", cars$speed); emit("dist", cars$dist)
emit("coef", coef(fit)); emit("fitted", fitted(fit)); emit("resid", residuals(fit)); emit("hat", hatvalues(fit))
emit("rstd", residuals(fit) / sqrt(1 - hatvalues(fit)))
`);

const identity = (m: number) => Int32Array.from({ length: m }, (_, i) => i);
/** SD of the resampled mean over B resamples drawn by `draw` (counts → weighted mean). */
function resampledMeanVar(x: ArrayLike<number>, B: number, draw: (counts: Int32Array) => number) {
  const counts = new Int32Array(x.length);
  let s1 = 0;
  let s2 = 0;
  for (let b = 0; b < B; b++) {
    counts.fill(0);
    const total = draw(counts);
    let s = 0;
    for (let i = 0; i < x.length; i++) s += counts[i] * x[i];
    const m = s / total;
    s1 += m;
    s2 += m * m;
  }
  const mean = s1 / B;
  return { mean, variance: (s2 - B * mean * mean) / (B - 1) };
}
const plainMean = (x: ArrayLike<number>) => Array.from(x).reduce((s, v) => s + v, 0) / x.length;

describe('circular moving-block resamples', () => {
  it('give exactly m units made of circular blocks of length ℓ', () => {
    const counts = new Int32Array(10);
    const starts: number[] = [];
    const rnd = seedrandom('blocks');
    const spy = () => {
      const u = rnd();
      starts.push(Math.floor(u * 10));
      return u;
    };
    addMovingBlockCounts(identity(10), 4, spy, counts);
    expect(counts.reduce((s, c) => s + c, 0)).toBe(10);
    // ⌈10/4⌉ = 3 blocks: 4 + 4 + 2 units from the recorded starts, wrapping at 10
    const want = new Int32Array(10);
    starts.forEach((s, b) => {
      for (let j = 0; j < (b < 2 ? 4 : 2); j++) want[(s + j) % 10]++;
    });
    expect(starts).toHaveLength(3);
    expect(counts).toEqual(want);
  });

  it('have the closed-form bootstrap variance of the mean (Politis & Romano 1992) on lynx', () => {
    // For n = kℓ, Var*(x̄*) = (1/k) · (1/n) Σ_i (B̄_i − x̄)², B̄_i the mean of the circular block
    // starting at i (the k blocks are independent uniform picks of the n circular blocks),
    // and E*(x̄*) = x̄ exactly. lynx has n = 114 = 6 · 19.
    const x = R.lynx;
    const n = x.length;
    const l = 19;
    const k = n / l;
    const xbar = plainMean(x);
    let ss = 0;
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let j = 0; j < l; j++) s += x[(i + j) % n];
      ss += (s / l - xbar) ** 2;
    }
    const want = ss / n / k;
    const B = 40_000;
    const rnd = seedrandom('cbb');
    const got = resampledMeanVar(x, B, (c) => {
      addMovingBlockCounts(identity(n), l, rnd, c);
      return n;
    });
    // Monte Carlo: relative SE of a variance from B draws ≈ √(2/B) (≈ 0.7%) for a
    // near-normal mean; allow 4%. Mean within 4 Monte Carlo SEs.
    expect(Math.abs(got.variance / want - 1)).toBeLessThan(0.04);
    expect(Math.abs(got.mean - xbar)).toBeLessThan(4 * Math.sqrt(want / B));
  });
});

describe('stationary-bootstrap resamples', () => {
  it('give exactly m units; mean block length ℓ̄ = 1 is the ordinary bootstrap', () => {
    const c = new Int32Array(50);
    addStationaryCounts(identity(50), 7.5, seedrandom('sb'), c);
    expect(c.reduce((s, v) => s + v, 0)).toBe(50);
  });

  it('have mean block length ℓ̄ (lengths 1 + Geometric(1/ℓ̄))', () => {
    // Count block starts: with ℓ̄ = 5 and m large, about m/5 blocks per resample.
    let draws = 0;
    const rnd = seedrandom('geom');
    const counting = () => {
      draws++;
      return rnd();
    };
    const m = 100_000;
    addStationaryCounts(identity(m), 5, counting, new Int32Array(m));
    const blocks = draws / 2; // two uniforms per block: start and length
    expect(Math.abs(m / blocks / 5 - 1)).toBeLessThan(0.02);
  });

  it('have the closed-form bootstrap variance of the mean on the Nile series (Politis & Romano 1994)', () => {
    // Given the data, the resampled series is a stationary chain: each step moves to the next
    // position (circularly) with probability 1 − p, p = 1/ℓ̄, or jumps to a uniform one. So
    // Cov*(X*_t, X*_{t+k}) = (1 − p)^k Ĉ(k), with Ĉ(k) = (1/n) Σ_j (x_j − x̄)(x_{(j+k) mod n} − x̄)
    // the circular autocovariance, and
    //   n Var*(x̄*) = Ĉ(0) + 2 Σ_{k=1}^{n−1} (1 − k/n)(1 − p)^k Ĉ(k)
    // — Politis & Romano (1994), Lemma 1, which writes the sum as Σ b_n(i) Ĉ(i) with
    // b_n(i) = (1 − i/n)(1 − p)^i + (i/n)(1 − p)^{n−i} (that form from memory; equal because
    // Ĉ(i) = Ĉ(n − i)).
    const x = R.nile;
    const n = x.length;
    const xbar = plainMean(x);
    const p = 1 / 8;
    const C = (i: number) => {
      let s = 0;
      for (let j = 0; j < n; j++) s += (x[j] - xbar) * (x[(j + i) % n] - xbar);
      return s / n;
    };
    let v = C(0);
    for (let i = 1; i < n; i++) v += 2 * (1 - i / n) * (1 - p) ** i * C(i);
    // the b_n form gives the same number
    let vb = C(0);
    for (let i = 1; i < n; i++) vb += ((1 - i / n) * (1 - p) ** i + (i / n) * (1 - p) ** (n - i)) * C(i);
    expect(vb).toBeCloseTo(v, 6);
    const want = v / n;
    const rnd = seedrandom('sb-var');
    const got = resampledMeanVar(x, 40_000, (c) => {
      addStationaryCounts(identity(n), 8, rnd, c);
      return n;
    });
    expect(Math.abs(got.variance / want - 1)).toBeLessThan(0.04);
  });
});

describe('cluster resamples', () => {
  const clusters = [
    [0, 1, 2],
    [3, 4, 5],
    [6, 7, 8],
    [9, 10, 11],
    [12, 13, 14],
  ].map((c) => Int32Array.from(c));
  const x = [1, 2, 3, 10, 11, 12, 4, 4, 5, 8, 9, 7, 0, 1, 2];

  it('keep every row of a drawn cluster (first stage only)', () => {
    const c = new Int32Array(15);
    const total = addClusterCounts(clusters, seedrandom('cl'), c);
    expect(total).toBe(15);
    for (const rows of clusters) expect(new Set(Array.from(rows, (r) => c[r])).size).toBe(1);
  });

  it('have Var*(x̄*) = (1/G)·(1/G)Σ(c̄_g − c̄)² for equal cluster sizes (plug-in variance of cluster means / G)', () => {
    // Davison & Hinkley (1997) §3.8: with equal sizes the cluster means are the units.
    const means = clusters.map((rows) => plainMean(Array.from(rows, (r) => x[r])));
    const cbar = plainMean(means);
    const want = means.reduce((s, m) => s + (m - cbar) ** 2, 0) / 5 / 5;
    const rnd = seedrandom('cl-var');
    const got = resampledMeanVar(x, 40_000, (c) => addClusterCounts(clusters, rnd, c));
    expect(Math.abs(got.variance / want - 1)).toBeLessThan(0.04);
  });

  it('with a second stage add the within-cluster variance: Var* = σ²_between/G + σ²_within/(G·m)', () => {
    // Derived by the law of total variance for G clusters of m rows: the first stage gives
    // Var(E[x̄*|clusters]) = between/G; the second adds E[Var(x̄*|clusters)] = within/(G·m),
    // with between and within the plug-in (divisor G, m) variances (cf. Davison & Hinkley
    // 1997, §3.8, where this double counting of within-cluster variation is discussed).
    const means = clusters.map((rows) => plainMean(Array.from(rows, (r) => x[r])));
    const cbar = plainMean(means);
    const between = means.reduce((s, m) => s + (m - cbar) ** 2, 0) / 5;
    const within = plainMean(clusters.map((rows, g) => Array.from(rows, (r) => (x[r] - means[g]) ** 2).reduce((a, b) => a + b) / 3));
    const want = between / 5 + within / (5 * 3);
    const rnd = seedrandom('cl2');
    const got = resampledMeanVar(x, 40_000, (c) => addClusterCounts(clusters, rnd, c, true));
    expect(Math.abs(got.variance / want - 1)).toBeLessThan(0.04);
  });
});

describe('least-squares line and residual resampling (R lm on cars)', () => {
  const line = leastSquaresLine(R.speed, R.dist);
  it('matches coef, fitted, residuals and hatvalues from R', () => {
    expect(line.intercept).toBeCloseTo(R.coef[0], 10);
    expect(line.slope).toBeCloseTo(R.coef[1], 12);
    line.fitted.forEach((f, i) => expect(f).toBeCloseTo(R.fitted[i], 10));
    line.residuals.forEach((e, i) => expect(e).toBeCloseTo(R.resid[i], 10));
    line.leverages.forEach((h, i) => expect(h).toBeCloseTo(R.hat[i], 12));
  });

  it('modified residuals are e/√(1−h), centred', () => {
    const pool = residualPool(line.residuals, line.leverages);
    const rbar = plainMean(R.rstd);
    pool.forEach((r, i) => expect(r).toBeCloseTo(R.rstd[i] - rbar, 10));
    expect(Math.abs(plainMean(pool))).toBeLessThan(1e-12);
  });

  it('gives Var*(b*) = σ*²/Sxx (closed form: b* − b = Σ(x − x̄)ε*/Sxx, ε* iid from the pool)', () => {
    const n = R.speed.length;
    const mx = plainMean(R.speed);
    const sxx = R.speed.reduce((s, v) => s + (v - mx) ** 2, 0);
    for (const pool of [residualPool(line.residuals, null), residualPool(line.residuals, line.leverages)]) {
      const s2 = pool.reduce((s, v) => s + v * v, 0) / n;
      const want = s2 / sxx;
      const rnd = seedrandom('resid');
      const y = new Float64Array(n);
      const B = 20_000;
      let a = 0;
      let b2 = 0;
      for (let b = 0; b < B; b++) {
        fillResidualResponse(line.fitted, pool, rnd, y);
        const slope = leastSquaresLine(R.speed, y).slope;
        a += slope;
        b2 += slope * slope;
      }
      const m = a / B;
      const v = (b2 - B * m * m) / (B - 1);
      expect(Math.abs(v / want - 1)).toBeLessThan(0.05);
      expect(Math.abs(m - line.slope)).toBeLessThan(4 * Math.sqrt(want / B));
    }
  });

  it('refuses a line through equal x values', () => {
    expect(() => leastSquaresLine([2, 2, 2], [1, 2, 3])).toThrow(/all x values are equal/);
  });
});

describe('bootstrap test of a mean (Efron & Tibshirani 1993, Algorithm 16.2)', () => {
  const Rt = runRNumbers(`
library(boot)
set.seed(20240611)
x <- as.numeric(nhtemp); mu0 <- 51; n <- length(x)
tobs <- (mean(x) - mu0) / (sd(x) / sqrt(n))
z <- x - mean(x) + mu0
b <- boot(z, function(d, i) { y <- d[i]; (mean(y) - mu0) / (sd(y) / sqrt(n)) }, R = 20000)
emit("x", x)
emit("p", c((sum(abs(b$t) >= abs(tobs)) + 1) / 20001, (sum(b$t >= tobs) + 1) / 20001, tobs))
emit("t", t.test(x, mu = mu0)$p.value)
`);
  it('agrees with R boot on the shifted nhtemp data within Monte Carlo error (two-sided and greater)', () => {
    const [pTwo, pGreater, tobs] = Rt.p;
    const two = bootstrapMeanTest(Rt.x, 51, 20_000, seedrandom('mt'));
    const greater = bootstrapMeanTest(Rt.x, 51, 20_000, seedrandom('mt2'), 'greater');
    expect(two.observed).toBeCloseTo(tobs, 12);
    // two independent Monte Carlo estimates: difference within 4·√2 Monte Carlo errors
    expect(Math.abs(two.pValue - pTwo)).toBeLessThan(4 * Math.SQRT2 * two.monteCarloError + 1e-4);
    expect(Math.abs(greater.pValue - pGreater)).toBeLessThan(4 * Math.SQRT2 * greater.monteCarloError + 1e-4);
    // and lands near the t-test (the data are close to normal; loose: within 0.02)
    expect(Math.abs(two.pValue - Rt.t[0])).toBeLessThan(0.02);
  });

  it('is near uniform under the null: the mean itself as μ₀ gives p ≈ 1', () => {
    const x = Rt.x;
    const r = bootstrapMeanTest(x, plainMean(x), 2000, seedrandom('null'));
    expect(r.pValue).toBeGreaterThan(0.95);
  });

  it('refuses constant data and too few values', () => {
    expect(() => bootstrapMeanTest([2, 2, 2, 2], 1, 100, seedrandom('c'))).toThrow(/all values are equal/);
    expect(() => bootstrapMeanTest([1, 2], 1, 100, seedrandom('c'))).toThrow(/at least 3/);
  });
});
