import * as ss from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { jStat } from '@/tests/reference/support/jstat';
import { createRng } from '../random/rng';
import { uniformIndex } from '../random/uniform-index';
import { STATISTICS } from './registry';
import type { StatisticData } from './types';

// Every statistic, evaluated on a resample given as counts, must equal the same statistic
// computed by an outside library on the expanded resample (each row repeated counts[i] times).
// Sources: simple-statistics 7.12 and jStat 1.9.6, named per check.

const rng = createRng('statistics-test', 'data');
const n = 23;
const x = Float64Array.from({ length: n }, () => Math.round(Math.exp(rng.double() * 3) * 100) / 100);
const y = Float64Array.from(x, (v) => 2 + 0.5 * v + Math.round((rng.double() - 0.5) * 400) / 100);
const den = Float64Array.from({ length: n }, () => 1 + Math.round(rng.double() * 900) / 100);
const group = Int32Array.from({ length: n }, (_, i) => (i % 3 === 0 ? 1 : 0));
const data: StatisticData = { n, values: { x, y, numerator: x, denominator: den }, group };

function resampleCounts(seed: string): Int32Array {
  const r = createRng(seed, 'counts');
  const counts = new Int32Array(n);
  // keep every group represented with ≥ 2 copies so two-group statistics stay defined
  for (let k = 0; k < n; k++) counts[uniformIndex(r, n)]++;
  return counts;
}

function expand(values: Float64Array, counts: Int32Array, pick?: (i: number) => boolean): number[] {
  const out: number[] = [];
  for (let i = 0; i < values.length; i++) if (!pick || pick(i)) for (let c = 0; c < counts[i]; c++) out.push(values[i]);
  return out;
}

/** Type-7 quantile of an unsorted list, via jStat.percentile where jStat interpolates (see math.test.ts). */
function type7(values: number[], p: number): number {
  const s = [...values].sort((a, b) => a - b);
  const h = (s.length - 1) * p;
  const lo = Math.floor(h);
  return lo + 1 < s.length ? s[lo] + (h - lo) * (s[lo + 1] - s[lo]) : s[lo];
}

function trimmed(values: number[], trim: number): number {
  // R's mean(x, trim): drop floor(n·trim) from each end.
  const s = [...values].sort((a, b) => a - b);
  const k = Math.floor(s.length * trim);
  return ss.mean(s.slice(k, s.length - k));
}

const cases: { settings: Record<string, unknown>; reference: (c: Int32Array) => number; source: string }[] = [
  { settings: { name: 'mean', column: 'x' }, reference: (c) => ss.mean(expand(x, c)), source: 'simple-statistics mean' },
  { settings: { name: 'median', column: 'x' }, reference: (c) => jStat.median(expand(x, c)), source: 'jStat median' },
  { settings: { name: 'trimmed-mean', column: 'x', trim: 0.1 }, reference: (c) => trimmed(expand(x, c), 0.1), source: "R's mean(trim) rule, simple-statistics mean" },
  { settings: { name: 'quantile', column: 'x', p: 0.3 }, reference: (c) => jStat.percentile(expand(x, c), 0.3), source: 'jStat percentile (type 7)' },
  { settings: { name: 'variance', column: 'x' }, reference: (c) => ss.sampleVariance(expand(x, c)), source: 'simple-statistics sampleVariance' },
  { settings: { name: 'sd', column: 'x' }, reference: (c) => ss.sampleStandardDeviation(expand(x, c)), source: 'simple-statistics sampleStandardDeviation' },
  { settings: { name: 'mad', column: 'x' }, reference: (c) => 1.4826 * ss.medianAbsoluteDeviation(expand(x, c)), source: "simple-statistics medianAbsoluteDeviation × R's 1.4826" },
  { settings: { name: 'iqr', column: 'x' }, reference: (c) => type7(expand(x, c), 0.75) - type7(expand(x, c), 0.25), source: 'type-7 quartiles (as R IQR)' },
  { settings: { name: 'geometric-mean', column: 'x' }, reference: (c) => ss.geometricMean(expand(x, c)), source: 'simple-statistics geometricMean' },
  { settings: { name: 'cv', column: 'x' }, reference: (c) => ss.coefficientOfVariation(expand(x, c)), source: 'simple-statistics coefficientOfVariation' },
  { settings: { name: 'correlation', x: 'x', y: 'y', method: 'pearson' }, reference: (c) => ss.sampleCorrelation(expand(x, c), expand(y, c)), source: 'simple-statistics sampleCorrelation' },
  { settings: { name: 'correlation', x: 'x', y: 'y', method: 'spearman' }, reference: (c) => jStat.spearmancoeff(expand(x, c), expand(y, c)), source: 'jStat spearmancoeff (mid-ranks)' },
  { settings: { name: 'ratio-of-means', numerator: 'x', denominator: 'den' }, reference: (c) => ss.mean(expand(x, c)) / ss.mean(expand(den, c)), source: 'simple-statistics mean' },
  {
    settings: { name: 'mean-difference', column: 'x', group: 'g', levels: ['a', 'b'] },
    reference: (c) => ss.mean(expand(x, c, (i) => group[i] === 0)) - ss.mean(expand(x, c, (i) => group[i] === 1)),
    source: 'simple-statistics mean',
  },
  {
    settings: { name: 'median-difference', column: 'x', group: 'g', levels: ['a', 'b'] },
    reference: (c) => ss.median(expand(x, c, (i) => group[i] === 0)) - ss.median(expand(x, c, (i) => group[i] === 1)),
    source: 'simple-statistics median',
  },
  {
    settings: { name: 'regression-slope', x: 'x', y: 'y' },
    reference: (c) => ss.linearRegression(expand(x, c).map((v, i) => [v, expand(y, c)[i]])).m,
    source: 'simple-statistics linearRegression',
  },
  {
    settings: { name: 'regression-intercept', x: 'x', y: 'y' },
    reference: (c) => ss.linearRegression(expand(x, c).map((v, i) => [v, expand(y, c)[i]])).b,
    source: 'simple-statistics linearRegression',
  },
];

describe('statistics on counts agree with outside libraries on the expanded resample', () => {
  for (const { settings, reference, source } of cases) {
    it(`${settings.name}${settings.method ? ` (${settings.method})` : ''} — ${source}`, () => {
      const def = STATISTICS.get(settings.name as string)!;
      const parsed = def.schema.parse(settings) as { name: string };
      const frozen = Float64Array.from(x);
      const prepared = def.prepare(data, parsed);
      expect(prepared.estimate).toBeCloseTo(reference(new Int32Array(n).fill(1)), 10);
      for (const seed of ['a', 'b', 'c', 'd', 'e']) {
        const counts = resampleCounts(seed);
        const ref = reference(counts);
        const got = prepared.fromCounts(counts, n);
        if (Number.isNaN(ref)) expect(Number.isNaN(got)).toBe(true);
        else expect(got).toBeCloseTo(ref, 9);
      }
      // the input data are not changed
      expect(Array.from(x)).toEqual(Array.from(frozen));
    });
  }

  it('leave-one-out (jackknife) counts work for every statistic: total n − 1', () => {
    for (const { settings, reference } of cases) {
      const def = STATISTICS.get(settings.name as string)!;
      const prepared = def.prepare(data, def.schema.parse(settings) as { name: string });
      const counts = new Int32Array(n).fill(1);
      counts[4] = 0;
      expect(prepared.fromCounts(counts, n - 1)).toBeCloseTo(reference(counts), 9);
    }
  });

  it('the mean has a fast leave-one-out equal to the counts path', () => {
    const def = STATISTICS.get('mean')!;
    const p = def.prepare(data, def.schema.parse({ name: 'mean', column: 'x' }) as { name: string });
    const fast = p.leaveOneOut!();
    const counts = new Int32Array(n).fill(1);
    for (let i = 0; i < n; i++) {
      counts[i] = 0;
      expect(fast[i]).toBeCloseTo(p.fromCounts(counts, n - 1), 12);
      counts[i] = 1;
    }
  });
});
