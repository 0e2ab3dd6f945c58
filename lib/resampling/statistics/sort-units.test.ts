import { describe, expect, it } from 'vitest';
import { createRng } from '../random/rng';
import { sortByComparison, sortUnits } from './sort-units';

describe('sortUnits', () => {
  it('gives the same order as a stable comparison sort by value, then unit — with ties, −0/+0, subsets of units', () => {
    const rng = createRng('sort-units', 'x');
    const cases: { values: number[]; units?: number[] }[] = [
      { values: [3, 1, 2] },
      { values: [] },
      { values: [5] },
      { values: [0, -0, 0, -0, -1, 1] },
      { values: [2, 2, 2, 1, 1, 3, 3, 3, 3] },
      { values: [-Infinity, 4, Infinity, -Infinity, 0] },
      { values: Array.from({ length: 2000 }, () => rng.int32() % 7) },
      { values: Array.from({ length: 5000 }, () => rng.double() * 100 - 50) },
      { values: [9, 8, 7, 6, 5, 4, 3, 2, 1, 0], units: [9, 1, 4, 4, 0, 7] },
      { values: Array.from({ length: 300 }, () => rng.int32() % 5), units: Array.from({ length: 120 }, () => Math.abs(rng.int32()) % 300) },
      // from 256 keys up the sort runs in WebAssembly (sort-positions.wat): ±0 ties and repeated units there too
      { values: Array.from({ length: 700 }, (_, i) => (i % 3 === 0 ? -0 : i % 3 === 1 ? 0 : rng.int32() % 4)), units: Array.from({ length: 500 }, () => Math.abs(rng.int32()) % 700) },
      { values: Array.from({ length: 256 }, (_, i) => (i * 37) % 11) },
      // the radix sort's integer images: signs, infinities, subnormals, magnitudes far apart, and
      // keys of one magnitude (passes skipped when a byte is the same in every key)
      {
        values: Array.from({ length: 1500 }, (_, i) =>
          [-Infinity, Infinity, -0, 5e-324, -5e-324, 1e308, -1e308, 1, -1][i % 9] + (i % 9 === 7 ? rng.int32() % 3 : 0),
        ),
      },
      { values: Array.from({ length: 3000 }, () => 1024 + (Math.abs(rng.int32()) % 1024) / 8) },
      { values: Array.from({ length: 400 }, () => 7) },
    ];
    for (const c of cases) {
      const fast = sortUnits(c.values, c.units);
      const ref = sortByComparison(c.values, c.units);
      expect(Array.from(fast.order)).toEqual(Array.from(ref.order));
      expect(Array.from(fast.sorted)).toEqual(Array.from(ref.sorted));
    }
    expect(Array.from(sortUnits([3, 1, 2]).order)).toEqual([1, 2, 0]);
  });

  it('falls back to the comparison sort when a value is NaN', () => {
    const values = [2, Number.NaN, 1];
    expect(sortUnits(values)).toEqual(sortByComparison(values));
  });
});
