import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { ar1Series } from '@/tests/support/ar1';
import { ar1OptimalBlockLength } from '@/lib/resampling/blocklength';
import { STATISTICS } from '@/lib/resampling/statistics/registry';
import { addMovingBlockCountsFromStarts, blockCount } from '@/lib/resampling/structured';
import { EngineError, runRequest } from '@/lib/resampling';
import { runR } from './structured-r';

// Outside reference: R's boot::tsboot on series from R's datasets package (structured-blocks.R
// beside this file, run live). Two independent Monte Carlo estimates of an SE from B = 20,000
// replicates each differ by about √2 · SE/√(2B) = SE/√B ≈ 0.7% (1 sd); we allow 4%
// (smooth statistics) and 8% (the median, whose replicates are lumpy).
const out = runR(readFileSync(new URL('./structured-blocks.R', import.meta.url), 'utf8'));
const R: Record<string, number[]> = {};
for (const line of out.split('\n')) {
  const m = /^(\S+) :(.*)$/.exec(line.trim());
  if (m) R[m[1]] = m[2].trim().split(/\s+/).map(Number);
}
const B = 20_000;
const run = (data: number[], scheme: object, statistic = 'mean', extra: object = {}) =>
  runRequest({ data: { x: data }, statistic: { name: statistic, column: 'x' }, scheme, B, seed: 'structured-blocks', ...extra });

describe('moving-block and stationary schemes against R boot::tsboot', () => {
  it('lynx, mean, blocks of 10: moving-block SE ≈ tsboot(sim = "fixed") SE', () => {
    const r = run(R.lynx, { name: 'moving-block', blockLength: 10 });
    expect(Math.abs(r.se! / R.lynx_fixed_10[0] - 1)).toBeLessThan(0.04);
    expect(r.scheme).toMatchObject({ name: 'moving-block', variant: 'circular', blockLength: 10, blockLengthMethod: 'given' });
  });

  it('Nile, mean, mean block length 8: stationary SE ≈ tsboot(sim = "geom") SE', () => {
    const r = run(R.nile, { name: 'stationary', meanBlockLength: 8 });
    expect(Math.abs(r.se! / R.nile_geom_8[0] - 1)).toBeLessThan(0.04);
  });

  it('LakeHuron, median, blocks of 6: moving-block SE ≈ tsboot SE', () => {
    const r = run(R.huron, { name: 'moving-block', blockLength: 6 }, 'median');
    expect(Math.abs(r.se! / R.huron_fixed_6_median[0] - 1)).toBeLessThan(0.08);
  });

  it('lynx: the ordinary SE matches R boot and is below the block SE (positive autocorrelation)', () => {
    const r = run(R.lynx, { name: 'ordinary' });
    expect(Math.abs(r.se! / R.lynx_ordinary[0] - 1)).toBeLessThan(0.04);
    expect(r.se!).toBeLessThan(R.lynx_fixed_10[0]);
    expect(r.warnings.map((w) => w.code)).toContain('serial-correlation');
  });

  it('lynx, blocks of 19 (n = 114 = 6 × 19): SE equals the closed form of the circular block bootstrap', () => {
    // Politis & Romano (1992): for n = kℓ, Var*(x̄*) = (1/k)(1/n)Σ_i (B̄_i − x̄)², B̄_i the
    // mean of the circular block starting at i.
    const x = R.lynx;
    const n = x.length;
    const xbar = x.reduce((a, b) => a + b) / n;
    let ss = 0;
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let j = 0; j < 19; j++) s += x[(i + j) % n];
      ss += (s / 19 - xbar) ** 2;
    }
    const want = Math.sqrt(ss / n / 6);
    const r = run(x, { name: 'moving-block', blockLength: 19 });
    // one Monte Carlo estimate: SE/√(2B) ≈ 0.5%; allow 3%
    expect(Math.abs(r.se! / want - 1)).toBeLessThan(0.03);
  });
});

describe('identical resamples: tsboot\'s own block starts replayed in the engine', () => {
  it('LakeHuron, median, l = 6: the engine\'s circular blocks rebuild every R resample, and its median from counts equals R\'s replicate exactly', () => {
    const x = Float64Array.from(R.huron);
    const n = x.length; // 98 = 16 blocks of 6 + one of 2
    const idx = R.huron_idx;
    const reps = R.huron_t.length;
    expect(idx.length).toBe(reps * n);
    const def = STATISTICS.get('median')!;
    const median = def.prepare({ n, values: { x } }, { name: 'median', column: 'x' } as never);
    const units = Int32Array.from({ length: n }, (_, i) => i);
    const k = blockCount(n, 6);
    for (let b = 0; b < reps; b++) {
      const row = idx.slice(b * n, (b + 1) * n);
      // R's counts, and the engine's counts from R's block starts (every 6th index)
      const rCounts = new Int32Array(n);
      for (const i of row) rCounts[i]++;
      const starts = Array.from({ length: k }, (_, j) => row[6 * j]);
      const ours = new Int32Array(n);
      addMovingBlockCountsFromStarts(units, 6, starts, ours);
      expect(ours).toEqual(rCounts);
      expect(median.fromCounts(ours, n)).toBe(R.huron_t[b]);
    }
  });
});

const ar1 = (n: number, phi: number, seed: string): number[] => Array.from(ar1Series(n, phi, seed));

describe('AR(1) with φ = 0.6: block schemes recover the long-run SE, the ordinary bootstrap does not', () => {
  // Closed form: for an AR(1) with marginal SD σ = σ_e/√(1 − φ²), the SE of the mean is
  // σ/√n · √((1 + φ)/(1 − φ)) asymptotically (long-run variance σ_e²/(1 − φ)²; Brockwell &
  // Davis, "Time Series: Theory and Methods", §7.1). With σ_e = 1, φ = 0.6, n = 2000:
  // σ = 1.25, SE = 1.25/√2000 · 2 = 0.0559; the ordinary bootstrap estimates σ/√n ≈ 0.028.
  const phi = 0.6;
  const n = 2000;
  const sigma = 1 / Math.sqrt(1 - phi * phi);
  const longRun = (sigma / Math.sqrt(n)) * Math.sqrt((1 + phi) / (1 - phi));
  const series = [0, 1, 2, 3].map((i) => ar1(n, phi, `ar1-${i}`));
  const avg = (scheme: object) => {
    const rs = series.map((x) => runRequest({ data: { x }, statistic: { name: 'mean', column: 'x' }, scheme, B: 2000, seed: 'ar1' }));
    return { se: rs.reduce((s, r) => s + r.se!, 0) / rs.length, responses: rs };
  };

  it('moving-block "auto" and stationary "auto" are within 15% of the long-run SE; ordinary is about half', () => {
    const mb = avg({ name: 'moving-block', blockLength: 'auto' });
    const sb = avg({ name: 'stationary', meanBlockLength: 'auto' });
    const ord = avg({ name: 'ordinary' });
    // block bootstraps are biased down by O(1/ℓ); 15% covers that and the series' own noise
    expect(Math.abs(mb.se / longRun - 1)).toBeLessThan(0.15);
    expect(Math.abs(sb.se / longRun - 1)).toBeLessThan(0.15);
    expect(ord.se / longRun).toBeGreaterThan(0.4);
    expect(ord.se / longRun).toBeLessThan(0.6);
    // the automatic length is near the theoretical optimum, (3/2)^{1/3}(2φ/(1−φ²))^{2/3} n^{1/3} ≈ 22
    const theory = ar1OptimalBlockLength(phi, n).circular;
    for (const r of mb.responses) {
      const l = r.scheme.blockLength as number;
      expect(l).toBeGreaterThan(theory / 2);
      expect(l).toBeLessThan(theory * 2);
    }
    expect(ord.responses.every((r) => r.warnings.some((w) => w.code === 'serial-correlation'))).toBe(true);
    expect(mb.responses.some((r) => r.warnings.some((w) => w.code === 'serial-correlation'))).toBe(false);
  });
});

describe('bad block settings', () => {
  it('a block length of n or more names scheme.blockLength', () => {
    const x = R.nile.slice(0, 30);
    const err = (() => {
      try {
        run(x, { name: 'moving-block', blockLength: 30 });
      } catch (e) {
        return e as EngineError;
      }
    })();
    expect(err).toBeInstanceOf(EngineError);
    expect(err!.path).toBe('scheme.blockLength');
    expect(err!.message).toMatch(/only 30 values/);
    expect(() => run(x, { name: 'stationary', meanBlockLength: 40 })).toThrow(/only 30 values/);
    expect(() => run(x, { name: 'moving-block', blockLength: 2.5 })).toThrow(/whole number/);
  });

  it('"auto" on a constant series says why and names the field', () => {
    expect(() => run(new Array(40).fill(3), { name: 'moving-block', blockLength: 'auto' })).toThrow(EngineError);
  });
});
