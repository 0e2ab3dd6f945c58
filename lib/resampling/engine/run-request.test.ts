import { describe, expect, it } from 'vitest';
import { everyStatistic } from '@/tests/support/statistics';
import { EngineError } from '../errors';
import { parseRequest } from '../contract/parse';
import { runRequest } from './run-request';

// Invented demo data: nitrate (mg/L) upstream and downstream of a treatment works.
const upstream = [2.1, 2.6, 1.9, 3.4, 2.8, 2.2, 3.9, 2.5, 2.0, 3.1, 2.7, 4.8, 2.3, 2.9, 3.6];
const downstream = [3.3, 4.1, 2.9, 5.6, 3.8, 4.4, 6.9, 3.5, 3.1, 4.9, 4.0, 7.7, 3.6, 4.2, 5.3];
const data = { nitrate: [...upstream, ...downstream], site: [...upstream.map(() => 'up'), ...downstream.map(() => 'down')] };
const all5 = ['normal', 'basic', 'percentile', 'bca', 'studentized'];

function errorOf(input: unknown): EngineError {
  try {
    runRequest(input);
  } catch (e) {
    if (e instanceof EngineError) return e;
    throw e;
  }
  throw new Error('expected an EngineError');
}

function hasNaN(value: unknown): boolean {
  if (typeof value === 'number') return !Number.isFinite(value);
  if (Array.isArray(value)) return value.some(hasNaN);
  if (value && typeof value === 'object') return Object.values(value).some(hasNaN);
  return false;
}

describe('determinism', () => {
  it('the same request gives bit-identical responses; another seed differs', () => {
    const req = { data, statistic: { name: 'median-difference', column: 'nitrate', group: 'site', levels: ['down', 'up'] }, B: 1200, seed: 'w1', intervals: { methods: all5 }, include: ['replicates', 'convergence', 'jackknife'] };
    const a = JSON.stringify(runRequest(req));
    const b = JSON.stringify(runRequest(structuredClone(req)));
    expect(a).toBe(b);
    const c = runRequest({ ...req, seed: 'w2' });
    expect(c.replicates).not.toEqual(JSON.parse(a).replicates);
    expect(c.estimate).toBe(JSON.parse(a).estimate);
  });

  it('column order does not change the data hash; a changed value does', () => {
    const r1 = runRequest({ data: { a: [1, 2, 3], x: [4, 5, 6.5] }, statistic: { name: 'mean', column: 'x' }, B: 50 });
    const r2 = runRequest({ data: { x: [4, 5, 6.5], a: [1, 2, 3] }, statistic: { name: 'mean', column: 'x' }, B: 50 });
    const r3 = runRequest({ data: { x: [4, 5, 6.6], a: [1, 2, 3] }, statistic: { name: 'mean', column: 'x' }, B: 50 });
    expect(r1.provenance.dataSha256).toBe(r2.provenance.dataSha256);
    expect(r1.provenance.dataSha256).not.toBe(r3.provenance.dataSha256);
    expect(r1.provenance.dataSha256).toMatch(/^[0-9a-f]{64}$/);
  });
});

describe('every statistic × interval method gives a finite, NaN-free response', () => {
  const x = upstream;
  const y = downstream;
  const stats = everyStatistic({ x: 'x', y: 'y', group: 'g', levels: ['a', 'b'], regression: { x: 'x', y: 'y' }, p: 0.8, pearson: true });
  for (const statistic of stats) {
    it(`${statistic.name}${'method' in statistic ? ` ${statistic.method}` : ''}`, () => {
      const r = runRequest({ data: { x, y, g: x.map((_, i) => (i % 2 ? 'a' : 'b')) }, statistic, B: 400, seed: 'all', intervals: { methods: all5 }, include: ['convergence', 'jackknife'] });
      expect(hasNaN(r)).toBe(false);
      expect(r.se).toBeGreaterThan(0);
      for (const m of ['normal', 'basic', 'percentile']) {
        const iv = r.intervals[m as 'normal']!;
        expect(iv.lower).not.toBeNull();
        expect(iv.lower!).toBeLessThan(iv.upper!);
      }
      expect(r.convergence!.at(-1)!.B).toBe(400);
      expect(r.provenance.engine).toMatch(/^margin-resampling\//);
    });
  }
});

describe('bad input: a clear EngineError naming the field', () => {
  const base = { data: { x: [1, 2, 3, 4] }, statistic: { name: 'mean', column: 'x' }, B: 100 };
  const cases: [string, unknown, string, string][] = [
    ['not an object', [1, 2], 'invalid:request', ''],
    ['unknown statistic', { ...base, statistic: { name: 'mode', column: 'x' } }, 'invalid:request', 'statistic.name'],
    ['missing column', { ...base, statistic: { name: 'mean', column: 'z' } }, 'invalid:request', 'statistic.column'],
    ['empty column', { ...base, data: { x: [] } }, 'invalid:data', 'data.x'],
    ['text in a numeric column', { ...base, data: { x: [1, 'two', 3] } }, 'invalid:data', 'data.x[1]'],
    ['B ≤ 0', { ...base, B: 0 }, 'invalid:request', 'B'],
    ['B not whole', { ...base, B: 10.5 }, 'invalid:request', 'B'],
    ['B absurdly large', { ...base, B: 1e9 }, 'limit:B', 'B'],
    ['n·B over the limit', { ...base, data: { x: Array.from({ length: 5000 }, (_, i) => i) }, B: 1_000_000 }, 'limit:work', 'B'],
    ['level not in (0, 1)', { ...base, intervals: { level: 1.5 } }, 'invalid:request', 'intervals.level'],
    ['non-finite level', { ...base, intervals: { level: Number.NaN } }, 'invalid:request', 'intervals.level'],
    ['unknown interval method', { ...base, intervals: { methods: ['wild'] } }, 'invalid:request', 'intervals.methods[0]'],
    ['group level with one value', { data: { x: [1, 2, 3], g: ['a', 'a', 'b'] }, statistic: { name: 'mean-difference', column: 'x', group: 'g', levels: ['a', 'b'] } }, 'invalid:data', 'statistic.levels[1]'],
    ['absent group level', { data: { x: [1, 2, 3], g: ['a', 'a', 'a'] }, statistic: { name: 'mean-difference', column: 'x', group: 'g', levels: ['a', 'c'] } }, 'invalid:data', 'statistic.levels[1]'],
    ['unequal columns', { data: { x: [1, 2, 3], y: [1, 2] }, statistic: { name: 'correlation', x: 'x', y: 'y' } }, 'invalid:data', 'data.y'],
    ['non-positive value for a geometric mean', { data: { x: [1, 2, -3, 4] }, statistic: { name: 'geometric-mean', column: 'x' } }, 'invalid:data', 'data.x[2]'],
    ['undefined estimate', { data: { x: [2, 2, 2], y: [1, 2, 3] }, statistic: { name: 'regression-slope', x: 'x', y: 'y' } }, 'invalid:data', 'statistic'],
    ['one finite value', { data: { x: [1, null, Number.POSITIVE_INFINITY] }, statistic: { name: 'mean', column: 'x' } }, 'invalid:data', 'data.x'],
    ['trim of 0.5', { ...base, statistic: { name: 'trimmed-mean', column: 'x', trim: 0.5 } }, 'invalid:request', 'statistic.trim'],
    ['block length not below n', { ...base, scheme: { name: 'moving-block', blockLength: 5 } }, 'invalid:request', 'scheme.blockLength'],
    ['unknown scheme', { ...base, scheme: { name: 'jumble' } }, 'invalid:request', 'scheme.name'],
    ['stratified without by', { ...base, scheme: { name: 'stratified' } }, 'invalid:request', 'scheme.by'],
    ['permutation test of a one-group statistic', { ...base, test: { name: 'permutation' } }, 'invalid:request', 'test.name'],
    ['unknown top-level field', { ...base, replicates: 5 }, 'invalid:request', ''],
  ];
  for (const [label, input, code, path] of cases) {
    it(label, () => {
      const e = errorOf(input);
      expect(e.code).toBe(code);
      expect(e.path).toBe(path);
      expect(e.message.length).toBeGreaterThan(10);
      expect(JSON.stringify(e.toJSON())).toContain('"error"');
    });
  }

  it("fields without a message of the engine's own get zod's English one, naming what is wrong (zod/mini loads no locale itself)", () => {
    expect(errorOf({ ...base, replicates: 5 }).message).toBe('Unrecognized key: "replicates"');
    expect(errorOf({ ...base, include: 'jackknife' }).message).toBe('include: Invalid input: expected array, received string');
    expect(errorOf({ ...base, statistic: { name: 'mean', column: 'x', trim: 0.1 } }).message).toBe('statistic: Unrecognized key: "trim"');
  });

  it('allows B = 100,000 and n·B = 10⁹ (checked without running)', () => {
    const req = parseRequest({ data: { x: Array.from({ length: 10_000 }, (_, i) => i) }, statistic: { name: 'mean', column: 'x' }, B: 100_000 });
    expect(req.B).toBe(100_000);
    expect(() => runRequest({ ...req, B: 100_000 }, { shouldStop: () => true })).toThrow(/cancelled/);
  });
});

describe('warnings', () => {
  const codes = (input: unknown) => runRequest(input).warnings.map((w) => w.code);
  it('small n, small B, non-finite values dropped (with the count)', () => {
    const r = runRequest({ data: { x: [1.2, 3.1, null, 2.2, Number.NaN, 5.1] }, statistic: { name: 'mean', column: 'x' }, B: 50 });
    const c = r.warnings.map((w) => w.code);
    expect(c).toContain('small-n');
    expect(c).toContain('small-b');
    const dropped = r.warnings.find((w) => w.code === 'non-finite-dropped')!;
    expect(dropped.message).toMatch(/^2 rows/);
    expect(r.provenance.n).toBe(4);
  });
  it('heavy ties and discrete replicates for a median', () => {
    const x = Array.from({ length: 40 }, (_, i) => [1, 1, 1, 2, 2, 3][i % 6]);
    expect(codes({ data: { x }, statistic: { name: 'median', column: 'x' }, B: 500 })).toEqual(expect.arrayContaining(['heavy-ties', 'discrete-replicates']));
  });
  it('the sample maximum', () => {
    expect(codes({ data: { x: upstream }, statistic: { name: 'quantile', column: 'x', p: 1 }, B: 500 })).toContain('extreme-statistic');
  });
  it('skewed replicates and far outliers (a ratio whose denominator can be near 0), with a robust SE', () => {
    const den = [0.1, 0.3, -0.75, 0.5, 0.02, 0.4, 0.15, 0.25, -0.78, 0.35, 0.05, 0.2];
    const num = den.map((_, i) => 1 + (i % 4) * 0.1 + i * 0.01);
    const r = runRequest({ data: { num, den }, statistic: { name: 'ratio-of-means', numerator: 'num', denominator: 'den' }, B: 2000, intervals: { methods: ['normal', 'bca'] } });
    const c = r.warnings.map((w) => w.code);
    expect(c).toContain('skewed-replicates');
    expect(c).toContain('replicate-outliers');
    expect(r.robustSe).not.toBeNull();
    expect(r.robustSe!).toBeLessThan(r.se!);
    expect(r.warnings.find((w) => w.code === 'replicate-outliers')!.message).toMatch(/robust SE/);
  });
  it('end points at extreme order statistics', () => {
    expect(codes({ data: { x: upstream }, statistic: { name: 'mean', column: 'x' }, B: 20, intervals: { level: 0.99 } })).toContain('small-b');
  });
});

describe('Monte Carlo error and advice', () => {
  it('SE Monte Carlo error ≈ √((κ + 2)/(4B)) · se, and advice scales as 1/error²', () => {
    const r = runRequest({ data: { x: downstream }, statistic: { name: 'mean', column: 'x' }, B: 2000, intervals: { methods: ['percentile'] } });
    expect(r.seMonteCarloError! / r.se!).toBeGreaterThan(0.005);
    expect(r.seMonteCarloError! / r.se!).toBeLessThan(0.04);
    expect(r.advice.seWithin1Percent!).toBeGreaterThan(r.advice.seWithin5Percent!);
    expect(r.advice.seWithin1Percent! / r.advice.seWithin5Percent!).toBeCloseTo(25, -1);
    expect(r.intervals.percentile!.lowerMonteCarloError!).toBeGreaterThan(0);
  });

  it('the predicted Monte Carlo error of the SE matches the spread over seeds', () => {
    // Check of Efron & Tibshirani (1993) eq. 19.8's Monte Carlo term against repetition:
    // 60 seeds at B = 200; the SD of the 60 SEs should be near the predicted error (±40%).
    const ses: number[] = [];
    let predicted = 0;
    for (let s = 0; s < 60; s++) {
      const r = runRequest({ data: { x: downstream }, statistic: { name: 'mean', column: 'x' }, B: 200, seed: `mc${s}` });
      ses.push(r.se!);
      predicted += r.seMonteCarloError! / 60;
    }
    const m = ses.reduce((a, b) => a + b, 0) / ses.length;
    const sd = Math.sqrt(ses.reduce((a, v) => a + (v - m) ** 2, 0) / (ses.length - 1));
    expect(sd / predicted).toBeGreaterThan(0.6);
    expect(sd / predicted).toBeLessThan(1.4);
  });
});

describe('progress and cancellation', () => {
  it('reports progress per chunk up to B and stops when asked', () => {
    const seen: number[] = [];
    runRequest({ data: { x: upstream }, statistic: { name: 'mean', column: 'x' }, B: 1700 }, { onProgress: (d, t) => (expect(t).toBe(1700), seen.push(d)) });
    expect(seen).toEqual([500, 1000, 1500, 1700]);
    let calls = 0;
    expect(() => runRequest({ data: { x: upstream }, statistic: { name: 'mean', column: 'x' }, B: 5000 }, { shouldStop: () => ++calls > 2 })).toThrow(EngineError);
  });
});

describe('stratified scheme', () => {
  it('keeps strata sizes: the mean over two strata has a smaller SE than pooled resampling', () => {
    const x = [...upstream, ...downstream];
    const base = { data: { x, site: data.site }, statistic: { name: 'mean', column: 'x' }, B: 3000, seed: 'strata' };
    const pooled = runRequest(base);
    const strat = runRequest({ ...base, scheme: { name: 'stratified', by: 'site' } });
    expect(strat.se!).toBeLessThan(pooled.se!);
    // Exact check: Var*(x̄*) = Σ (n_s/n)² σ̂²_s/n_s (plug-in variances), within Monte Carlo error.
    const n = x.length;
    let v = 0;
    for (const g of [upstream, downstream]) {
      const m = g.reduce((a, b) => a + b, 0) / g.length;
      v += (g.length / n) ** 2 * (g.reduce((a, b) => a + (b - m) ** 2, 0) / g.length / g.length);
    }
    expect(Math.abs(strat.se! - Math.sqrt(v))).toBeLessThan(4 * strat.seMonteCarloError!);
    expect(strat.provenance.scheme).toMatch(/2 strata/);
  });
});
