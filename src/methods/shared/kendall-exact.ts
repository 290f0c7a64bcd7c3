/**
 * Exact null distribution of Kendall's tau without ties: the number of
 * discordant pairs D of a random permutation of n is the number of
 * inversions, whose distribution (the Mahonian numbers) obeys
 *
 *   P_n(k) = (1/n) Σ_{j=0}^{min(k, n−1)} P_{n−1}(k − j)
 *
 * (Kendall 1938, Biometrika 30:81–93; Kendall & Gibbons 1990, "Rank
 * Correlation Methods", 5th ed.). Carried as probabilities, every
 * step a sum of positive terms, so even P(D = 0) = 1/n! keeps full relative
 * precision. Used up to n = 50 (about 1 ms; memoized).
 */
export const KENDALL_EXACT_MAX_N = 50;

const cache = new Map<number, Float64Array>();

/** P(D = k) for k = 0 … n(n−1)/2. */
export function discordantDistribution(n: number): Float64Array {
  if (!(Number.isInteger(n) && n >= 1 && n <= KENDALL_EXACT_MAX_N)) {
    throw new Error(`discordantDistribution: n must be an integer in [1, ${KENDALL_EXACT_MAX_N}], got ${n}`);
  }
  const cached = cache.get(n);
  if (cached) return cached;
  let previous = Float64Array.of(1);
  for (let m = 2; m <= n; m++) {
    const next = new Float64Array((m * (m - 1)) / 2 + 1);
    for (let k = 0; k < next.length; k++) {
      let sum = 0;
      for (let j = Math.max(0, k - previous.length + 1); j <= Math.min(k, m - 1); j++) sum += previous[k - j]!;
      next[k] = sum / m;
    }
    previous = next;
  }
  cache.set(n, previous);
  return previous;
}

/** P(D ≤ d) and P(D ≥ d), each summed from its far end (smallest terms first). */
export function discordantTails(n: number, d: number): {readonly atMost: number; readonly atLeast: number} {
  const p = discordantDistribution(n);
  let atMost = 0;
  for (let k = 0; k <= d; k++) atMost += p[k]!;
  let atLeast = 0;
  for (let k = p.length - 1; k >= d; k--) atLeast += p[k]!;
  return {atMost: Math.min(1, atMost), atLeast: Math.min(1, atLeast)};
}
