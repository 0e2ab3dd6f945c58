import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { EngineError, runRequest } from '@/lib/resampling';
import { clusterMedian } from '@/lib/resampling/schemes/cluster';
import type { SchemeContext } from '@/lib/resampling/schemes/types';
import { STATISTICS } from '@/lib/resampling/statistics/registry';
import { runR } from './structured-r';

// Outside reference: R's boot package (structured-cluster.R beside this file, run live):
// the cluster bootstrap as boot() over cluster ids on ChickWeight, and boot(..., strata =)
// on PlantGrowth. Two Monte Carlo SEs from B = 20,000 each differ by ≈ SE/√B ≈ 0.7% (1 sd);
// we allow 4%.
const R: Record<string, (number | string)[]> = {};
for (const line of runR(readFileSync(new URL('./structured-cluster.R', import.meta.url), 'utf8')).split('\n')) {
  const m = /^(\S+) :(.*)$/.exec(line.trim());
  if (m) R[m[1]] = m[2].trim().split(/\s+/).map((v) => (/^[-+0-9.eE]+$/.test(v) ? Number(v) : v));
}
const num = (k: string) => R[k] as number[];
const B = 20_000;
const chick = { weight: num('cw_weight'), chick: (R.cw_chick as (string | number)[]).map(String) };
const mean = { name: 'mean', column: 'weight' };

describe('cluster scheme on ChickWeight (50 chicks, repeated weights)', () => {
  it('whole clusters: SE ≈ R boot over chick ids, and well above the ordinary SE', () => {
    const r = runRequest({ data: chick, statistic: mean, scheme: { name: 'cluster', by: 'chick' }, B, seed: 'cw' });
    expect(Math.abs(r.se! / num('cw_cluster_mean')[0] - 1)).toBeLessThan(0.04);
    expect(r.scheme).toMatchObject({ name: 'cluster', by: 'chick', clusters: 50, secondStage: false });
    const o = runRequest({ data: chick, statistic: mean, B, seed: 'cw' });
    expect(Math.abs(o.se! / num('cw_ordinary_mean')[0] - 1)).toBeLessThan(0.04);
    expect(o.se!).toBeLessThan(r.se!);
    // repeated ids are noticed under the ordinary scheme, not under the cluster one
    expect(o.warnings.map((w) => w.code)).toContain('repeated-ids');
    expect(r.warnings.map((w) => w.code)).not.toContain('repeated-ids');
  });

  it('two stages: SE ≈ R (clusters, then rows within each drawn cluster)', () => {
    const r = runRequest({ data: chick, statistic: mean, scheme: { name: 'cluster', by: 'chick', secondStage: true }, B, seed: 'cw2' });
    expect(Math.abs(r.se! / num('cw_two_stage_mean')[0] - 1)).toBeLessThan(0.04);
  });

  it('one cluster is refused, naming scheme.by', () => {
    const e = (() => {
      try {
        runRequest({ data: { weight: [1, 2, 3, 4], chick: ['a', 'a', 'a', 'a'] }, statistic: mean, scheme: { name: 'cluster', by: 'chick' }, B: 100 });
      } catch (err) {
        return err as EngineError;
      }
    })();
    expect(e).toBeInstanceOf(EngineError);
    expect(e!.path).toBe('scheme.by');
    expect(e!.message).toMatch(/only one cluster/);
  });
});

describe('identical resamples: boot\'s own draws of chick ids replayed in the engine', () => {
  it('ChickWeight, median: row counts and the sorted-scan fast path both give R\'s replicates exactly', () => {
    const x = Float64Array.from(num('cw_weight'));
    const n = x.length;
    const clusterOf = Int32Array.from(num('cw_cluster_of_row'));
    const G = 50;
    const idx = num('cw_idx');
    const t = num('cw_median_t');
    const median = STATISTICS.get('median')!.prepare({ n, values: { x } }, { name: 'median', column: 'x' } as never);
    const fast = clusterMedian({ statisticName: 'median', data: { n, values: { x } } } as unknown as SchemeContext, clusterOf)!;
    const size = new Int32Array(G);
    for (const g of clusterOf) size[g]++;
    for (let b = 0; b < t.length; b++) {
      const mult = new Int32Array(G);
      for (const g of idx.slice(b * G, (b + 1) * G)) mult[g]++;
      const counts = Int32Array.from(clusterOf, (g) => mult[g]);
      const total = mult.reduce((s, c, g) => s + c * size[g], 0);
      expect(median.fromCounts(counts, total)).toBe(t[b]);
      expect(fast(mult, total)).toBe(t[b]);
    }
  });
});

describe('stratified two-group resampling against boot(..., strata =)', () => {
  it('PlantGrowth ctrl − trt1: SE ≈ R and ≈ the plug-in SE √(σ̂₁²/n₁ + σ̂₂²/n₂)', () => {
    const data = { weight: num('pg_weight'), group: R.pg_group.map(String) };
    const r = runRequest({ data, statistic: { name: 'mean-difference', column: 'weight', group: 'group', levels: ['ctrl', 'trt1'] }, scheme: { name: 'stratified', by: 'group' }, B, seed: 'pg' });
    const [rSe, plugIn] = num('pg_strata_diff');
    expect(Math.abs(r.se! / rSe - 1)).toBeLessThan(0.04);
    expect(Math.abs(r.se! / plugIn - 1)).toBeLessThan(0.03);
  });
});
