import {binomialCdf} from '../distributions/binomial.js';
import {MethodError} from './method-error.js';
import {orderStatisticInterval} from './shared/hodges-lehmann.js';
import {pairedDifferences} from './shared/paired-differences.js';
import {sidedP, tailAlpha} from './shared/sided-p.js';
import {clopperPearsonInterval} from './shared/clopper-pearson.js';
import type {MethodDefinition, MethodNote, PairedDesign} from './types.js';

/**
 * Sign test on the paired differences `second - first` against a median of
 * `mu` (default 0): under the null the number S of positive differences
 * among the n nonzero ones is Binomial(n, ½) (Arbuthnot 1710; Dixon & Mood
 * 1946, JASA 41:557–566; Hollander, Wolfe & Chicken 2014, "Nonparametric
 * Statistical Methods", 3rd ed., §3.4). Zero differences are dropped and
 * counted in `details.zero_differences`. Exact binomial p-values; two-sided
 * p is twice the smaller one-sided p, capped at 1 (the binomial(n, ½) is
 * symmetric, so this equals the "no more probable" rule).
 *
 * Estimate: the median of all N differences, with the distribution-free
 * interval [d_(k), d_(N+1-k)] between their order statistics, k the largest
 * with P(B ≤ k - 1) ≤ α/2 for B ~ Binomial(N, ½) (§3.5–3.6; Thompson 1936,
 * Ann. Math. Statist. 7:122–128); its achieved level is in
 * `details.ci_achieved_level`.
 */
export const signTest: MethodDefinition<PairedDesign> = {
  id: 'sign-test',
  title: 'sign test',
  design: 'paired',
  compute({first, second}, options) {
    const {raw, centred} = pairedDifferences(first, second, options.mu);
    let positive = 0;
    let negative = 0;
    for (const d of centred) {
      if (d > 0) positive++;
      else if (d < 0) negative++;
    }
    const n = positive + negative;
    const zeros = centred.length - n;
    if (n === 0) {
      throw new MethodError(
        centred.length === 0
          ? `There are no pairs of ${first.label} and ${second.label}.`
          : `Every difference ${second.label} - ${first.label} equals ${options.mu}; the sign test has no signs to count.`,
        'The sign test needs at least one pair whose difference is not the null value.',
      );
    }
    // P(S ≥ s) = P(B ≤ n - s) for B ~ Binomial(n, ½): both tails from the
    // lower cdf, so swapping the columns swaps them bit for bit.
    const tails = {greater: binomialCdf(negative, n, 0.5), less: binomialCdf(positive, n, 0.5)};

    const all = raw.length;
    const sorted = Float64Array.from(raw).sort();
    const alphaTail = tailAlpha(options.alternative, options.confidence);
    const k = binomialCriticalCount(all, alphaTail);
    const ci = orderStatisticInterval((i) => sorted[i - 1]!, all, k, options.alternative);
    const sides = options.alternative === 'two-sided' ? 2 : 1;
    const warnings: MethodNote[] = [];
    if (zeros > 0) {
      warnings.push({kind: 'dropped-zeros', zeros, pairs: all, second: second.label, first: first.label, mu: options.mu, wilcoxon: false});
    }
    if (k === 0) {
      warnings.push({kind: 'unattainable-interval', confidence: options.confidence, estimate: 'median difference', pairs: all});
    }
    return {
      statistic: {name: 'S', value: positive},
      df: null,
      p: sidedP(tails, options.alternative),
      estimate: {
        name: `median difference (${second.label} - ${first.label})`,
        value: medianOfSorted(sorted),
        ci,
        level: options.confidence,
      },
      // The share of positive signs is the sign test's own effect size: ½
      // under the null, with its Clopper–Pearson interval.
      ...(n > 0 ? {effect: {name: 'proportion-positive', value: positive / n, ci: clopperPearsonInterval(positive, n, options.confidence, options.alternative)}} : {}),
      variant: 'exact',
      ...(warnings.length > 0 ? {warnings} : {}),
      details: {
        positive,
        negative,
        zero_differences: zeros,
        ci_achieved_level: k > 0 ? 1 - sides * binomialCdf(k - 1, all, 0.5) : null,
      },
    };
  },
};

/** The largest k with P(B ≤ k - 1) ≤ alphaTail, B ~ Binomial(n, ½); 0 if none (binary search). */
export function binomialCriticalCount(n: number, alphaTail: number): number {
  const limit = alphaTail * (1 + 1e-12); // see exactCriticalCount
  let lo = 0; // P(B ≤ lo - 1) ≤ limit holds at lo = 0
  let hi = n + 1; // P(B ≤ n) = 1 > limit
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (binomialCdf(mid - 1, n, 0.5) <= limit) lo = mid;
    else hi = mid;
  }
  return lo;
}

function medianOfSorted(sorted: Float64Array): number {
  const n = sorted.length;
  const mid = n >> 1;
  return n % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}
