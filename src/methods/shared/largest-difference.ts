import {studentTQuantile} from '../../distributions/student-t.js';
import type {Estimate} from '../types.js';

/**
 * The estimate of a k-group comparison of means in the outcome's units: the
 * largest group mean minus the smallest, with a simultaneous interval.
 *
 * The pair is chosen after looking at the data, so an ordinary t interval
 * for it would be too narrow. The interval is Bonferroni-adjusted over all
 * m = k(k-1)/2 pairs (Dunn 1961, JASA 56:52): t quantile at 1 - α/(2m) with
 * the pair's standard error and df. It holds for every pair at once, hence
 * for the selected one. It is a few percent wider than Tukey–Kramer's
 * studentized-range interval (at k = 3 and 27 df, 2.55 against 2.48 times
 * the standard error) and equals the two-sample t interval when k = 2.
 */
export interface PairSpread {
  readonly se: number;
  readonly df: number;
}

export interface LargestDifferenceInput {
  readonly labels: readonly string[];
  /** Group means, possibly all shifted by one constant. */
  readonly means: readonly number[];
  /** Standard error and df of the difference between groups i and j. */
  readonly pair: (i: number, j: number) => PairSpread;
  readonly confidence: number;
}

export function largestDifference(input: LargestDifferenceInput): Estimate {
  const {labels, means, pair, confidence} = input;
  let low = 0;
  let high = 0;
  means.forEach((m, i) => {
    if (m < means[low]!) low = i;
    if (m > means[high]!) high = i;
  });
  // All means equal: any pair will do; take the first two.
  if (low === high) high = low === 0 ? 1 : 0;
  const k = means.length;
  const pairs = (k * (k - 1)) / 2;
  const {se, df} = pair(low, high);
  const value = means[high]! - means[low]!;
  const half = -studentTQuantile((1 - confidence) / (2 * pairs), df) * se;
  return {
    name: `largest difference in means (${labels[high]} - ${labels[low]})`,
    value,
    ci: [value - half, value + half],
    level: confidence,
    pair: [labels[low]!, labels[high]!],
  };
}
