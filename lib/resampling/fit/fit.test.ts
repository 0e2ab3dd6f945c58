import seedrandom from 'seedrandom';
import { errorFunction, poissonDistribution } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { runRNumbers } from '@/tests/reference/structured-r';
import {
  fillExponential,
  fillLognormal,
  fillNormal,
  fillPoisson,
  fitExponential,
  FitError,
  fitFamily,
  fitLognormal,
  fitNormal,
  fitPoisson,
  logFactorial,
  poissonInversion,
  poissonPtrs,
  simulate,
} from './index';

// Source for the fits: R's MASS::fitdistr (maximum likelihood) on data from R's datasets
// package, run live: estimate(s) then the maximised log-likelihood.
const R = runRNumbers(`
suppressMessages(library(MASS))
oz <- na.omit(airquality$Ozone)
emit("nhtemp", nhtemp); f <- fitdistr(as.numeric(nhtemp), "normal"); emit("nhtemp_fit", c(f$estimate, f$loglik))
emit("ozone", oz); f <- fitdistr(oz, "exponential"); emit("ozone_exp", c(f$estimate, f$loglik))
f <- fitdistr(oz, "lognormal"); emit("ozone_lnorm", c(f$estimate, f$loglik))
emit("rivers", rivers); f <- fitdistr(rivers, "lognormal"); emit("rivers_lnorm", c(f$estimate, f$loglik))
emit("breaks", warpbreaks$breaks); f <- fitdistr(warpbreaks$breaks, "poisson"); emit("breaks_pois", c(f$estimate, f$loglik))
emit("insects", InsectSprays$count); f <- fitdistr(InsectSprays$count, "poisson"); emit("insects_pois", c(f$estimate, f$loglik))
emit("lgamma_at", c(0:40, 55, 100, 1000, 123456)); emit("lgamma", lgamma(c(0:40, 55, 100, 1000, 123456) + 1))
`);

describe('maximum-likelihood fits against R MASS::fitdistr', () => {
  it('normal on nhtemp: mean, sd with divisor n, log-likelihood', () => {
    const m = fitNormal(R.nhtemp);
    const [mean, sd, ll] = R.nhtemp_fit;
    expect(m.parameters.mean).toBeCloseTo(mean, 10);
    expect(m.parameters.sd).toBeCloseTo(sd, 10);
    expect(m.logLikelihood).toBeCloseTo(ll, 8);
  });

  it('exponential on airquality$Ozone: rate = 1/mean', () => {
    const m = fitExponential(R.ozone);
    expect(m.parameters.rate).toBeCloseTo(R.ozone_exp[0], 12);
    expect(m.logLikelihood).toBeCloseTo(R.ozone_exp[1], 8);
  });

  it.each([
    ['ozone', 'ozone_lnorm'],
    ['rivers', 'rivers_lnorm'],
  ])('lognormal on %s: meanlog, sdlog (divisor n)', (data, fit) => {
    const m = fitLognormal(R[data]);
    expect(m.parameters.meanlog).toBeCloseTo(R[fit][0], 10);
    expect(m.parameters.sdlog).toBeCloseTo(R[fit][1], 10);
    expect(m.logLikelihood).toBeCloseTo(R[fit][2], 7);
  });

  it.each([
    ['breaks', 'breaks_pois'],
    ['insects', 'insects_pois'],
  ])('poisson on %s: lambda = mean', (data, fit) => {
    const m = fitPoisson(R[data]);
    expect(m.parameters.lambda).toBeCloseTo(R[fit][0], 12);
    expect(m.logLikelihood).toBeCloseTo(R[fit][1], 7);
  });

  it('fitFamily dispatches by name and does not change its input', () => {
    const x = Object.freeze([2, 4, 4, 4, 5, 5, 7, 9]);
    expect(fitFamily('normal', x).parameters).toEqual({ mean: 5, sd: 2 }); // the textbook σ = 2 example
    expect(fitFamily('poisson', x).parameters).toEqual({ lambda: 5 });
    expect(x).toEqual([2, 4, 4, 4, 5, 5, 7, 9]);
  });
});

describe('data a family cannot fit', () => {
  it('exponential: negative values, all zeros', () => {
    expect(() => fitExponential([1, -2, 3])).toThrow(/value 2 is negative/);
    expect(() => fitExponential([0, 0])).toThrow(FitError);
    expect(fitExponential([0, 2]).parameters.rate).toBe(1); // zeros alone are fine
  });
  it('lognormal: zero or negative values, constant data', () => {
    expect(() => fitLognormal([1, 0, 3])).toThrow(/value 2 is 0/);
    expect(() => fitLognormal([1, 2, -3])).toThrow(/needs values > 0/);
    expect(() => fitLognormal([5, 5, 5])).toThrow(/all values are equal/);
  });
  it('poisson: non-integers, negatives, all zeros', () => {
    expect(() => fitPoisson([1, 2.5])).toThrow(/value 2 is not a whole number/);
    expect(() => fitPoisson([1, -1])).toThrow(/negative/);
    expect(() => fitPoisson([0, 0, 0])).toThrow(/all counts are 0/);
  });
  it('normal: constant data, empty data, non-finite values; unknown family', () => {
    expect(() => fitNormal([3, 3])).toThrow(/all values are equal/);
    expect(() => fitNormal([])).toThrow(/at least one value/);
    expect(() => fitNormal([1, NaN])).toThrow(/value 2 is not a finite/);
    expect(() => fitFamily('gamma', [1, 2])).toThrow(/unknown family "gamma"/);
    const err = (() => {
      try {
        fitPoisson([1, 0.5]);
      } catch (e) {
        return e as FitError;
      }
    })();
    expect(err).toMatchObject({ code: 'non-integer', index: 1, reason: 'is not a whole number (0.5): a poisson model needs counts' });
  });
});

describe('logFactorial', () => {
  it('matches R lgamma(k + 1) from 0 to 123456', () => {
    R.lgamma_at.forEach((k, i) => {
      expect(Math.abs(logFactorial(k) - R.lgamma[i])).toBeLessThanOrEqual(1e-13 * Math.max(1, R.lgamma[i]));
    });
  });
});

/** Kolmogorov–Smirnov distance between a sample and a continuous CDF. */
function ksDistance(sample: Float64Array, cdf: (x: number) => number): number {
  const s = Float64Array.from(sample).sort();
  const n = s.length;
  let d = 0;
  for (let i = 0; i < n; i++) {
    const F = cdf(s[i]);
    d = Math.max(d, (i + 1) / n - F, F - i / n);
  }
  return d;
}
// 1% critical value of the KS statistic ≈ 1.63/√n (Kolmogorov's limit distribution;
// e.g. Conover, "Practical Nonparametric Statistics", table A13).
const ks1 = (n: number) => 1.63 / Math.sqrt(n);
const phi = (z: number) => 0.5 * (1 + errorFunction(z / Math.SQRT2)); // simple-statistics erf, |error| < 1.2e-7

describe('samplers (seeded; goodness of fit against the exact distribution)', () => {
  const N = 20_000;
  it('normal (Box–Muller) passes a KS test and gives mean/sd', () => {
    const x = fillNormal(new Float64Array(N + 1), 10, 3, seedrandom('normal'));
    expect(ksDistance(x, (v) => phi((v - 10) / 3))).toBeLessThan(ks1(N + 1));
    const mean = x.reduce((a, b) => a + b) / x.length;
    expect(Math.abs(mean - 10)).toBeLessThan(4 * 3 / Math.sqrt(N));
  });
  it('exponential (inversion) passes a KS test', () => {
    const x = fillExponential(new Float64Array(N), 0.25, seedrandom('exp'));
    expect(ksDistance(x, (v) => 1 - Math.exp(-0.25 * v))).toBeLessThan(ks1(N));
    expect(Math.min(...x)).toBeGreaterThanOrEqual(0);
  });
  it('lognormal passes a KS test', () => {
    const x = fillLognormal(new Float64Array(N), 1, 0.5, seedrandom('lnorm'));
    expect(ksDistance(x, (v) => phi((Math.log(v) - 1) / 0.5))).toBeLessThan(ks1(N));
  });
  it.each([0.7, 3.5, 9.99, 10, 42, 1500])('poisson λ = %s passes a chi-square test against the pmf', (lambda) => {
    const x = fillPoisson(new Float64Array(N), lambda, seedrandom(`pois-${lambda}`));
    // Pearson chi-square on cells with expected count ≥ 5, tails pooled;
    // reference pmf from simple-statistics' poissonDistribution, which only accepts λ ≤ 100;
    // above that, the closed form e^{−λ} λ^k / k! with log k! checked against R's lgamma above.
    const lo = Math.max(0, Math.floor(lambda - 6 * Math.sqrt(lambda)));
    const hi = Math.ceil(lambda + 6 * Math.sqrt(lambda));
    const table = lambda <= 100 ? (poissonDistribution(lambda) ?? []) : null;
    const pmf = (k: number) =>
      table ? (table[k] ?? 0) : Math.exp(-lambda + k * Math.log(lambda) - logFactorial(k));
    const counts = new Map<number, number>();
    for (const v of x) {
      expect(Number.isInteger(v) && v >= 0).toBe(true);
      counts.set(v, (counts.get(v) ?? 0) + 1);
    }
    let chi2 = 0;
    let df = -1;
    let pooledObs = 0;
    let pooledExp = 0;
    let totalExp = 0;
    for (let k = lo; k <= hi; k++) {
      pooledObs += counts.get(k) ?? 0;
      pooledExp += N * pmf(k);
      if (pooledExp >= 5) {
        chi2 += (pooledObs - pooledExp) ** 2 / pooledExp;
        totalExp += pooledExp;
        df++;
        pooledObs = 0;
        pooledExp = 0;
      }
    }
    // everything outside the cells so far (both tails and the leftover) as one cell
    const restObs = N - [...counts.entries()].filter(([k]) => k >= lo && k <= hi).reduce((a, [, c]) => a + c, 0) + pooledObs;
    const restExp = N - totalExp;
    if (restExp > 1) {
      chi2 += (restObs - restExp) ** 2 / restExp;
      df++;
    }
    // 0.1% upper point of chi-square(df), Wilson–Hilferty approximation
    const z = 3.09;
    const crit = df * (1 - 2 / (9 * df) + z * Math.sqrt(2 / (9 * df))) ** 3;
    expect(df).toBeGreaterThan(2);
    expect(chi2).toBeLessThan(crit);
    const mean = x.reduce((a, b) => a + b) / N;
    expect(Math.abs(mean - lambda)).toBeLessThan(4 * Math.sqrt(lambda / N));
  });

  it('inversion and PTRS agree in mean and variance at λ = 20 (both exact methods)', () => {
    const a = new Float64Array(N);
    const b = new Float64Array(N);
    const ra = seedrandom('inv');
    const rb = seedrandom('ptrs');
    for (let i = 0; i < N; i++) {
      a[i] = poissonInversion(20, ra);
      b[i] = poissonPtrs(20, rb);
    }
    const mv = (x: Float64Array) => {
      const m = x.reduce((s, v) => s + v) / x.length;
      return [m, x.reduce((s, v) => s + (v - m) ** 2, 0) / (x.length - 1)];
    };
    const [ma, va] = mv(a);
    const [mb, vb] = mv(b);
    expect(Math.abs(ma - mb)).toBeLessThan(4 * Math.sqrt(40 / N));
    expect(Math.abs(va / vb - 1)).toBeLessThan(0.06);
  });

  it('is deterministic for a seed and differs between seeds', () => {
    const m = fitExponential([1, 2, 3, 4]);
    const a = simulate(m, new Float64Array(50), seedrandom('same'));
    const b = simulate(m, new Float64Array(50), seedrandom('same'));
    const c = simulate(m, new Float64Array(50), seedrandom('other'));
    expect(a).toEqual(b);
    expect(a).not.toEqual(c);
  });
});

describe('parametric bootstrap of the mean under an exponential model', () => {
  it('has SE x̄/√n (closed form: Var(X̄) = 1/(nλ²) with λ = 1/x̄) on airquality$Ozone', () => {
    // Closed form: for X ~ Exp(λ̂), sd(X̄*) = (1/λ̂)/√n = x̄/√n.
    const x = R.ozone;
    const n = x.length;
    const model = fitExponential(x);
    const xbar = 1 / model.parameters.rate;
    const B = 4000;
    const random = seedrandom('param-exp');
    const buf = new Float64Array(n);
    const means = new Float64Array(B);
    for (let b = 0; b < B; b++) {
      simulate(model, buf, random);
      means[b] = buf.reduce((s, v) => s + v) / n;
    }
    const m = means.reduce((s, v) => s + v) / B;
    const se = Math.sqrt(means.reduce((s, v) => s + (v - m) ** 2, 0) / (B - 1));
    // Monte Carlo error of an SD from B draws ≈ SE·√((κ−1)/(4B)) ≈ SE/√(2B) for a near-normal
    // mean: 1.1% here; allow 4%.
    expect(Math.abs(se / (xbar / Math.sqrt(n)) - 1)).toBeLessThan(0.04);
    expect(Math.abs(m - xbar)).toBeLessThan(4 * (xbar / Math.sqrt(n)) / Math.sqrt(B));
  });
});
