import * as z from 'zod/mini';
import { EngineError } from '../errors';
import { columnName } from '../statistics/fields';
import { CHUNK_SIZE } from '../replicates/chunks';
import { tallyArena } from '../random/tally-kernel';
import { sortUnits } from '../statistics/sort-units';
import { type ClusterMedianTables, clusterMeanRunner, clusterMedianRunner } from './cluster-chunks';
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
    const sumTables = s.secondStage ? null : clusterSumTables(ctx, sets, offset);
    const medianTables = s.secondStage || sumTables ? null : clusterMedianTables(ctx, clusterOf);
    // The mean or the median over one set of clusters: multiplicities in WebAssembly memory,
    // where whole chunks of replicates run (cluster-chunks.ts) — the same draws and values as
    // replicate() below.
    const inChunks = sets.length === 1 && (medianTables !== null || (sumTables !== null && !sumTables.group));
    const arena = inChunks ? tallyArena(offset, 0, (medianTables ? 3 * ctx.n : 0) + 4 * offset + 2 * CHUNK_SIZE + 16) : null;
    const multiplicity = arena ? arena.counts : new Int32Array(offset);
    const many = !arena ? null : medianTables ? clusterMedianRunner(multiplicity, medianTables, CHUNK_SIZE) : clusterMeanRunner(multiplicity, sumTables!.sa, sumTables!.na, CHUNK_SIZE);
    const drawn = new Int32Array(Math.max(...sets.map((set) => set.length)));
    const fast = sumTables ? sumsFromTables(sumTables) : medianTables ? medianFromTables(medianTables) : null;
    return {
      description: `cluster bootstrap, the ${clusters.length} clusters of ${s.by} resampled whole${s.secondStage ? ', then rows resampled within each drawn cluster' : ''}${withinGroups ? ', within each group' : ''}`,
      plainResampling: false,
      // the mean's cluster sums cost O(G), and so does the median's, whose scan from the middle
      // walks a few standard errors' worth of rows; the count path O(n)
      workPerReplicate: fast ? 4 * offset : undefined,
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
          // one set's units are 0 … G − 1: drawn straight into their cells (the same draws)
          for (let j = 0; j < sets.length; j++) rng.addCounts(multiplicity, sets[j].length, sets[j].length, sets.length === 1 ? null : setUnits[j]);
          for (let g = 0; g < offset; g++) total += multiplicity[g] * sizeOf[g];
          if (fast) return fast(multiplicity, total);
          for (let i = 0; i < counts.length; i++) counts[i] = multiplicity[clusterOf[i]];
        }
        return ctx.statistic.fromCounts(counts, total);
      },
      ...(many ? { replicateMany: many } : {}),
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
  const t = clusterSumTables(ctx, sets, count);
  return t ? sumsFromTables(t) : null;
}

/** clusterSums' tables, per cluster: the totals and row counts of group 0 (a) and group 1 (b). */
interface ClusterSumTables {
  sa: Float64Array;
  na: Float64Array;
  sb: Float64Array;
  nb: Float64Array;
  /** The difference of means: the group of each row. */
  group: ArrayLike<number> | undefined;
}

function clusterSumTables(ctx: SchemeContext, sets: Int32Array[][], count: number): ClusterSumTables | null {
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
  return { sa, na, sb, nb, group };
}

function sumsFromTables(t: ClusterSumTables): (multiplicity: Int32Array, total: number) => number {
  const { sa, na, sb, nb, group } = t;
  const count = sa.length;
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
 * each with its cluster's number, so the resample's order statistics are read by a scan
 * that adds the cluster multiplicities (a G-entry table) — no row counts built. Same value
 * as the row-count evaluation (R's median convention: the middle value, or the mean of the
 * two middle ones). Null for other statistics.
 *
 * The scan starts at the middle of the sorted values, not at the first: the resample's count
 * below the middle is Σ_g c_g · below_g (below_g = rows of cluster g sorted before the middle,
 * counted once), an O(G) sum, and from there the scan walks down or up to the order statistic
 * it wants — which lies near the middle, a few standard errors of the median away, instead of
 * n/2 positions from the start. Exact: the same position as a scan from the first value.
 */
export function clusterMedian(ctx: SchemeContext, clusterOf: Int32Array): ((multiplicity: Int32Array, total: number) => number) | null {
  const t = clusterMedianTables(ctx, clusterOf);
  return t ? medianFromTables(t) : null;
}

/** clusterMedian's tables (also read by its WebAssembly twin, cluster-chunks.ts); null for other statistics. */
function clusterMedianTables(ctx: SchemeContext, clusterOf: Int32Array): ClusterMedianTables | null {
  if (ctx.statisticName !== 'median') return null;
  const x = ctx.data.values.x;
  if (!x) return null;
  // The engine's one presort (a radix sort in WebAssembly; a comparison sort called from
  // JavaScript cost ~6 ms per thread on a cold start for 10⁴ values). Ties in any order: the
  // resample's order statistics are values, the same whichever tied row comes first.
  const { sorted, order } = sortUnits(x);
  const clusterSorted = Int32Array.from(order, (i) => clusterOf[i]);
  const m = sorted.length;
  const middle = m >> 1;
  let clusters = 0;
  for (let i = 0; i < m; i++) clusters = Math.max(clusters, clusterSorted[i] + 1);
  const below = new Int32Array(clusters);
  const size = new Int32Array(clusters);
  for (let p = 0; p < m; p++) {
    size[clusterSorted[p]]++;
    if (p < middle) below[clusterSorted[p]]++;
  }
  return { sorted, clusterSorted, middle, below, size };
}

function medianFromTables(t: ClusterMedianTables): (multiplicity: Int32Array, total: number) => number {
  const { sorted, clusterSorted, middle, below } = t;
  const m = sorted.length;
  const clusters = below.length;
  return (c, total) => {
    // S(p) = Σ_{q ≤ p} c[clusterSorted[q]], the resample's count up to sorted position p;
    // wanted: the first p with S(p) > r, r the 0-based rank of the (lower) middle value.
    const r = total % 2 === 1 ? (total - 1) / 2 : total / 2 - 1;
    let cum = 0; // S(middle − 1)
    for (let g = 0; g < clusters; g++) cum += c[g] * below[g];
    let p: number;
    if (cum > r) {
      // down: from p = middle − 1 while S(p − 1) > r (S(−1) = 0 ≤ r ends it)
      p = middle - 1;
      for (let w = c[clusterSorted[p]]; cum - w > r; w = c[clusterSorted[p]]) {
        cum -= w;
        p--;
      }
    } else {
      for (p = middle; p < m; p++) {
        cum += c[clusterSorted[p]];
        if (cum > r) break;
      }
    }
    // odd total, or the rank r + 1 falls on the same value: one order statistic
    if (total % 2 === 1 || cum > r + 1) return sorted[p];
    let q = p + 1;
    while (q < m && c[clusterSorted[q]] === 0) q++;
    return (sorted[p] + (q < m ? sorted[q] : sorted[p])) / 2;
  };
}
