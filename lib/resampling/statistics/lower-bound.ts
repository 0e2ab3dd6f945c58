/**
 * First position p of an ascending array with sorted[p] ≥ v (sorted.length when there is none),
 * by binary search. −0 and +0 compare equal, as with `<`.
 */
export function lowerBound(sorted: ArrayLike<number>, v: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * First position p of an ascending array with sorted[p] > v (sorted.length when there is none),
 * by binary search: sorted[lowerBound(v) … upperBound(v) − 1] are the entries equal to v.
 */
export function upperBound(sorted: ArrayLike<number>, v: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid] <= v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
