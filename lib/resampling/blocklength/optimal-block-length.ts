import { autocovariance } from '../dependence/autocovariance';
import { BlockLengthError } from './block-length-error';
import { blockLengthFromAutocovariances } from './block-length-from-autocovariances';

export interface OptimalBlockLength {
  /** expected (mean) block length for the stationary bootstrap, capped, ≥ 1, not rounded */
  stationary: number;
  /** block length for the circular / moving-block bootstrap, capped, ≥ 1, not rounded */
  circular: number;
  /** the uncapped plug-in values, for diagnostics */
  raw: { stationary: number; circular: number };
  /** m̂ from the empirical rule, the bandwidth M = min(2m̂, m_max), and the cap b_max */
  mHat: number;
  M: number;
  cap: number;
  /** true when a value hit the cap or the floor of 1 */
  capped: boolean;
}

export interface OptimalBlockLengthOptions {
  /** constant of the significance band c·√(log10 n / n); default 2 (Politis & White 2004 §3.2) */
  c?: number;
}

/**
 * Automatic block length for the stationary and the circular (moving-) block bootstrap of a
 * series' mean: Politis & White (2004) with the Patton, Politis & White (2009) correction.
 *
 * Steps (notation of the paper):
 *  1. Sample autocorrelations ρ̂(k) (divisor n, see `autocovariance`).
 *  2. m̂ = the smallest positive m such that |ρ̂(m + k)| < c·√(log10 n / n) for all
 *     k = 1 … K_N, with c = 2 and K_N = max(5, ⌈√log10 n⌉). Lags are searched up to
 *     m_max = ⌈√n⌉ + K_N (as in the authors' own code); if no such m exists, m̂ is the
 *     largest lag ≤ m_max whose ρ̂ is outside the band.
 *  3. Bandwidth M = min(2 m̂, m_max); spectral sums with the flat-top lag window and the
 *     plug-in formulas of `blockLengthFromAutocovariances`.
 *  4. Cap: b ≤ b_max = ⌈min(3√n, n/3)⌉ (the cap in Patton's published code, from memory),
 *     and floor b ≥ 1. A block longer than n/3 leaves too few distinct blocks to resample.
 *
 * The circular and moving-block bootstraps share the same asymptotic MSE, so `circular`
 * serves both. The uncapped ratio circular/stationary is always (3/2)^{1/3} ≈ 1.145.
 *
 * Cost: O(n · m_max) = O(n^{3/2}) for the autocovariances. Does not change `x`.
 * Throws BlockLengthError for fewer than 10 values, non-finite values or a constant series.
 *
 * References: Politis & White (2004), Econometric Reviews 23(1), 53–70; Patton, Politis &
 * White (2009), Econometric Reviews 28(4), 372–375.
 *
 * @example optimalBlockLength(nitrateDaily).circular // → e.g. 7.3 (round it for a block length)
 */
export function optimalBlockLength(x: ArrayLike<number>, options: OptimalBlockLengthOptions = {}): OptimalBlockLength {
  const n = x.length;
  if (n < 10) throw new BlockLengthError('too-short', `automatic block length needs at least 10 values in the series, got ${n}`);
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(x[i])) throw new BlockLengthError('non-finite', `value ${i + 1} of the series is not a finite number`);
  }
  const c = options.c ?? 2;
  const KN = Math.max(5, Math.ceil(Math.sqrt(Math.log10(n))));
  const mMax = Math.min(Math.ceil(Math.sqrt(n)) + KN, n - 1);
  const acov = autocovariance(x, mMax);
  if (!(acov[0] > 0)) throw new BlockLengthError('constant', 'the series is constant: no block length can be chosen');
  const band = c * Math.sqrt(Math.log10(n) / n);
  const insignificant = (lag: number) => Math.abs(acov[lag] / acov[0]) < band;

  let mHat = 0;
  for (let m = 1; m + KN <= mMax; m++) {
    let all = true;
    for (let k = 1; k <= KN; k++) {
      if (!insignificant(m + k)) {
        all = false;
        break;
      }
    }
    if (all) {
      mHat = m;
      break;
    }
  }
  if (mHat === 0) {
    for (let lag = mMax; lag >= 1; lag--) {
      if (!insignificant(lag)) {
        mHat = lag;
        break;
      }
    }
    if (mHat === 0) mHat = 1;
  }
  const M = Math.min(2 * mHat, mMax);
  const raw = blockLengthFromAutocovariances(acov, M, n);
  const cap = Math.ceil(Math.min(3 * Math.sqrt(n), n / 3));
  const clamp = (b: number) => (Number.isFinite(b) ? Math.min(Math.max(b, 1), cap) : cap);
  const stationary = clamp(raw.stationary);
  const circular = clamp(raw.circular);
  return {
    stationary,
    circular,
    raw: { stationary: raw.stationary, circular: raw.circular },
    mHat,
    M,
    cap,
    capped: stationary !== raw.stationary || circular !== raw.circular,
  };
}
