import {binomialCdf, binomialPmf, binomialSf} from '../../distributions/binomial.js';
import type {Alternative} from '../types.js';

/**
 * The p-value of the exact binomial test of x successes in n trials against
 * the null proportion p0 (0 < p0 < 1). One-sided: P(X ≥ x) for `greater`,
 * P(X ≤ x) for `less`. Two-sided: the probability of every outcome no more
 * probable than the observed one, with the relative tolerance 1 + 1e-7 that
 * R's binom.test uses so that outcomes equal in exact arithmetic count
 * despite rounding (R source src/library/stats/R/binom.test.R; the same
 * rule as scipy.stats.binomtest). The outcomes on the far side of the mean
 * n·p0 are monotone in probability, so the cut-off is found by bisection in
 * O(log n) evaluations rather than R's scan of the whole side.
 */
export function binomialTestP(x: number, n: number, p0: number, alternative: Alternative): number {
  if (alternative === 'greater') return binomialSf(x - 1, n, p0);
  if (alternative === 'less') return binomialCdf(x, n, p0);
  const bound = binomialPmf(x, n, p0) * (1 + 1e-7);
  const mean = n * p0;
  if (x === mean) return 1;
  if (x < mean) {
    // On [ceil(mean), n] the pmf is non-increasing: find the first i with pmf(i) ≤ bound.
    const first = firstTrue(Math.ceil(mean), n, (i) => binomialPmf(i, n, p0) <= bound);
    return Math.min(1, binomialCdf(x, n, p0) + binomialSf(first - 1, n, p0));
  }
  // On [0, floor(mean)] the pmf is non-decreasing: find the last i with pmf(i) ≤ bound.
  const last = firstTrue(0, Math.floor(mean), (i) => !(binomialPmf(i, n, p0) <= bound)) - 1;
  return Math.min(1, binomialCdf(last, n, p0) + binomialSf(x - 1, n, p0));
}

/**
 * The smallest i in [from, to] with test(i) true, for a test that is false
 * then true along the range; to + 1 when it is never true.
 */
function firstTrue(from: number, to: number, test: (i: number) => boolean): number {
  let lo = from;
  let hi = to + 1;
  while (lo < hi) {
    const mid = Math.floor((lo + hi) / 2);
    if (mid <= to && test(mid)) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}
