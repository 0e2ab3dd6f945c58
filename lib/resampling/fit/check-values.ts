import { FitError } from './fit-error';

/**
 * Shared input policy of the maximum-likelihood fits: at least one value, all finite.
 * Names the 1-based position of the first bad value. Does not change `x`.
 */
export function checkValues(x: ArrayLike<number>, family: string): void {
  if (x.length === 0) throw new FitError('empty', `the ${family} fit needs at least one value`);
  for (let i = 0; i < x.length; i++) {
    if (!Number.isFinite(x[i])) throw new FitError('non-finite', `is not a finite number (${family} fit)`, i);
  }
}
