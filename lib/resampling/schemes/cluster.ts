import * as z from 'zod/mini';
import { EngineError } from '../errors';
import { columnName } from '../statistics/fields';
import { strataFromKeys } from './counting';
import { defineScheme, type SchemeContext } from './types';

/**
 * Cluster bootstrap: whole clusters (the values of the `by` column — subjects, plots,
 * batches) are drawn with replacement and every row of a drawn cluster is kept, so
 * dependence among rows of one cluster is preserved (Davison & Hinkley 1997, §3.8).
 * `secondStage: true` also resamples rows within each drawn cluster. For a two-group
 * statistic whose clusters each lie in one group, clusters are drawn within each group
 * (the number of clusters per group stays fixed); clusters that span both groups are drawn
 * from all clusters together.
 */
const schema = z.strictObject({
  name: z.literal('cluster'),
  by: columnName,
  secondStage: z._default(z.boolean({ error: 'secondStage must be true or false' }), false),
});

export const cluster = defineScheme({
  name: 'cluster',
  schema,
  labelColumns: (s) => [{ column: s.by, path: 'scheme.by' }],
  prepare(ctx, s) {
    const labels = ctx.labels(s.by);
    const clusters = strataFromKeys(labels);
    if (clusters.length < 2) {
      throw new EngineError('invalid:data', `column "${s.by}" has only one cluster ("${labels[0]}"); the cluster scheme needs at least two (better, a dozen or more)`, 'scheme.by');
    }
    const groups = ctx.statistic.groups;
    let sets: Int32Array[][] = [clusters];
    let withinGroups = false;
    if (groups) {
      const spans = clusters.some((rows) => rows.some((r) => groups[r] !== groups[rows[0]]));
      if (!spans) {
        sets = [0, 1].map((g) => clusters.filter((rows) => groups[rows[0]] === g));
        withinGroups = true;
        sets.forEach((set, g) => {
          if (set.length < 2) {
            throw new EngineError('invalid:data', `group "${ctx.groupLevels?.[g] ?? g}" has only ${set.length} cluster${set.length === 1 ? '' : 's'} of "${s.by}"; the cluster scheme needs at least two in each group`, 'scheme.by');
          }
        });
      }
    }
    const counts = new Int32Array(ctx.n);
    const sizes = clusters.map((c) => c.length);
    // Clusters are numbered across the sets (set j's clusters from setOffset[j]); every row
    // of cluster g gets the cluster's multiplicity, so under the first stage alone the row
    // counts are one gather pass over a G-entry table.
    const clusterOf = new Int32Array(ctx.n);
    const setOffset: number[] = [];
    const setUnits: Int32Array[] = [];
    let offset = 0;
    for (const set of sets) {
      setOffset.push(offset);
      setUnits.push(Int32Array.from(set, (_, k) => offset + k));
      set.forEach((rows, k) => rows.forEach((r) => (clusterOf[r] = offset + k)));
      offset += set.length;
    }
    const sizeOf = Int32Array.from(sets.flat(), (rows) => rows.length);
    const multiplicity = new Int32Array(offset);
    const drawn = new Int32Array(Math.max(...sets.map((set) => set.length)));
    const fast = s.secondStage ? null : (clusterSums(ctx, sets, offset) ?? clusterMedian(ctx, clusterOf));
    return {
      description: `cluster bootstrap, the ${clusters.length} clusters of ${s.by} resampled whole${s.secondStage ? ', then rows resampled within each drawn cluster' : ''}${withinGroups ? ', within each group' : ''}`,
      plainResampling: false,
      // the mean's cluster sums cost O(G); the median's scan and the count path O(n)
      workPerReplicate: fast && ctx.statisticName !== 'median' ? 4 * offset : undefined,
      details: { by: s.by, clusters: clusters.length, secondStage: s.secondStage, withinGroups, smallestCluster: Math.min(...sizes), largestCluster: Math.max(...sizes) },
      replicate(rng) {
        // Draws: G uniform cluster indices per set by the engine's unbiased bulk draws
        // (Rng.addCounts / fillIndices, Lemire's method); with a second stage, m row indices
        // within each drawn cluster, in draw order.
        let total = 0;
        if (s.secondStage) {
          counts.fill(0);
          for (const set of sets) {
            const G = set.length;
            rng.fillIndices(drawn, 0, G, G);
            for (let j = 0; j < G; j++) {
              const rows = set[drawn[j]];
              rng.addCounts(counts, rows.length, rows.length, rows);
              total += rows.length;
            }
          }
        } else {
          multiplicity.fill(0);
          for (let j = 0; j < sets.length; j++) rng.addCounts(multiplicity, sets[j].length, sets[j].length, setUnits[j]);
          for (let g = 0; g < offset; g++) total += multiplicity[g] * sizeOf[g];
          if (fast) return fast(multiplicity, total);
          for (let i = 0; i < counts.length; i++) counts[i] = multiplicity[clusterOf[i]];
        }
        return ctx.statistic.fromCounts(counts, total);
      },
    };
  },
});

/**
 * Fast path for the mean and the difference of means under first-stage cluster resampling:
 * with cluster totals S_g and sizes m_g (per group), the resample mean is
 * Σ c_g S_g / Σ c_g m_g for cluster multiplicities c_g — O(G) per replicate instead of O(n),
 * the same value as the row-count evaluation up to the order of the additions. Null for
 * other statistics.
 */
export function clusterSums(ctx: SchemeContext, sets: Int32Array[][], count: number): ((multiplicity: Int32Array, total: number) => number) | null {
  const name = ctx.statisticName;
  if (name !== 'mean' && name !== 'mean-difference') return null;
  const x = ctx.data.values.x;
  const group = name === 'mean-difference' ? ctx.data.group : undefined;
  if (!x || (name === 'mean-difference' && !group)) return null;
  const sa = new Float64Array(count);
  const na = new Float64Array(count);
  const sb = new Float64Array(count);
  const nb = new Float64Array(count);
  let k = 0;
  for (const set of sets) {
    for (const rows of set) {
      for (let j = 0; j < rows.length; j++) {
        const r = rows[j];
        if (group && group[r] === 1) {
          sb[k] += x[r];
          nb[k]++;
        } else {
          sa[k] += x[r];
          na[k]++;
        }
      }
      k++;
    }
  }
  if (!group) {
    return (c) => {
      let s = 0;
      let m = 0;
      for (let g = 0; g < count; g++) {
        s += c[g] * sa[g];
        m += c[g] * na[g];
      }
      return s / m;
    };
  }
  return (c) => {
    let s1 = 0;
    let m1 = 0;
    let s2 = 0;
    let m2 = 0;
    for (let g = 0; g < count; g++) {
      const w = c[g];
      s1 += w * sa[g];
      m1 += w * na[g];
      s2 += w * sb[g];
      m2 += w * nb[g];
    }
    return s1 / m1 - s2 / m2;
  };
}

/**
 * Fast path for the median under first-stage cluster resampling: the values sorted once,
 * each with its cluster's number, so the resample's order statistics are read by one scan
 * that adds the cluster multiplicities (a G-entry table) — no row counts built. Same value
 * as the row-count evaluation (R's median convention: the middle value, or the mean of the
 * two middle ones). Null for other statistics.
 */
export function clusterMedian(ctx: SchemeContext, clusterOf: Int32Array): ((multiplicity: Int32Array, total: number) => number) | null {
  if (ctx.statisticName !== 'median') return null;
  const x = ctx.data.values.x;
  if (!x) return null;
  const order = Int32Array.from(x, (_, i) => i).sort((a, b) => x[a] - x[b]);
  const sorted = Float64Array.from(order, (i) => x[i]);
  const clusterSorted = Int32Array.from(order, (i) => clusterOf[i]);
  const m = sorted.length;
  /** value at 0-based rank r of the resample, and (when wanted) at r + 1 */
  const at = (c: Int32Array, r: number, pair: boolean): number => {
    let cum = 0;
    let p = 0;
    for (; p < m; p++) {
      cum += c[clusterSorted[p]];
      if (cum > r) break;
    }
    if (!pair || cum > r + 1) return sorted[p];
    let q = p + 1;
    while (q < m && c[clusterSorted[q]] === 0) q++;
    return (sorted[p] + (q < m ? sorted[q] : sorted[p])) / 2;
  };
  return (c, total) => (total % 2 === 1 ? at(c, (total - 1) / 2, false) : at(c, total / 2 - 1, true));
}
