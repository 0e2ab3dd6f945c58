/**
 * One cluster-bootstrap resample, written as counts; returns the number of rows in it.
 *
 * First stage: draw G clusters with replacement from the G clusters given (each a list of
 * unit indices), keeping every row of each drawn cluster — the clusters, not the rows, are
 * the independent units (subjects with repeated measures, plots, batches).
 * Optional second stage: within each drawn cluster of size m, draw m rows with replacement
 * from that cluster instead of keeping all of them (Davison & Hinkley 1997, §3.8,
 * "strategy 2"; for few rows per cluster the first stage alone is usually preferred, as
 * resampling at both stages adds the within-cluster variance twice).
 *
 * The resample size varies when clusters have unequal sizes; statistics get the total.
 * Reference: Davison, A. C. & Hinkley, D. V. (1997), "Bootstrap Methods and their
 * Application", §3.8; Field, C. A. & Welsh, A. H. (2007), "Bootstrapping clustered data",
 * JRSS B 69, 369–390.
 *
 * `counts` is added to (not cleared). Indices are ⌊u·G⌋ and ⌊u·m⌋ for u = random().
 * Cost: O(rows drawn).
 */
export function addClusterCounts(
  clusters: readonly ArrayLike<number>[],
  random: () => number,
  counts: Int32Array,
  secondStage = false,
): number {
  const G = clusters.length;
  let total = 0;
  for (let g = 0; g < G; g++) {
    const rows = clusters[Math.floor(random() * G)];
    const m = rows.length;
    if (secondStage) {
      for (let j = 0; j < m; j++) counts[rows[Math.floor(random() * m)]]++;
    } else {
      for (let j = 0; j < m; j++) counts[rows[j]]++;
    }
    total += m;
  }
  return total;
}

/**
 * The first stage of addClusterCounts as cluster multiplicities: G draws with replacement
 * from the G clusters, `out[offset + g]` counting how often cluster g was drawn; returns the
 * number of rows in the resample. Exactly the draws addClusterCounts makes (without a second
 * stage), so a caller can expand the multiplicities to row counts in one pass.
 * Cost: O(G).
 */
export function addClusterMultiplicities(clusters: readonly ArrayLike<number>[], random: () => number, out: Int32Array, offset = 0): number {
  const G = clusters.length;
  let total = 0;
  for (let g = 0; g < G; g++) {
    const k = Math.floor(random() * G);
    out[offset + k]++;
    total += clusters[k].length;
  }
  return total;
}
