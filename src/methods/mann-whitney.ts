import {MethodError} from './method-error.js';
import {atMost, exactCriticalCount, exactTails} from './shared/exact-tails.js';
import {medianOf, orderStatisticInterval, pairwiseDifferences} from './shared/hodges-lehmann.js';
import {mannWhitneyPmf} from './shared/mann-whitney-distribution.js';
import {midRanks} from './shared/mid-ranks.js';
import {normalCriticalCount, normalTails, tieSum} from './shared/normal-tails.js';
import {rankBiserial} from './shared/rank-biserial.js';
import {selectKth} from './shared/select-kth.js';
import {sidedP, tailAlpha, type Tails} from './shared/sided-p.js';
import type {MethodDefinition, MethodNote, TwoGroupDesign} from './types.js';

/**
 * Mann–Whitney U test, the Wilcoxon rank-sum test (Wilcoxon 1945; Mann &
 * Whitney 1947, Ann. Math. Statist. 18:50–60; Hollander, Wolfe & Chicken
 * 2014, "Nonparametric Statistical Methods", 3rd ed., §4.1).
 *
 * Statistic: U of the second group, the number of (first, second) pairs in
 * which the second value is larger, ties counting ½ (R's W when the second
 * group is R's x). `greater` means the second group tends to be larger.
 *
 * p-value: exact from the null distribution (`mannWhitneyPmf`) when there
 * are no ties and m·n ≤ 10 000 (every pair of groups up to 100 each, so at
 * most 2.6e7 additions); otherwise the normal approximation with the tie
 * correction σ² = mn/12·((N+1) - Σ(t³-t)/(N(N-1))) and a continuity
 * correction of ½. Two-sided p is twice the smaller one-sided p, capped at 1.
 *
 * Estimate: the Hodges–Lehmann shift, the median of the m·n differences
 * `second - first`, with Moses' interval between their order statistics
 * (§4.2–4.3; Bauer 1972, JASA 67:687–690): critical values from the exact
 * distribution when the test is exact, else its normal approximation
 * without tie correction. Where R's wilcox.test and this differ: when the
 * level is attained exactly (P(U ≤ c) = α/2), this interval has coverage
 * exactly 1 - α and R's is one order statistic wider; with ties or large
 * samples R inverts the tie-corrected test numerically.
 *
 * Effect: the rank-biserial correlation (Glass 1965), see `rankBiserial`.
 */
const EXACT_MAX_PAIRS = 10_000;

export const mannWhitney: MethodDefinition<TwoGroupDesign> = {
  id: 'mann-whitney',
  title: 'Mann–Whitney U test',
  design: 'two-group',
  compute({first, second}, options) {
    const m = first.values.length;
    const n = second.values.length;
    for (const group of [first, second]) {
      if (group.values.length === 0) {
        throw new MethodError(`Group ${group.label} has no observations.`, 'The Mann–Whitney U test needs at least one value in each group.');
      }
    }
    const pooled = new Float64Array(m + n);
    pooled.set(first.values);
    pooled.set(second.values, m);
    const {ranks, ties: tieSizes} = midRanks(pooled);
    let rankSum = 0;
    for (let i = m; i < m + n; i++) rankSum += ranks[i]!;
    const pairs = m * n;
    const uSecond = rankSum - (n * (n + 1)) / 2;
    const exact = tieSizes.length === 0 && pairs <= EXACT_MAX_PAIRS;
    const pmf = exact ? mannWhitneyPmf(m, n) : undefined;
    const untiedSd = Math.sqrt((pairs * (m + n + 1)) / 12);
    let tails: Tails;
    let z: number | undefined;
    if (pmf) {
      tails = exactTails(pmf, uSecond);
    } else {
      const total = m + n;
      const sd = Math.sqrt((pairs / 12) * (total + 1 - tieSum(tieSizes) / (total * (total - 1))));
      if (!(sd > 0)) {
        throw new MethodError(
          `Every value in ${first.label} and ${second.label} is the same; ranks cannot compare the groups.`,
          'Check the outcome column; a rank test needs at least two distinct values.',
        );
      }
      const normal = normalTails(uSecond, pairs / 2, sd);
      tails = normal;
      z = normal.z;
    }

    const alphaTail = tailAlpha(options.alternative, options.confidence);
    const k = pmf ? exactCriticalCount(pmf, alphaTail) : normalCriticalCount(pairs, untiedSd, alphaTail);
    const differences = pairwiseDifferences(first.values, second.values);
    const ci = orderStatisticInterval((i) => selectKth(differences, i), pairs, k, options.alternative);
    const warnings: MethodNote[] = [];
    if (k === 0) warnings.push({kind: 'unattainable-interval', confidence: options.confidence, estimate: 'shift', between: [first.label, second.label]});
    if (!exact && tieSizes.length > 0 && pairs <= EXACT_MAX_PAIRS) {
      warnings.push({kind: 'ties-approximation', tied: 'values'});
    }
    const achieved = pmf && k > 0 ? 1 - (options.alternative === 'two-sided' ? 2 : 1) * atMost(pmf, k - 1) : null;
    return {
      statistic: {name: 'U', value: uSecond},
      df: null,
      p: sidedP(tails, options.alternative),
      estimate: {
        name: `Hodges–Lehmann shift (${second.label} - ${first.label})`,
        value: medianOf(differences),
        ci,
        level: options.confidence,
      },
      effect: rankBiserial({
        r: (uSecond - (pairs - uSecond)) / pairs,
        sd: Math.sqrt((m + n + 1) / (3 * pairs)),
        halfStep: 1 / pairs,
        alternative: options.alternative,
        confidence: options.confidence,
      }),
      variant: exact ? 'exact' : 'normal approximation with tie and continuity correction',
      ...(warnings.length > 0 ? {warnings} : {}),
      details: {
        u_first: pairs - uSecond,
        u_second: uSecond,
        rank_sum_second: rankSum,
        ...(z === undefined ? {} : {z}),
        ci_achieved_level: achieved,
      },
    };
  },
};
