import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { ar1Series as ar1 } from '@/tests/support/ar1';
import { runRNumbers } from '@/tests/reference/structured-r';
import {
  ar1OptimalBlockLength,
  BlockLengthError,
  blockLengthFromAutocovariances,
  flatTopLagWindow,
  optimalBlockLength,
} from './index';


describe('flatTopLagWindow (Politis & Romano 1995)', () => {
  it('is 1 up to 1/2, falls linearly to 0 at 1, and is even', () => {
    expect([0, 0.5, 0.75, 1, 1.2].map(flatTopLagWindow)).toEqual([1, 1, 0.5, 0, 0]);
    expect(flatTopLagWindow(-0.75)).toBe(0.5);
  });
});

describe('block-length formulas on an AR(1) with known autocovariances', () => {
  // Closed form (derived in ar1-optimal-block-length.ts from PW 2004 / PPW 2009):
  // b_SB = |2φ/(1−φ²)|^{2/3} n^{1/3}, b_CB = (3/2)^{1/3} b_SB.
  it.each([0.3, 0.6, 0.9, -0.5])('plug-in with R(k) = γ0 φ^k reproduces the closed form for φ = %s', (phi) => {
    const gamma0 = 1 / (1 - phi * phi);
    const M = 2000; // λ = 1 up to lag 1000, where φ^k is below 1e-45
    const acov = Float64Array.from({ length: M + 1 }, (_, k) => gamma0 * Math.pow(phi, k));
    const got = blockLengthFromAutocovariances(acov, M, 1000);
    const want = ar1OptimalBlockLength(phi, 1000);
    expect(got.stationary).toBeCloseTo(want.stationary, 9);
    expect(got.circular).toBeCloseTo(want.circular, 9);
    // the long-run variance Σ R(k) = γ0(1+φ)/(1−φ) (Box, Jenkins & Reinsel §2.1)
    expect(got.g0).toBeCloseTo(gamma0 * (1 + phi) / (1 - phi), 9);
  });

  it('gives the worked numbers for φ = 0.6, n = 1000 (arithmetic from the closed form)', () => {
    const b = ar1OptimalBlockLength(0.6, 1000);
    // (1.2/0.64)^{2/3} · 10 = 1.875^{2/3} · 10
    expect(b.stationary).toBeCloseTo(15.2055, 3);
    expect(b.circular).toBeCloseTo(17.406, 2);
  });
});

describe('optimalBlockLength on simulated AR(1) series', () => {
  it('estimates the theoretical block length within 10% for φ = 0.6, n = 100,000 (five series)', () => {
    const want = ar1OptimalBlockLength(0.6, 100_000);
    let sum = 0;
    for (let s = 0; s < 5; s++) {
      const got = optimalBlockLength(ar1(100_000, 0.6, `pw-${s}`));
      expect(Math.abs(got.stationary / want.stationary - 1)).toBeLessThan(0.1);
      expect(Math.abs(got.circular / want.circular - 1)).toBeLessThan(0.1);
      sum += got.stationary;
    }
    expect(Math.abs(sum / 5 / want.stationary - 1)).toBeLessThan(0.05);
  });

  it('grows with φ and with n (about n^{1/3}), and stays near 1 for white noise', () => {
    const mean = (n: number, phi: number) => {
      let s = 0;
      for (let i = 0; i < 4; i++) s += optimalBlockLength(ar1(n, phi, `grow-${n}-${phi}-${i}`)).circular;
      return s / 4;
    };
    const b2 = mean(20_000, 0.2);
    const b5 = mean(20_000, 0.5);
    const b8 = mean(20_000, 0.8);
    expect(b2).toBeLessThan(b5);
    expect(b5).toBeLessThan(b8);
    // n × 8 → b × 2 asymptotically
    const ratio = mean(80_000, 0.5) / mean(10_000, 0.5);
    expect(ratio).toBeGreaterThan(1.6);
    expect(ratio).toBeLessThan(2.5);
    expect(mean(20_000, 0)).toBeLessThan(3);
  });

  it('does not depend on the scale or location of the series, nor change its input', () => {
    const x = ar1(2000, 0.6, 'scale');
    const copy = Float64Array.from(x);
    const a = optimalBlockLength(x);
    const b = optimalBlockLength(x.map((v) => 1000 + 3.5 * v));
    expect(b.stationary).toBeCloseTo(a.stationary, 8);
    expect(b.circular).toBeCloseTo(a.circular, 8);
    expect(x).toEqual(copy);
  });

  it('keeps circular / stationary = (3/2)^{1/3} before capping (D_CB / D_SB = 2/3)', () => {
    const r = optimalBlockLength(ar1(5000, 0.4, 'ratio'));
    expect(r.raw.circular / r.raw.stationary).toBeCloseTo(Math.cbrt(1.5), 12);
  });

  it('caps at ceil(min(3√n, n/3)) when the long-run variance is near 0 (over-differenced noise)', () => {
    // x_t = e_t − e_{t−1} has spectral density 0 at frequency 0, so ĝ(0) ≈ 0 and the
    // plug-in length blows up; the cap must hold it.
    const e = ar1(1001, 0, 'over-differenced');
    const x = Float64Array.from({ length: 1000 }, (_, t) => e[t + 1] - e[t]);
    const r = optimalBlockLength(x);
    expect(r.cap).toBe(95);
    expect(r.raw.circular).toBeGreaterThan(95);
    expect(r.circular).toBe(95);
    expect(r.capped).toBe(true);
  });

  it('rejects short, non-finite and constant series with a typed error', () => {
    expect(() => optimalBlockLength([1, 2, 3])).toThrow(BlockLengthError);
    expect(() => optimalBlockLength([1, 2, 3])).toThrow(/at least 10/);
    expect(() => optimalBlockLength([1, 2, 3, 4, 5, 6, 7, 8, 9, Infinity])).toThrow(/value 10/);
    expect(() => optimalBlockLength(new Array(20).fill(4))).toThrow(/constant/);
  });
});

describe('optimalBlockLength against an independent R transcription (stats::acf)', () => {
  const script = readFileSync(new URL('./politis-white.R', import.meta.url), 'utf8');
  const series = ['lynx', 'Nile', 'LakeHuron', 'nhtemp', 'log10(lynx)'];
  const r = runRNumbers(
    script +
      series.map((s, i) => `emit("x${i}", ${s}); emit("b${i}", pw_block_length(as.numeric(${s})))`).join('\n'),
  );
  it.each(series.map((s, i) => [s, i] as const))('%s: same m̂, M and block lengths as R', (_name, i) => {
    const [mHat, M, stationary, circular] = r[`b${i}`];
    const ours = optimalBlockLength(r[`x${i}`]);
    expect(ours.mHat).toBe(mHat);
    expect(ours.M).toBe(M);
    expect(ours.raw.stationary).toBeCloseTo(stationary, 9);
    expect(ours.raw.circular).toBeCloseTo(circular, 9);
  });
});
