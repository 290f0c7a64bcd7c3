import type {Tails} from './sided-p.js';

/**
 * Tail probabilities of an exact null distribution on 0, 1, …, L given by
 * its probability mass function. Each tail is summed from its own end, from
 * the smallest terms inwards, so a p-value of 1e-25 keeps its digits
 * (never 1 - cdf).
 */
export function exactTails(pmf: Float64Array, observed: number): Tails {
  return {greater: atLeast(pmf, observed), less: atMost(pmf, observed)};
}

/** P(X ≤ x). */
export function atMost(pmf: Float64Array, x: number): number {
  const top = Math.min(Math.floor(x), pmf.length - 1);
  let sum = 0;
  for (let i = 0; i <= top; i++) sum += pmf[i]!;
  return Math.min(1, sum);
}

/** P(X ≥ x). */
export function atLeast(pmf: Float64Array, x: number): number {
  const bottom = Math.max(Math.ceil(x), 0);
  let sum = 0;
  for (let i = pmf.length - 1; i >= bottom; i--) sum += pmf[i]!;
  return Math.min(1, sum);
}

/**
 * The order-statistic index of a distribution-free confidence bound (Bauer
 * 1972, "Constructing confidence sets using rank statistics", JASA
 * 67:687–690; Hollander, Wolfe & Chicken 2014, §3.3 and §4.3): the largest
 * k with P(X ≤ k - 1) ≤ `alphaTail`, so that the k-th smallest of the
 * ordered differences (or Walsh averages) bounds the shift with coverage
 * 1 - P(X ≤ k - 1) on that side. 0 when even k = 1 misses the level.
 *
 * A relative slack of 1e-12 lets a level attained exactly in rational
 * arithmetic (P = 0.025 for 95%) count as attained despite rounding in the
 * summed probabilities.
 */
export function exactCriticalCount(pmf: Float64Array, alphaTail: number): number {
  const limit = alphaTail * (1 + 1e-12);
  let sum = 0;
  let k = 0;
  while (k < pmf.length) {
    sum += pmf[k]!;
    if (sum > limit) break;
    k++;
  }
  return k;
}
