export interface RepeatedIds {
  /** number of rows looked at (missing values — null, undefined, '' — are skipped) */
  n: number;
  /** number of distinct ids */
  distinct: number;
  /** number of ids that occur on more than one row */
  repeated: number;
  /** largest number of rows sharing one id */
  maxCount: number;
  /** mean rows per id, n / distinct */
  meanCount: number;
  /**
   * The column looks like cluster ids (subjects, plots, batches): at least 5 distinct ids
   * and at least one of them on several rows. A column with fewer levels is more likely a
   * treatment or stratum label than a sample of clusters — a rule of thumb (common
   * practice: cluster resampling needs a fair number of clusters to mean anything).
   */
  clusterLike: boolean;
}

/**
 * Counts repeated ids in a column (strings or numbers compared by their text form).
 *
 * Why: rows sharing an id (repeated measures on a subject, samples from one site) are not
 * independent; resampling rows then understates the standard error, and the `cluster`
 * scheme (resample whole ids) is the usual remedy.
 *
 * Cost: O(n) with a Map. Does not change `values`.
 *
 * @example repeatedIds(['s1', 's1', 's2', 's3', 's3', 's4', 's5']).repeated // → 2
 */
export function repeatedIds(values: ArrayLike<string | number | null | undefined>): RepeatedIds {
  const counts = new Map<string, number>();
  let n = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v === null || v === undefined || v === '') continue;
    const key = String(v);
    counts.set(key, (counts.get(key) ?? 0) + 1);
    n++;
  }
  let repeated = 0;
  let maxCount = 0;
  for (const c of counts.values()) {
    if (c > 1) repeated++;
    if (c > maxCount) maxCount = c;
  }
  const distinct = counts.size;
  return {
    n,
    distinct,
    repeated,
    maxCount,
    meanCount: distinct > 0 ? n / distinct : 0,
    clusterLike: distinct >= 5 && repeated > 0,
  };
}
