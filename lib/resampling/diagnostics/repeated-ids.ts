import { repeatedIds } from '../dependence';
import type { Diagnostic } from './types';

/** Numeric columns are only taken for ids when their name says so (else any ties would count). */
const ID_NAME = /(^|[^a-z])(id|ids|subject|patient|participant|site|station|batch|lot|plot|cluster|unit|animal|household|school|well)([^a-z]|$)|_id$|Id$/i;

/**
 * Repeated ids: a column the computation does not use whose values look like cluster ids
 * (text labels, or numbers in a column named like an id; at least 5 distinct ids, some on
 * several rows — see dependence/repeatedIds). Rows sharing an id (repeated measures on one
 * subject, samples from one site) are usually correlated, and resampling rows understates
 * the SE; the cluster scheme resamples whole ids. Silent under the cluster scheme.
 */
export const repeatedIdColumns: Diagnostic = ({ problem }) => {
  const req = problem.request;
  if (req.scheme.name === 'cluster') return null;
  const used = new Set<string>(problem.usedColumns ?? []);
  const data = req.data as Record<string, unknown[]>;
  for (const [column, cells] of Object.entries(data)) {
    if (used.has(column) || !Array.isArray(cells) || cells.length === 0) continue;
    const picked = Array.from(problem.rows, (r) => cells[r]);
    const textual = picked.filter((v) => typeof v === 'string').length >= picked.length / 2;
    if (!textual && !ID_NAME.test(column)) continue;
    const r = repeatedIds(picked.map((v) => (typeof v === 'string' || typeof v === 'number' ? v : null)));
    if (!r.clusterLike || r.distinct === r.n) continue;
    return {
      code: 'repeated-ids',
      message: `Column ${column} has ${r.distinct} distinct values, ${r.repeated} of them on more than one row (up to ${r.maxCount}). If rows that share a ${column} are related (repeated measures, one site or batch), they are not independent: use the cluster scheme with by: "${column}" so that whole ${column} groups are resampled.`,
    };
  }
  return null;
};
