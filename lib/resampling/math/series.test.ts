import { describe, expect, it, vi } from 'vitest';
import { lag1Autocorrelation } from '../dependence/lag1-autocorrelation';
import { seriesMean } from '../dependence/series-mean';
import { heavyTies } from '../diagnostics/heavy-ties';
import type { DiagnosticContext } from '../diagnostics/types';
import { prepare } from '../index';
import { createRng } from '../random/rng';
import { moments } from './moments';
import { loadSeries, SERIES_WASM_MIN } from './series';

// Every caller of loadSeries keeps its JavaScript loop for when it returns null; with
// `js.only` set, it does, so each function's two paths can be compared on the same input.
const js = vi.hoisted(() => ({ only: false }));
vi.mock('./series', async (importOriginal) => {
  const actual = await importOriginal<typeof import('./series')>();
  return { ...actual, loadSeries: (x: ArrayLike<number>) => (js.only ? null : actual.loadSeries(x)) };
});

/** f in WebAssembly, then f with the JavaScript loops. */
function bothWays<T>(f: () => T): [T, T] {
  js.only = false;
  const inWasm = f();
  js.only = true;
  try {
    return [inWasm, f()];
  } finally {
    js.only = false;
  }
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
      const [m, mJs] = bothWays(() => moments(x));
      expect(m).toEqual(mJs);
      const [mean, meanJs] = bothWays(() => seriesMean(x));
      expect(mean).toBe(meanJs);
      const [r1, r1Js] = bothWays(() => lag1Autocorrelation(x));
      expect(r1).toBe(r1Js);
    }
  });

  it('count runs of equal values as the JavaScript loop does (heavy ties), and NaN and ±0 as equals', () => {
    const x = Array.from({ length: 2000 }, () => Math.floor(rng.double() * 40) / 4 - 5);
    const problem = prepare({ data: { x }, statistic: { name: 'median', column: 'x' }, B: 100, seed: 's' });
    const [w, wJs] = bothWays(() => heavyTies({ problem } as DiagnosticContext));
    expect(w?.message).toContain('40 distinct values in 2000 rows');
    expect(w).toEqual(wJs);
    // −0 sorts before +0 and equals it; NaN sorts last and equals NaN
    const zeros = Float64Array.from({ length: 300 }, (_, i) => (i < 150 ? (i % 2 ? 0 : -0) : i < 290 ? 1 : Number.NaN)).sort();
    expect(loadSeries(zeros)!.runs()).toEqual([3, 150]);
  });

  it('report the first value that is not finite, as the loop did', () => {
    const x = Float64Array.from({ length: 1000 }, (_, i) => i);
    x[700] = Number.POSITIVE_INFINITY;
    x[800] = Number.NaN;
    expect(() => seriesMean(x)).toThrow('value 701 is not a finite number');
    js.only = true;
    expect(() => seriesMean(x)).toThrow('value 701 is not a finite number');
    js.only = false;
    x[700] = 1;
    expect(() => seriesMean(x)).toThrow('value 801 is not a finite number');
  });

  it('leave short series to the JavaScript loops', () => {
    expect(loadSeries(new Float64Array(SERIES_WASM_MIN - 1))).toBeNull();
  });
});
