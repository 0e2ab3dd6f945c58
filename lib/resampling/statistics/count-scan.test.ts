import { describe, expect, it } from 'vitest';
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
