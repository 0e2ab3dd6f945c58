import seedrandom from 'seedrandom';
import { describe, expect, it } from 'vitest';
import { runRequest } from '../engine/run-request';
import { prepare } from '../engine/run-request';
import { createRng } from '../random/rng';
import { STATISTICS } from '../statistics/registry';
import { addClusterCounts } from '../structured/cluster-counts';
import { clusterMedian, clusterSums } from './cluster';
import { strataFromKeys } from './counting';
import type { SchemeContext } from './types';

// Invented daily nitrate series (mg/L) with serial dependence, and readings at sites.
const rng = seedrandom('structured-schemes');
const daily: number[] = [];
let level = 0;
for (let t = 0; t < 300; t++) {
  level = 0.6 * level + (rng() - 0.5);
  daily.push(4 + level);
}

const same = (a: (number | null)[], b: (number | null)[]) => {
  expect(a).toHaveLength(b.length);
  for (let i = 0; i < a.length; i++) expect(Math.abs(a[i]! - b[i]!)).toBeLessThan(1e-12 * Math.abs(b[i]!));
};

describe('fast paths give the replicates of the count-based path', () => {
  // trimmed-mean with trim 0 is the mean but has no fast path: the same resamples through counts.
  const req = (statistic: object, scheme: object) => ({ data: { x: daily }, statistic, scheme, B: 600, seed: 'fast', include: ['replicates'] });
  it.each([
    { name: 'moving-block', blockLength: 7 },
    { name: 'stationary', meanBlockLength: 4.5 },
  ])('%o: mean by prefix sums = mean from counts', (scheme) => {
    const fast = runRequest(req({ name: 'mean', column: 'x' }, scheme)).replicates!;
    const slow = runRequest(req({ name: 'trimmed-mean', column: 'x', trim: 0 }, scheme)).replicates!;
    same(fast, slow);
  });

  it('cluster mean by cluster sums = mean from counts', () => {
    const site = daily.map((_, i) => `S${i % 23}`);
    const r = (statistic: object) => runRequest({ data: { x: daily, site }, statistic, scheme: { name: 'cluster', by: 'site' }, B: 600, seed: 'fast', include: ['replicates'] }).replicates!;
    same(r({ name: 'mean', column: 'x' }), r({ name: 'trimmed-mean', column: 'x', trim: 0 }));
  });

  it('cluster median by the sorted scan = quantile p = 0.5 (type 7) from counts, odd and even totals', () => {
    // unequal cluster sizes (1 … 4 rows) so that resample sizes are both odd and even
    const site = daily.map((_, i) => `S${Math.floor(Math.sqrt(i * 3))}`);
    const r = (statistic: object) => runRequest({ data: { x: daily, site }, statistic, scheme: { name: 'cluster', by: 'site' }, B: 600, seed: 'fast', include: ['replicates'] }).replicates!;
    expect(r({ name: 'median', column: 'x' })).toEqual(r({ name: 'quantile', column: 'x', p: 0.5 }));
  });

  it('cluster median: the scan from the middle finds the order statistics a scan from the first value finds', () => {
    // Multiplicities far from a real resample's too (most weight in the lowest or highest
    // clusters, zeros at the middle, single clusters), odd and even totals; tied values.
    const G = 37;
    const x = Float64Array.from({ length: 211 }, (_, i) => Math.round(daily[i] * 4) / 4);
    const clusterOf = Int32Array.from(x, (_, i) => (i * 7) % G);
    const size = new Int32Array(G);
    for (const g of clusterOf) size[g]++;
    const fast = clusterMedian({ statisticName: 'median', data: { n: x.length, values: { x } } } as unknown as SchemeContext, clusterOf)!;
    const order = Int32Array.from(x, (_, i) => i).sort((a, b) => x[a] - x[b]);
    // the plain definition: the middle value(s) of the resample written out
    const direct = (c: Int32Array): number => {
      const values: number[] = [];
      for (const i of order) for (let k = 0; k < c[clusterOf[i]]; k++) values.push(x[i]);
      const t = values.length;
      return t % 2 ? values[(t - 1) / 2] : (values[t / 2 - 1] + values[t / 2]) / 2;
    };
    const r = seedrandom('middle-scan');
    const byValue = Array.from({ length: G }, (_, g) => g).sort((a, b) => Math.min(...x.filter((_, i) => clusterOf[i] === a)) - Math.min(...x.filter((_, i) => clusterOf[i] === b)));
    for (let trial = 0; trial < 400; trial++) {
      const c = new Int32Array(G);
      const kind = trial % 4;
      if (kind === 0) for (let j = 0; j < G; j++) c[Math.floor(r() * G)]++;
      else if (kind === 1) c[Math.floor(r() * G)] = 1 + Math.floor(r() * 3);
      else if (kind === 2) for (let j = 0; j < G; j++) c[byValue[Math.floor(r() * r() * G)]]++;
      else for (let j = 0; j < G; j++) c[byValue[G - 1 - Math.floor(r() * r() * G)]]++;
      const total = c.reduce((s, k, g) => s + k * size[g], 0);
      expect(fast(c, total)).toBe(direct(c));
    }
  });

  it.each(['median', 'mean'])('cluster %s: whole chunks in WebAssembly (cluster-chunks.wat) give the replicates one at a time gives, and leave the random streams alike', (name) => {
    const r = seedrandom(`cluster-chunks ${name}`);
    // G clusters of 1 … 5 rows (odd and even resample sizes), values with ties
    for (const G of [2, 7, 60, 300]) {
      const site: string[] = [];
      const x: number[] = [];
      for (let g = 0; g < G; g++) {
        const level = r() * 3;
        for (let j = 0, rows = 1 + Math.floor(r() * 5); j < rows; j++) {
          site.push(`site ${g}`);
          x.push(Math.round((level + r()) * 8) / 8);
        }
      }
      const problem = prepare({ data: { x, site }, statistic: { name, column: 'x' }, scheme: { name: 'cluster', by: 'site' }, B: 1000, seed: 's' });
      expect(problem.scheme.replicateMany, `G = ${G}`).toBeDefined();
      const a = createRng('cluster-chunks', `G${G}`);
      const b = createRng('cluster-chunks', `G${G}`);
      const one = Float64Array.from({ length: 400 }, () => problem.scheme.replicate(a));
      const many = new Float64Array(410).fill(-1);
      expect(problem.scheme.replicateMany!(b, many, 10, 400)).toBe(true);
      expect(Array.from(many.subarray(10)), `G = ${G}`).toEqual(Array.from(one));
      expect(many[9]).toBe(-1);
      expect(problem.scheme.replicate(b)).toBe(problem.scheme.replicate(a));
      // more than a chunk at once: declined, nothing drawn
      expect(problem.scheme.replicateMany!(b, new Float64Array(2000), 0, 2000)).toBe(false);
      expect(problem.scheme.replicate(b)).toBe(problem.scheme.replicate(a));
    }
  });

  it('cluster difference of means by cluster sums = the statistic on expanded counts', () => {
    const g = daily.map((_, i) => (i < 140 ? 'up' : 'down'));
    const site = daily.map((_, i) => `S${Math.floor(i / 10)}`);
    const request = { data: { x: daily, g, site }, statistic: { name: 'mean-difference', column: 'x', group: 'g', levels: ['up', 'down'] }, scheme: { name: 'cluster', by: 'site' }, B: 50 };
    const problem = prepare(request);
    const clusters = strataFromKeys(site);
    const ctx = { statisticName: 'mean-difference', data: problem.data } as unknown as SchemeContext;
    const f = clusterSums(ctx, [clusters], clusters.length)!;
    const stat = STATISTICS.get('mean-difference')!.prepare(problem.data, problem.request.statistic);
    const random = seedrandom('md');
    for (let b = 0; b < 20; b++) {
      const counts = new Int32Array(problem.n);
      const total = addClusterCounts(clusters, random, counts);
      const mult = Int32Array.from(clusters, (rows) => counts[rows[0]]);
      expect(f(mult, total)).toBeCloseTo(stat.fromCounts(counts, total), 12);
    }
  });
});

describe('scheme details in the response', () => {
  it('BCa under a cluster or block scheme warns that the jackknife leaves out rows; responses hold no NaN or Infinity', () => {
    const site = daily.map((_, i) => `S${i % 30}`);
    for (const scheme of [{ name: 'cluster', by: 'site' }, { name: 'moving-block', blockLength: 'auto' }, { name: 'stationary', meanBlockLength: 'auto' }]) {
      const r = runRequest({ data: { x: daily, site }, statistic: { name: 'sd', column: 'x' }, scheme, B: 300, intervals: { methods: ['percentile', 'bca'] }, include: ['jackknife', 'convergence'] });
      expect(r.warnings.map((w) => w.code)).toContain('jackknife-rows');
      const bad = (v: unknown): boolean => (typeof v === 'number' ? !Number.isFinite(v) : v && typeof v === 'object' ? Object.values(v).some(bad) : false);
      expect(bad(r)).toBe(false);
    }
  });

  it('a parametric model that makes the statistic undefined on some samples still answers without NaN', () => {
    // a normal model for a geometric mean: simulated samples with values ≤ 0 give no estimate
    const r = runRequest({ data: { x: [0.2, 0.5, 0.3, 1.4, 0.9, 0.25, 0.6, 0.4] }, statistic: { name: 'geometric-mean', column: 'x' }, scheme: { name: 'parametric', family: 'normal' }, B: 400 });
    expect(r.replicatesUsed).toBeLessThan(400);
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
  });

  it('moving-block "auto" reports the rule\'s numbers; circular variant', () => {
    const r = runRequest({ data: { x: daily }, statistic: { name: 'median', column: 'x' }, scheme: { name: 'moving-block', blockLength: 'auto' }, B: 200 });
    expect(r.scheme).toMatchObject({ name: 'moving-block', variant: 'circular', blockLengthMethod: 'auto', auto: { column: 'x' } });
    expect(Number.isInteger(r.scheme.blockLength)).toBe(true);
    expect(r.provenance.scheme).toMatch(/circular/);
    // no inner SE for dependent resamples: the studentized interval says why
    const s = runRequest({ data: { x: daily }, statistic: { name: 'mean', column: 'x' }, scheme: { name: 'stationary', meanBlockLength: 5 }, B: 200, intervals: { methods: ['studentized'] } });
    expect(s.intervals.studentized!.lower).toBeNull();
  });

  it('two-group block resampling keeps each group its own series', () => {
    const g = daily.map((_, i) => (i < 150 ? 'up' : 'down'));
    const r = runRequest({ data: { x: daily, g }, statistic: { name: 'mean-difference', column: 'x', group: 'g', levels: ['up', 'down'] }, scheme: { name: 'moving-block', blockLength: 149 }, B: 100 });
    expect(r.se).toBeGreaterThan(0);
    expect(() => runRequest({ data: { x: daily, g }, statistic: { name: 'mean-difference', column: 'x', group: 'g', levels: ['up', 'down'] }, scheme: { name: 'moving-block', blockLength: 150 }, B: 100 })).toThrow(/smaller group has only 150/);
  });

  it('cluster: a group with one cluster is refused, naming the level', () => {
    const data = { x: [1, 2, 3, 4, 5, 6], g: ['a', 'a', 'b', 'b', 'b', 'b'], site: ['s1', 's1', 's2', 's2', 's3', 's3'] };
    expect(() => runRequest({ data, statistic: { name: 'mean-difference', column: 'x', group: 'g', levels: ['a', 'b'] }, scheme: { name: 'cluster', by: 'site' }, B: 100 })).toThrow(/group "a" has only 1 cluster/);
  });
});
