/**
 * Sorts units by value once, so order statistics of any resample can be read from counts
 * by one scan in sorted order (no sort per replicate). Ties keep unit order (stable).
 * Cost O(n log n). Returns the ascending values and, for each sorted position, its unit.
 *
 * Example: sortUnits([3, 1, 2]) → sorted [1, 2, 3], order [1, 2, 0].
 */
export function sortUnits(values: ArrayLike<number>, units?: ArrayLike<number>): { sorted: Float64Array; order: Int32Array } {
  const m = units ? units.length : values.length;
  const idx = new Array<number>(m);
  for (let i = 0; i < m; i++) idx[i] = units ? units[i] : i;
  idx.sort((a, b) => values[a] - values[b] || a - b);
  const order = Int32Array.from(idx);
  const sorted = new Float64Array(m);
  for (let i = 0; i < m; i++) sorted[i] = values[order[i]];
  return { sorted, order };
}
