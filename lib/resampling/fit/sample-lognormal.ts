import { fillNormal } from './sample-normal';

/**
 * Fills `out` with independent lognormal draws: exp(meanlog + sdlog·Z), Z standard normal
 * by Box–Muller (see fillNormal). Deterministic for a given source. Cost: O(length).
 */
export function fillLognormal(out: Float64Array, meanlog: number, sdlog: number, random: () => number): Float64Array {
  fillNormal(out, meanlog, sdlog, random);
  for (let i = 0; i < out.length; i++) out[i] = Math.exp(out[i]);
  return out;
}
