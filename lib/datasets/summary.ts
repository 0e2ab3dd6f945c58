import type { ColumnMeta, ColumnSummary, NumberSummary } from '@/db/tables/datasets';
import type { ParsedColumn } from './column-builder';

const MAX_DISTINCT = 10_000;
const TOP = 5;

/**
 * Quantile of sorted values, Hyndman & Fan (1996) type 7 — R's default `quantile(x, p)`:
 * h = (n − 1)·p, Q(p) = x[⌊h⌋] + (h − ⌊h⌋)·(x[⌊h⌋ + 1] − x[⌊h⌋]) with 0-based x.
 * Reference: Hyndman, R. J. and Fan, Y. (1996) "Sample quantiles in statistical packages",
 * The American Statistician 50(4), 361–365. Cost O(1). Needs n ≥ 1.
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) throw new RangeError('quantile needs at least one value');
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, n - 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

/**
 * Puts the k-th smallest of a[lo..hi] at a[k], smaller-or-equal values before it and
 * greater-or-equal after (Hoare's selection, "FIND", Communications of the ACM 4(7), 1961,
 * with a median-of-three pivot). Expected cost O(hi − lo); it replaces a full sort so that a
 * 1,000,000-value column is summarised without holding the event loop for a sort's ~100 ms.
 */
export function selectKth(a: Float64Array, k: number, lo = 0, hi = a.length - 1): void {
  while (hi > lo) {
    const mid = (lo + hi) >>> 1;
    // Median of a[lo], a[mid], a[hi] as the pivot value.
    const x = a[lo];
    const y = a[mid];
    const z = a[hi];
    const pivot = x < y ? (y < z ? y : x < z ? z : x) : x < z ? x : y < z ? z : y;
    let i = lo;
    let j = hi;
    while (i <= j) {
      while (a[i] < pivot) i++;
      while (a[j] > pivot) j--;
      if (i <= j) {
        const t = a[i];
        a[i] = a[j];
        a[j] = t;
        i++;
        j--;
      }
    }
    // Now a[lo..j] ≤ pivot ≤ a[i..hi], and a[j+1..i−1] all equal the pivot.
    if (k <= j) hi = j;
    else if (k >= i) lo = i;
    else return;
  }
}

/**
 * Summary of a number column's non-missing values: n, mean, standard deviation (n − 1
 * divisor, as R's sd), minimum, quartiles and median (type 7), maximum. The mean uses
 * Neumaier's compensated sum and the variance a second pass over deviations from it, so
 * large offsets (readings around 10⁶) lose no precision. The quartiles need only six order
 * statistics, found by selection (selectKth) rather than a sort: expected cost O(n).
 */
export function summariseNumbers(values: Float64Array): NumberSummary | null {
  let n = 0;
  for (let i = 0; i < values.length; i++) if (!Number.isNaN(values[i])) n++;
  if (n === 0) return null;
  const xs = new Float64Array(n);
  for (let i = 0, k = 0; i < values.length; i++) if (!Number.isNaN(values[i])) xs[k++] = values[i];
  let sum = 0;
  let c = 0;
  for (let i = 0; i < n; i++) {
    const x = xs[i];
    const t = sum + x;
    c += Math.abs(sum) >= Math.abs(x) ? sum - t + x : x - t + sum;
    sum = t;
  }
  const mean = (sum + c) / n;
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (xs[i] - mean) ** 2;
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < n; i++) {
    if (xs[i] < min) min = xs[i];
    if (xs[i] > max) max = xs[i];
  }
  // Type 7 needs the order statistics ⌊h⌋ and ⌊h⌋ + 1 for each p (h = (n − 1)·p); select them
  // in increasing order, each within the part right of the one before.
  const ks = [...new Set([0.25, 0.5, 0.75].flatMap((p) => [Math.floor((n - 1) * p), Math.min(n - 1, Math.floor((n - 1) * p) + 1)]))].sort((a, b) => a - b);
  let from = 0;
  for (const k of ks) {
    selectKth(xs, k, from, n - 1);
    from = k;
  }
  const q = (p: number) => {
    const h = (n - 1) * p;
    const lo = Math.floor(h);
    return xs[lo] + (h - lo) * (xs[Math.min(lo + 1, n - 1)] - xs[lo]);
  };
  return { kind: 'number', n, mean, sd: n > 1 ? Math.sqrt(ss / (n - 1)) : null, min, q1: q(0.25), median: q(0.5), q3: q(0.75), max };
}

export function summarise(col: ParsedColumn): ColumnSummary {
  if (col.type === 'number') return summariseNumbers(col.values) ?? { kind: 'empty', n: 0 };
  const counts = new Map<string, number>();
  let n = 0;
  let capped = false;
  let min: string | null = null;
  let max: string | null = null;
  for (const v of col.values) {
    if (v === null) continue;
    n++;
    const seen = counts.get(v);
    if (seen !== undefined) counts.set(v, seen + 1);
    else if (counts.size < MAX_DISTINCT) counts.set(v, 1);
    else capped = true;
    if (col.type === 'date') {
      if (min === null || v < min) min = v;
      if (max === null || v > max) max = v;
    }
  }
  if (n === 0) return { kind: 'empty', n: 0 };
  if (col.type === 'date') return { kind: 'date', n, min: min!, max: max!, distinct: counts.size, distinctCapped: capped };
  const top = [...counts.entries()]
    .sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0))
    .slice(0, TOP)
    .map(([value, count]) => ({ value, count }));
  return { kind: 'text', n, distinct: counts.size, distinctCapped: capped, top, ...(col.mostlyNumbers ? { mostlyNumbers: col.mostlyNumbers } : {}) };
}

export function columnMeta(col: ParsedColumn): ColumnMeta {
  return { name: col.name, type: col.type, missing: col.missing, summary: summarise(col) };
}
