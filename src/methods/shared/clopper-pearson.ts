import {binomialCdf, binomialSf} from '../../distributions/binomial.js';
import {findRoot} from '../../distributions/find-root.js';
import type {Alternative} from '../types.js';

/**
 * The Clopper–Pearson "exact" interval for a binomial proportion (Clopper &
 * Pearson 1934, Biometrika 26:404): the lower bound solves
 * P(X ≥ x; p) = α and the upper bound P(X ≤ x; p) = α, with α = (1 - level)/2
 * for a two-sided interval and 1 - level for a one-sided bound (the other at
 * the edge of [0, 1]); x = 0 gives the lower bound 0 and x = n the upper
 * bound 1. These are the beta quantiles qbeta(α, x, n-x+1) and
 * qbeta(1-α, x+1, n-x) of R's binom.test; here each tail equation is solved
 * with Brent's method to full precision on the binomial tails, which keep
 * their relative accuracy at small α.
 *
 * @example clopperPearsonInterval(682, 925, 0.95, 'two-sided') // [0.707668264…, 0.765406558…]
 */
export function clopperPearsonInterval(
  successes: number,
  trials: number,
  confidence: number,
  alternative: Alternative,
): readonly [number, number] {
  if (!Number.isInteger(trials) || trials < 1 || !Number.isInteger(successes) || successes < 0 || successes > trials) {
    throw new Error(`clopperPearsonInterval: invalid counts (${successes} of ${trials})`);
  }
  if (!(confidence > 0 && confidence < 1)) throw new Error(`clopperPearsonInterval: invalid confidence ${confidence}`);
  const alpha = alternative === 'two-sided' ? (1 - confidence) / 2 : 1 - confidence;
  const lower = alternative === 'less' ? 0 : lowerBound(successes, trials, alpha);
  const upper = alternative === 'greater' ? 1 : upperBound(successes, trials, alpha);
  return [lower, upper];
}

/** The p at which P(X ≥ x; p) = alpha (0 when x = 0). */
export function lowerBound(x: number, n: number, alpha: number): number {
  if (x === 0) return 0;
  // Increasing in p from 0 at p = 0 to 1 at p = 1.
  return findRoot((p) => binomialSf(x - 1, n, p) - alpha, 0, 1);
}

/** The p at which P(X ≤ x; p) = alpha (1 when x = n). */
export function upperBound(x: number, n: number, alpha: number): number {
  if (x === n) return 1;
  // Decreasing in p from 1 at p = 0 to 0 at p = 1.
  return findRoot((p) => binomialCdf(x, n, p) - alpha, 0, 1);
}
