import * as z from 'zod';
import { EngineError } from '../errors';
import { columnName } from '../statistics/fields';
import { addClusterCounts, addClusterMultiplicities } from '../structured/cluster-counts';
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
  secondStage: z.boolean({ error: 'secondStage must be true or false' }).default(false),
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
    // First stage only: every row of cluster g gets the cluster's multiplicity, so the row
    // counts are one gather pass over a G-entry table (same draws as addClusterCounts).
    const clusterOf = new Int32Array(ctx.n);
    const setOffset: number[] = [];
    let offset = 0;
    for (const set of sets) {
      setOffset.push(offset);
      set.forEach((rows, k) => rows.forEach((r) => (clusterOf[r] = offset + k)));
      offset += set.length;
    }
    const multiplicity = new Int32Array(offset);
    const sums = s.secondStage ? null : clusterSums(ctx, sets, offset);
    return {
      description: `cluster bootstrap, the ${clusters.length} clusters of ${s.by} resampled whole${s.secondStage ? ', then rows resampled within each drawn cluster' : ''}${withinGroups ? ', within each group' : ''}`,
      plainResampling: false,
      details: { by: s.by, clusters: clusters.length, secondStage: s.secondStage, withinGroups, smallestCluster: Math.min(...sizes), largestCluster: Math.max(...sizes) },
      replicate(rng) {
        const random = () => rng.double();
        let total = 0;
        if (s.secondStage) {
          counts.fill(0);
          for (const set of sets) total += addClusterCounts(set, random, counts, true);
        } else {
          multiplicity.fill(0);
          sets.forEach((set, j) => (total += addClusterMultiplicities(set, random, multiplicity, setOffset[j])));
          if (sums) return sums(multiplicity);
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
export function clusterSums(ctx: SchemeContext, sets: Int32Array[][], count: number): ((multiplicity: Int32Array) => number) | null {
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
