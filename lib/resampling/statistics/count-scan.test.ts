import { describe, expect, it } from 'vitest';
import { prepare } from '../index';
import { createRng } from '../random/rng';
import { tallyArena } from '../random/tally-kernel';
import { medianFromCounts, quantileFromCounts, rankValue } from './count-scan';
import { sortUnits } from './sort-units';

describe('order statistics from counts: the WebAssembly scan (count-scan.wat) and the JavaScript one agree', () => {
  it('on resamples with ties, empty cells, every rank and odd and even totals', () => {
    const rng = createRng('count-scan', 'x');
    for (const n of [256, 257, 1000, 4099]) {
      // values with many ties (a tenth of n distinct), in random unit order
      const values = Array.from({ length: n }, () => Math.abs(rng.int32()) % Math.max(2, n / 10));
      const { sorted, order } = sortUnits(values);
      const arena = tallyArena(n);
      expect(arena).not.toBeNull();
      const inWasm = arena!.counts;
      const inJs = new Int32Array(n);
      for (let rep = 0; rep < 20; rep++) {
        inWasm.fill(0);
        // total n (odd or even with n) or n + 1, and some resamples of fewer draws
        const total = rep % 5 === 4 ? Math.max(1, n >> 3) : n + (rep % 2);
        rng.addCounts(inWasm, n, total, null);
        inJs.set(inWasm);
        expect(medianFromCounts(sorted, order, inWasm, total)).toBe(medianFromCounts(sorted, order, inJs, total));
        for (const p of [0, 0.025, 0.25, 0.5, 0.975, 1]) {
          expect(quantileFromCounts(sorted, order, inWasm, total, p)).toBe(quantileFromCounts(sorted, order, inJs, total, p));
        }
        for (const r of [0, 1, total >> 1, total - 2, total - 1]) {
          if (r >= 0) expect(rankValue(sorted, order, inWasm, r)).toBe(rankValue(sorted, order, inJs, r));
        }
      }
    }
  });
});

describe('whole chunks of a median or quantile in WebAssembly (orderChunk in count-scan.wat)', () => {
  it('give the replicates one at a time gives, and leave the random streams alike', () => {
    const rng = createRng('order-chunk', 'data');
    const cases: [number, number | null][] = [[256, null], [257, null], [1000, 0.25], [1001, 0.9], [4099, null], [600, 0], [600, 1], [777, 0.5]];
    for (const [n, p] of cases) {
      // ties: values on a grid of n/5 points
      const x = Array.from({ length: n }, () => Math.round(rng.double() * (n / 5)) / 7);
      const statistic = p === null ? { name: 'median', column: 'x' } : { name: 'quantile', column: 'x', p };
      const problem = prepare({ data: { x }, statistic, B: 1000, seed: 's' });
      expect(problem.scheme.replicateMany, `n = ${n}`).toBeDefined();
      const a = createRng('order-chunk', `n${n}`);
      const b = createRng('order-chunk', `n${n}`);
      const one = Float64Array.from({ length: 300 }, () => problem.scheme.replicate(a));
      const many = new Float64Array(310).fill(-1);
      expect(problem.scheme.replicateMany!(b, many, 10, 300)).toBe(true);
      expect(Array.from(many.subarray(10)), `n = ${n}, p = ${p}`).toEqual(Array.from(one));
      expect(many[9]).toBe(-1);
      expect(problem.scheme.replicate(b)).toBe(problem.scheme.replicate(a));
      // more than a chunk at once: declined, nothing drawn
      expect(problem.scheme.replicateMany!(b, new Float64Array(2000), 0, 2000)).toBe(false);
      expect(problem.scheme.replicate(b)).toBe(problem.scheme.replicate(a));
    }
  });
});
