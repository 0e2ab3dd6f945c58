/**
 * One circular moving-block resample of a series, written as counts.
 *
 * The series is `units` (unit indices in row order, length m). ⌈m/ℓ⌉ blocks of ℓ
 * consecutive units are drawn, each starting at a uniform position 0 … m−1 and wrapping
 * past the end to the start (the circular block bootstrap of Politis & Romano 1992, which
 * gives every unit the same chance to appear); the last block is cut so that the resample
 * has exactly m units. This is what R's boot::tsboot(sim = "fixed") does with its default
 * end correction (endcorr = TRUE).
 *
 * References: Künsch, H. R. (1989), "The jackknife and the bootstrap for general stationary
 * observations", Annals of Statistics 17, 1217–1241; Politis, D. N. & Romano, J. P. (1992),
 * "A circular block-resampling procedure for stationary data", in Exploring the Limits of
 * Bootstrap, Wiley, 263–270; Davison & Hinkley (1997) §8.2.3.
 *
 * `counts` is added to (not cleared), so strata can share one array. Start positions are
 * ⌊u·m⌋ for u = random() in [0, 1). Cost: O(m) plus ⌈m/ℓ⌉ draws.
 */
export function addMovingBlockCounts(
  units: ArrayLike<number>,
  blockLength: number,
  random: () => number,
  counts: Int32Array,
): void {
  const m = units.length;
  let left = m;
  while (left > 0) {
    let pos = Math.floor(random() * m);
    const take = Math.min(blockLength, left);
    for (let j = 0; j < take; j++) {
      counts[units[pos]]++;
      if (++pos === m) pos = 0;
    }
    left -= take;
  }
}

/** Number of blocks in one moving-block resample of m units: ⌈m/ℓ⌉. */
export function blockCount(m: number, blockLength: number): number {
  return Math.ceil(m / blockLength);
}

/**
 * addMovingBlockCounts with the block starts given (blockCount(m, ℓ) of them, each in
 * 0 … m−1) — for callers that draw the starts in bulk with their own generator.
 */
export function addMovingBlockCountsFromStarts(units: ArrayLike<number>, blockLength: number, starts: ArrayLike<number>, counts: Int32Array): void {
  const m = units.length;
  let left = m;
  for (let b = 0; left > 0; b++) {
    let pos = starts[b];
    const take = Math.min(blockLength, left);
    for (let j = 0; j < take; j++) {
      counts[units[pos]]++;
      if (++pos === m) pos = 0;
    }
    left -= take;
  }
}
