import {normalTwoSidedP} from '../../distributions/normal.js';
import {adjustPValues} from '../adjust/index.js';
import {MethodError} from '../method-error.js';
import type {PosthocComparison, Sample} from '../types.js';
import {checkGroups, pairs} from './pairs.js';

/**
 * Dunn's test: all pairs of k groups compared on their mean ranks in the
 * joint ranking of all N observations (Dunn 1964, "Multiple comparisons
 * using rank sums", Technometrics 6:241-252), the usual follow-up to the
 * Kruskal–Wallis test. Ties take midranks, and the variance carries the
 * tie correction of the Kruskal–Wallis statistic (as in Dinno 2015, "Nonparametric
 * pairwise multiple comparisons in independent groups using Dunn’s test",
 * Stata Journal 15:292-300):
 *
 *   z = (R̄_b - R̄_a) / √( [N(N+1)/12 - Σ(t³-t)/(12(N-1))] (1/n_a + 1/n_b) ),
 *
 * t the size of each group of tied values; two-sided p = 2Φc(|z|), then
 * Holm-adjusted over the k(k-1)/2 pairs (Holm 1979). `estimate` is the
 * difference in mean ranks (b - a), `statistic` the signed z; there is no
 * confidence interval (`ci: null`). Checked against the formula evaluated
 * with scipy (13+ digits) and, for k = 2, z² = Kruskal–Wallis H
 * (test/methods/posthoc/dunn.test.ts).
 */
export function dunn(samples: readonly Sample[], confidence: number): PosthocComparison[] {
  checkGroups(samples, confidence, 1, 'Dunn’s test');
  const k = samples.length;
  const {meanRanks, tieSum, total} = rankGroups(samples);
  const variance = (total * (total + 1)) / 12 - tieSum / (12 * (total - 1));
  if (!(variance > 0)) {
    throw new MethodError(
      'Dunn’s test needs at least two distinct values, but every observation is the same.',
      'Check the data.',
    );
  }
  const raw = pairs(k).map(([i, j]) => {
    const difference = meanRanks[j]! - meanRanks[i]!;
    const z = difference / Math.sqrt(variance * (1 / samples[i]!.values.length + 1 / samples[j]!.values.length));
    return {i, j, difference, z, p: normalTwoSidedP(z)};
  });
  const adjusted = adjustPValues('holm', raw.map((r) => r.p));
  return raw.map((r, index) => ({
    a: samples[r.i]!.label,
    b: samples[r.j]!.label,
    estimate: r.difference,
    ci: null,
    statistic: r.z,
    p_adjusted: adjusted[index]!,
  }));
}

/** Mean midrank of each group in the joint ranking, and Σ(t³ - t) over tie groups. */
function rankGroups(samples: readonly Sample[]): {meanRanks: number[]; tieSum: number; total: number} {
  const all: {value: number; group: number}[] = [];
  samples.forEach((s, group) => s.values.forEach((value) => all.push({value, group})));
  all.sort((x, y) => x.value - y.value);
  const rankSums = samples.map(() => 0);
  let tieSum = 0;
  for (let start = 0; start < all.length; ) {
    let end = start + 1;
    while (end < all.length && all[end]!.value === all[start]!.value) end++;
    const t = end - start;
    const midrank = (start + 1 + end) / 2; // ranks start+1 … end
    for (let i = start; i < end; i++) rankSums[all[i]!.group]! += midrank;
    tieSum += t * t * t - t;
    start = end;
  }
  const meanRanks = rankSums.map((sum, g) => sum / samples[g]!.values.length);
  return {meanRanks, tieSum, total: all.length};
}
