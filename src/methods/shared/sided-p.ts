import type {Alternative} from '../types.js';

/**
 * The two one-sided p-values of a rank statistic. `greater`: the second
 * group (or the differences `second - first`) tends to be larger.
 */
export interface Tails {
  readonly greater: number;
  readonly less: number;
}

/**
 * The p-value for the declared alternative. Two-sided p is twice the
 * smaller one-sided p, capped at 1: for the symmetric null distributions
 * of the rank statistics this is the usual "at least as far from the centre"
 * p-value (Hollander, Wolfe & Chicken 2014, §3.1 and §4.1).
 */
export function sidedP(tails: Tails, alternative: Alternative): number {
  if (alternative === 'greater') return tails.greater;
  if (alternative === 'less') return tails.less;
  return Math.min(1, 2 * Math.min(tails.greater, tails.less));
}

/** Probability left in each excluded tail of an interval at `confidence`. */
export function tailAlpha(alternative: Alternative, confidence: number): number {
  return alternative === 'two-sided' ? (1 - confidence) / 2 : 1 - confidence;
}
