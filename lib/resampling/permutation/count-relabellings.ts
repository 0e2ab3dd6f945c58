/**
 * The number of ways to relabel n1 + n2 pooled values into groups of sizes n1 and n2:
 * the binomial coefficient C(n1 + n2, n1), computed by the product
 * Π_{i=1}^{k} (N − k + i) / i with k = min(n1, n2), exact in doubles while below 2^53.
 * Stops early and returns Infinity once the count exceeds `limit` (so a huge N costs
 * nothing). Cost: O(min(n1, n2)).
 *
 * @example countRelabellings(10, 10) // → 184756
 */
export function countRelabellings(n1: number, n2: number, limit = Number.MAX_SAFE_INTEGER): number {
  const N = n1 + n2;
  const k = Math.min(n1, n2);
  let c = 1;
  for (let i = 1; i <= k; i++) {
    // c · (N − k + i) is divisible by i at every step (it is C(N − k + i, i) · i)
    c = (c * (N - k + i)) / i;
    if (c > limit) return Infinity;
  }
  return Math.round(c);
}
