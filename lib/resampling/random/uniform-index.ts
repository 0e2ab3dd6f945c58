import type { Rng } from './rng';

/**
 * A uniform integer in [0, n) from 32-bit draws, without bias.
 *
 * Lemire, D. (2019), "Fast random integer generation in an interval", ACM Transactions on
 * Modeling and Computer Simulation 29(1): 3 — multiply a 32-bit uniform u by n and keep the
 * high 32 bits, ⌊u·n / 2³²⌋; reject the rare draws whose low 32 bits fall below
 * 2³² mod n, which makes every index exactly equally likely (the rejection test compares the
 * low part with 2³² mod n directly: the same accept/reject decisions as Lemire's two-step
 * test, which only first checks lo < n to avoid the modulo). The product u·n is exact in a
 * double while n < 2²¹, so MAX_UNIFORM_N bounds the number of units the engine accepts.
 *
 * Cost: one 32-bit draw, plus a redraw with probability below n / 2³².
 *
 * Example: uniformIndex(rng, 6) is one of 0…5, each with probability 1/6.
 */
export const MAX_UNIFORM_N = 2_097_151;

const TWO32 = 4294967296;

export function uniformIndex(rng: Rng, n: number): number {
  const threshold = (TWO32 - n) % n;
  for (;;) {
    const m = (rng.int32() >>> 0) * n;
    const hi = Math.floor(m / TWO32);
    if (m - hi * TWO32 >= threshold) return hi;
  }
}
