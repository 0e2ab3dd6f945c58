import { spawnSync } from 'node:child_process';
import * as ss from 'simple-statistics';
import seedrandom from 'seedrandom';
import { describe, expect, it } from 'vitest';
import { parseCsvText } from './parse';
import { quantileSorted, summarise, summariseNumbers } from './summary';

function r(script: string): string {
  const out = spawnSync('Rscript', ['--vanilla', '-e', script], { encoding: 'utf8' });
  if (out.status !== 0) throw new Error(`Rscript failed: ${out.stderr}`);
  return out.stdout;
}

describe('column summaries', () => {
  it("match R on R's airquality data read from R's own CSV (37 NA in Ozone)", async () => {
    // Source: R's datasets package (airquality), written by R's write.csv with NA for missing;
    // expected values from R: mean, sd, quantile(type = 7), min, max with na.rm = TRUE.
    const csv = r('write.csv(airquality, row.names = FALSE)');
    const expected = r(
      'x <- airquality$Ozone; cat(sum(is.na(x)), sum(!is.na(x)), sprintf("%.17g", c(mean(x, na.rm=TRUE), sd(x, na.rm=TRUE), min(x, na.rm=TRUE), quantile(x, c(.25,.5,.75), na.rm=TRUE, type=7), max(x, na.rm=TRUE))))',
    )
      .trim()
      .split(/\s+/)
      .map(Number);
    const t = await parseCsvText(csv);
    expect(t.rowCount).toBe(153);
    expect(t.columns.map((c) => c.type)).toEqual(['number', 'number', 'number', 'number', 'number', 'number']);
    const ozone = t.columns[0];
    expect(ozone.missing).toBe(expected[0]);
    const s = summarise(ozone);
    if (s.kind !== 'number') throw new Error('expected a number summary');
    expect(s.n).toBe(expected[1]);
    const [mean, sd, min, q1, median, q3, max] = expected.slice(2);
    expect(s.mean).toBeCloseTo(mean, 12);
    expect(s.sd!).toBeCloseTo(sd, 12);
    expect([s.min, s.q1, s.median, s.q3, s.max]).toEqual([min, q1, median, q3, max]);
  });

  it('agree with simple-statistics on random data, and do not change their input', () => {
    // Reference: simple-statistics' mean, sampleStandardDeviation and quantileSorted
    // (R type 7 interpolation for p·(n−1) between order statistics).
    const rng = seedrandom('summaries');
    for (const n of [1, 2, 3, 10, 101, 1000]) {
      const xs = Float64Array.from({ length: n }, () => Math.exp(rng() * 3));
      const frozen = Float64Array.from(xs);
      const s = summariseNumbers(xs)!;
      const sorted = [...xs].sort((a, b) => a - b);
      expect(s.mean).toBeCloseTo(ss.mean([...xs]), 12);
      if (n > 1) expect(s.sd!).toBeCloseTo(ss.sampleStandardDeviation([...xs]), 12);
      else expect(s.sd).toBeNull();
      for (const [p, v] of [[0.25, s.q1], [0.5, s.median], [0.75, s.q3]] as const) expect(v).toBeCloseTo(ss.quantileSorted(sorted, p), 12);
      expect(xs).toEqual(frozen);
    }
  });

  it('keep precision for values with a large common offset', () => {
    // Values 10⁹ + {1, 2, 3}: the naive one-pass formula Σx² − n·x̄² loses every digit here.
    const s = summariseNumbers(new Float64Array([1e9 + 1, 1e9 + 2, 1e9 + 3]))!;
    expect(s.mean).toBe(1e9 + 2);
    expect(s.sd).toBe(1);
  });

  it('interpolate quantiles as R type 7 does on a worked example', () => {
    // R: quantile(c(1, 2, 4, 8), 0.3) = 1 + (0.9 − 0)·(2 − 1) = 1.9  (h = (4 − 1)·0.3 = 0.9)
    expect(quantileSorted([1, 2, 4, 8], 0.3)).toBeCloseTo(1.9, 14);
    expect(quantileSorted([5], 0.9)).toBe(5);
  });

  it('count distinct and most frequent text values, and give the range of dates', async () => {
    const t = await parseCsvText('site,day,v\nup,2026-03-02,1\ndown,2026-03-01,2\nup,2026-03-09,3\nup,,4\n');
    expect(summarise(t.columns[0])).toEqual({ kind: 'text', n: 4, distinct: 2, distinctCapped: false, top: [{ value: 'up', count: 3 }, { value: 'down', count: 1 }] });
    expect(summarise(t.columns[1])).toEqual({ kind: 'date', n: 3, min: '2026-03-01', max: '2026-03-09', distinct: 3, distinctCapped: false });
  });
});

describe('selection', () => {
  it('puts the k-th smallest in place for every k, on data with many ties, and keeps the multiset', async () => {
    const { selectKth } = await import('./summary');
    const rng = seedrandom('select');
    for (const n of [1, 2, 5, 33, 500]) {
      const base = Float64Array.from({ length: n }, () => Math.floor(rng() * 7));
      const sorted = [...base].sort((a, b) => a - b);
      for (let k = 0; k < n; k++) {
        const a = Float64Array.from(base);
        selectKth(a, k);
        expect(a[k]).toBe(sorted[k]);
        for (let i = 0; i < k; i++) expect(a[i]).toBeLessThanOrEqual(a[k]);
        for (let i = k + 1; i < n; i++) expect(a[i]).toBeGreaterThanOrEqual(a[k]);
        expect([...a].sort((x, y) => x - y)).toEqual(sorted);
      }
    }
  });
});
