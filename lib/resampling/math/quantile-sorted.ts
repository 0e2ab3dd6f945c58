/**
 * Sample quantile of sorted values, Hyndman–Fan type 7 (R's default quantile type).
 *
 *   h = (m − 1)·p (0-based), lo = ⌊h⌋, Q(p) = (1 − f)·x₍lo₎ + f·x₍lo+1₎ with f = h − lo,
 *
 * written as R's quantile.default writes it (no interpolation when the two order statistics
 * are equal), so values agree with R to the last bit. Reference: Hyndman, R. J. & Fan, Y.
 * (1996), "Sample quantiles in statistical packages", The American Statistician 50: 361–365.
 * Cost O(1). `sorted` must be ascending and non-empty.
 *
 * Example: quantileSorted([1, 2, 3, 4], 0.5) = 2.5.
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const m = sorted.length;
  const index = (m - 1) * p;
  const lo = Math.floor(index);
  const a = sorted[lo];
  if (index === lo) return a;
  const b = sorted[lo + 1];
  if (b === a) return a;
  const h = index - lo;
  return (1 - h) * a + h * b;
}
