import { describe, expect, it } from 'vitest';
import { lowerBound, upperBound } from './lower-bound';

describe('lowerBound / upperBound', () => {
  it('bracket the entries equal to v, as a linear scan counts them (ties, −0/+0, ends)', () => {
    const sorted = [-3, -1, -0, 0, 0, 2, 2, 2, 5];
    for (const v of [-4, -3, -2, -1, 0, 1, 2, 3, 5, 6]) {
      expect(lowerBound(sorted, v)).toBe(sorted.filter((x) => x < v).length);
      expect(upperBound(sorted, v)).toBe(sorted.filter((x) => x <= v).length);
    }
    expect(lowerBound([], 1)).toBe(0);
    expect(upperBound([], 1)).toBe(0);
  });
});
