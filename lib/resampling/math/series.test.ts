import { describe, expect, it } from 'vitest';
import { lag1Autocorrelation } from '../dependence/lag1-autocorrelation';
import { seriesMean } from '../dependence/series-mean';
import { createRng } from '../random/rng';
import { moments } from './moments';
import { loadSeries, SERIES_WASM_MIN } from './series';

// The JavaScript loops the WebAssembly passes stand for (moments.ts, series-mean.ts,
// lag1-autocorrelation.ts, heavy-ties.ts), written out here as the reference: the same terms
// in the same order must give the same bits.
function jsMoments(x: Float64Array) {
  const B = x.length;
  const shift = x[0];
  let s = 0;
  for (let i = 0; i < B; i++) s += x[i] - shift;
  const meanShifted = s / B;
  let m2 = 0;
  let m3 = 0;
  let m4 = 0;
  for (let i = 0; i < B; i++) {
    const d = x[i] - shift - meanShifted;
    const d2 = d * d;
    m2 += d2;
    m3 += d2 * d;
    m4 += d2 * d2;
  }
  const variance = m2 / (B - 1);
  m2 /= B;
  m3 /= B;
  m4 /= B;
  return { mean: shift + meanShifted, variance, skewness: m2 > 0 ? m3 / Math.pow(m2, 1.5) : 0, excessKurtosis: m2 > 0 ? m4 / (m2 * m2) - 3 : 0 };
}

function jsLag1(x: Float64Array): number | null {
  const n = x.length;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += x[i];
  const mean = sum / n;
  let s0 = 0;
  let s1 = 0;
  let here = x[0] - mean;
  for (let t = 0; t < n - 1; t++) {
    const next = x[t + 1] - mean;
    s0 += here * here;
    s1 += here * next;
    here = next;
  }
  s0 += here * here;
  return s0 > 0 ? s1 / n / (s0 / n) : null;
}

function jsRuns(sorted: Float64Array): [number, number] {
  let distinct = 0;
  let top = 0;
  for (let i = 0; i < sorted.length; ) {
    const v = sorted[i];
    let j = i + 1;
    while (j < sorted.length && (sorted[j] === v || (sorted[j] !== sorted[j] && v !== v))) j++;
    distinct++;
    top = Math.max(top, j - i);
    i = j;
  }
  return [distinct, top];
}

describe('one-off passes over a series in WebAssembly (series-sums.wat)', () => {
  const rng = createRng('series', 'x');
  const series = [
    Float64Array.from({ length: SERIES_WASM_MIN }, () => rng.double() * 10 - 3),
    Float64Array.from({ length: 10_001 }, (_, i) => Math.exp(rng.double() * 4) + (i % 7) * 1e-9),
    Float64Array.from({ length: 3000 }, () => 1e12 + Math.round(rng.double() * 5)),
    Float64Array.from({ length: 500 }, (_, i) => Math.sin(i / 10) * 1e-300),
  ];

  it('give the same bits as the JavaScript loops: moments, mean, lag-1 autocorrelation', () => {
    for (const x of series) {
      expect(loadSeries(x)).not.toBeNull();
      const m = moments(x);
      const ref = jsMoments(x);
      expect(m.mean).toBe(ref.mean);
      expect(m.variance).toBe(ref.variance);
      expect(m.skewness).toBe(ref.skewness);
      expect(m.excessKurtosis).toBe(ref.excessKurtosis);
      let sum = 0;
      for (const v of x) sum += v;
      expect(seriesMean(x)).toBe(sum / x.length);
      expect(lag1Autocorrelation(x)).toBe(jsLag1(x));
    }
  });

  it('count runs of equal values as the JavaScript loop does (ties, −0 and +0, NaN)', () => {
    const withTies = Float64Array.from({ length: 2000 }, () => Math.floor(rng.double() * 40) - 20).sort();
    const zeros = Float64Array.from({ length: 300 }, (_, i) => (i % 2 ? 0 : -0)).sort();
    const nans = Float64Array.from({ length: 400 }, (_, i) => (i < 390 ? i % 13 : Number.NaN)).sort();
    for (const s of [withTies, zeros, nans, series[1].slice().sort()]) expect(loadSeries(s)!.runs()).toEqual(jsRuns(s));
  });

  it('report the first value that is not finite, as the loop did', () => {
    const x = Float64Array.from({ length: 1000 }, (_, i) => i);
    x[700] = Number.POSITIVE_INFINITY;
    x[800] = Number.NaN;
    expect(() => seriesMean(x)).toThrow('value 701 is not a finite number');
    x[700] = 1;
    expect(() => seriesMean(x)).toThrow('value 801 is not a finite number');
  });

  it('leave short series to the JavaScript loops', () => {
    expect(loadSeries(new Float64Array(SERIES_WASM_MIN - 1))).toBeNull();
  });
});
