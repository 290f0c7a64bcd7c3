import {symmetrize} from './symmetrize.js';

/**
 * Exact null distribution of the Wilcoxon signed-rank statistic T+ (sum of
 * the ranks of the positive differences) for n untied, nonzero differences:
 * `pmf[t]` = P(T+ = t), t = 0..n(n+1)/2.
 *
 * Under the null each rank carries a positive sign with probability ½,
 * independently, so adding rank k gives the recurrence (Wilcoxon 1945,
 * "Individual comparisons by ranking methods", Biometrics Bulletin 1:80–83;
 * Hollander, Wolfe & Chicken 2014, "Nonparametric Statistical Methods",
 * 3rd ed., §3.1)
 *
 *   p(k; t) = ½ p(k-1; t) + ½ p(k-1; t - k).
 *
 * All terms are positive, so every probability keeps its relative accuracy
 * down to 2^-n. Work is about n³/6 additions (2e7 at n = 500).
 */
export function signedRankPmf(n: number): Float64Array {
  if (!(Number.isInteger(n) && n >= 0)) {
    throw new Error(`signedRankPmf: n must be a non-negative integer, got ${n}`);
  }
  const size = (n * (n + 1)) / 2 + 1;
  const pmf = new Float64Array(size);
  pmf[0] = 1;
  for (let k = 1; k <= n; k++) {
    const top = (k * (k + 1)) / 2;
    // Descending, so pmf[t - k] still holds the value for k - 1 ranks.
    for (let t = top; t >= k; t--) pmf[t] = 0.5 * (pmf[t]! + pmf[t - k]!);
    for (let t = k - 1; t >= 0; t--) pmf[t] = 0.5 * pmf[t]!;
  }
  return symmetrize(pmf);
}
