import {normalCdf, normalQuantile, normalSf} from '../../distributions/normal.js';
import type {Tails} from './sided-p.js';

/**
 * Normal approximation to the tails of a rank statistic (the large-sample
 * approximations with ties of Hollander, Wolfe & Chicken 2014,
 * "Nonparametric Statistical Methods", 3rd ed., §3.1 and §4.1), with a
 * continuity correction of ½ towards the centre as in R's wilcox.test and
 * scipy.stats.mannwhitneyu / wilcoxon. `sd` is the tie-corrected null
 * standard deviation; `z` the corrected statistic of the two-sided test.
 * The two-sided p is then twice the smaller tail, capped at 1 (`sidedP`);
 * R differs only when the statistic lies within ½ of its mean (a signed-
 * rank V with ties, |V - mean| = ¼), where its correction overshoots and
 * gives p < 1.
 */
export interface NormalTails extends Tails {
  readonly z: number;
}

export function normalTails(statistic: number, mean: number, sd: number): NormalTails {
  const excess = statistic - mean;
  return {
    greater: normalSf((excess - 0.5) / sd),
    less: normalCdf((excess + 0.5) / sd),
    z: (excess - 0.5 * Math.sign(excess)) / sd,
  };
}

/**
 * Large-sample order-statistic index for a distribution-free confidence
 * bound (Hollander, Wolfe & Chicken 2014, §3.3 Tukey's interval and §4.3
 * Moses' interval, large-sample approximation): with a statistic
 * of `count` equally likely comparisons under the null, mean count/2 and
 * untied standard deviation `sd`, the k-th smallest of the ordered
 * differences (or Walsh averages) is the bound, k = count/2 - z·sd rounded
 * to the nearest integer (the continuity-corrected normal analogue of
 * `exactCriticalCount`). 0 when no finite bound reaches the level.
 */
export function normalCriticalCount(count: number, sd: number, alphaTail: number): number {
  const z = -normalQuantile(alphaTail);
  return Math.max(0, Math.floor(count / 2 - z * sd + 0.5));
}

/** Σ (t³ - t) over tie groups of sizes t, the tie term of the rank statistics' null variances. */
export function tieSum(tieSizes: readonly number[]): number {
  return tieSizes.reduce((sum, t) => sum + t * t * t - t, 0);
}
