import * as z from 'zod';
import { EngineError } from '../errors';
import { columnName } from '../statistics/fields';
import { addClusterCounts } from '../structured/cluster-counts';
import { strataFromKeys } from './counting';
import { defineScheme } from './types';

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
    return {
      description: `cluster bootstrap, the ${clusters.length} clusters of ${s.by} resampled whole${s.secondStage ? ', then rows resampled within each drawn cluster' : ''}${withinGroups ? ', within each group' : ''}`,
      plainResampling: false,
      details: { by: s.by, clusters: clusters.length, secondStage: s.secondStage, withinGroups, smallestCluster: Math.min(...sizes), largestCluster: Math.max(...sizes) },
      replicate(rng) {
        counts.fill(0);
        let total = 0;
        for (const set of sets) total += addClusterCounts(set, () => rng.double(), counts, s.secondStage);
        return ctx.statistic.fromCounts(counts, total);
      },
    };
  },
});
