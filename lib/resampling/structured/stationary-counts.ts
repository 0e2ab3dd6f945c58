/**
 * One stationary-bootstrap resample of a series (Politis & Romano 1994), written as counts.
 *
 * Blocks start at uniform positions 0 … m−1 and have random lengths L = 1 + G with
 * G ~ Geometric(p = 1/ℓ̄) on {0, 1, …}, so E[L] = ℓ̄ (the mean block length) and
 * P(L = k) = p(1 − p)^{k−1}; blocks wrap past the end of the series, and the last is cut so
 * that the resample has exactly m units. The resampled series is stationary, unlike the
 * fixed-block one. This matches R's boot::tsboot(sim = "geom"), whose block lengths are
 * 1 + rgeom(1/l).
 *
 * L is drawn by inversion: L = 1 + ⌊log(1 − u) / log(1 − p)⌋ (Devroye 1986, §X.2), and is
 * 1 when ℓ̄ = 1.
 *
 * Reference: Politis, D. N. & Romano, J. P. (1994), "The stationary bootstrap", Journal of
 * the American Statistical Association 89, 1303–1313; Davison & Hinkley (1997) §8.2.3.
 *
 * `counts` is added to (not cleared). Cost: O(m) plus about 2m/ℓ̄ uniforms.
 */
export function addStationaryCounts(
  units: ArrayLike<number>,
  meanBlockLength: number,
  random: () => number,
  counts: Int32Array,
): void {
  const m = units.length;
  const p = 1 / meanBlockLength;
  const logq = Math.log1p(-p); // −Infinity when p = 1
  let left = m;
  while (left > 0) {
    let pos = Math.floor(random() * m);
    const u = random();
    const length = p >= 1 ? 1 : 1 + Math.floor(Math.log1p(-u) / logq);
    const take = Math.min(length, left);
    for (let j = 0; j < take; j++) {
      counts[units[pos]]++;
      if (++pos === m) pos = 0;
    }
    left -= take;
  }
}
