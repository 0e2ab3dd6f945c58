/**
 * Block bootstraps of a mean without counts: with prefix sums of the centred series laid
 * out twice (so a block that wraps past the end is one difference), each drawn block adds
 * its sum in O(1), and a resample mean costs O(number of blocks) instead of O(n).
 *
 * The random draws are exactly those of addMovingBlockCounts / addStationaryCounts (start,
 * then — stationary only — length, block after block), so both paths see the same
 * resamples; the means agree up to the order of the additions. Centring on the series mean
 * before summing keeps the prefix sums small and the differences accurate.
 */
export interface BlockSums {
  /** series mean x̄ */
  mean: number;
  /** P[k] = Σ_{j<k} (x_{j mod m} − x̄), k = 0 … 2m */
  prefix: Float64Array;
  m: number;
}

export function blockSums(x: ArrayLike<number>, units: ArrayLike<number>): BlockSums {
  const m = units.length;
  let s = 0;
  for (let j = 0; j < m; j++) s += x[units[j]];
  const mean = s / m;
  const prefix = new Float64Array(2 * m + 1);
  for (let k = 0; k < 2 * m; k++) prefix[k + 1] = prefix[k] + (x[units[k % m]] - mean);
  return { mean, prefix, m };
}

/** Mean of one circular moving-block resample (blocks of length l) of the series. */
export function movingBlockMean(b: BlockSums, l: number, random: () => number): number {
  const { prefix, m } = b;
  let left = m;
  let s = 0;
  while (left > 0) {
    const pos = Math.floor(random() * m);
    const take = Math.min(l, left);
    s += prefix[pos + take] - prefix[pos];
    left -= take;
  }
  return b.mean + s / m;
}

/** movingBlockMean with the block starts given (⌈m/l⌉ of them, each in 0 … m−1). */
export function movingBlockMeanFromStarts(b: BlockSums, l: number, starts: ArrayLike<number>): number {
  const { prefix, m } = b;
  let left = m;
  let s = 0;
  for (let k = 0; left > 0; k++) {
    const pos = starts[k];
    const take = Math.min(l, left);
    s += prefix[pos + take] - prefix[pos];
    left -= take;
  }
  return b.mean + s / m;
}

/** Mean of one stationary-bootstrap resample (geometric block lengths, mean l) of the series. */
export function stationaryMean(b: BlockSums, l: number, random: () => number): number {
  const { prefix, m } = b;
  const p = 1 / l;
  const logq = Math.log1p(-p);
  let left = m;
  let s = 0;
  while (left > 0) {
    const pos = Math.floor(random() * m);
    const u = random();
    const length = p >= 1 ? 1 : 1 + Math.floor(Math.log1p(-u) / logq);
    const take = Math.min(length, left);
    s += prefix[pos + take] - prefix[pos];
    left -= take;
  }
  return b.mean + s / m;
}
