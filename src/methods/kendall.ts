import {correlationPairs} from './shared/correlation-pairs.js';
import {fisherZInterval, fisherZSe} from './shared/fisher-z-interval.js';
import {kendallCounts, type KendallCounts} from './shared/kendall-counts.js';
import {discordantTails, KENDALL_EXACT_MAX_N} from './shared/kendall-exact.js';
import {sidedP} from './shared/sided-p.js';
import {zTestP} from './shared/z-test-p.js';
import type {BivariateDesign, MethodDefinition} from './types.js';

/**
 * Kendall's rank correlation tau-b (Kendall 1938, Biometrika 30:81–93; ties:
 * Kendall 1945, Biometrika 33:239–251), counted in O(n log n)
 * (shared/kendall-counts.ts).
 *
 * Test, as the method catalogue pins it:
 * - no ties and n ≤ 50: exact, from the distribution of the number of
 *   discordant pairs (shared/kendall-exact.ts); statistic T = the number of
 *   concordant pairs (R's cor.test); two-sided p = twice the smaller tail
 *   (the distribution is symmetric), capped at 1;
 * - otherwise: z = (C − D)/√var with Kendall's tie-corrected variance
 *   var = [n(n−1)(2n+5) − Σt(t−1)(2t+5) − Σu(u−1)(2u+5)]/18
 *       + Σt(t−1)·Σu(u−1) / (2n(n−1))
 *       + Σt(t−1)(t−2)·Σu(u−1)(u−2) / (9n(n−1)(n−2))
 *   (Kendall & Gibbons 1990, "Rank Correlation Methods", 5th ed.),
 *   no continuity correction (as scipy's kendalltau and R's cor.test).
 * Interval: Fisher z of tau-b with standard error √(0.437/(n−4)) (Fieller,
 * Hartley & Pearson 1957; Bonett & Wright 2000). Needs at least 5 pairs.
 *
 * @example tuna data of ?cor.test (n = 9): tau = 0.4444, T = 26, one-sided exact p = 0.05972
 */
export const kendall: MethodDefinition<BivariateDesign> = {
  id: 'kendall',
  title: 'Kendall’s rank correlation',
  design: 'bivariate',
  question: 'association',
  compute(design, options) {
    const {x, y, n} = correlationPairs(design, 'Kendall’s rank correlation', 5);
    const counts = kendallCounts(x.values, y.values);
    const tau = counts.tauB;
    const ci = fisherZInterval(tau, fisherZSe.kendall(n), options.alternative, options.confidence);
    const common = {
      estimate: {name: 'Kendall tau-b', value: tau, ci, level: options.confidence},
      effect: {name: 'tau-b', value: tau, ci},
    };
    if (n <= KENDALL_EXACT_MAX_N && counts.xTies.length === 0 && counts.yTies.length === 0) {
      const tails = discordantTails(n, counts.discordant);
      return {
        statistic: {name: 'T', value: counts.concordant},
        df: null,
        // Fewer discordant pairs than expected is evidence of a positive association.
        p: sidedP({greater: tails.atMost, less: tails.atLeast}, options.alternative),
        ...common,
        variant: 'exact',
      };
    }
    const z = (counts.concordant - counts.discordant) / Math.sqrt(tieCorrectedVariance(counts));
    return {
      statistic: {name: 'z', value: z},
      df: null,
      p: zTestP(z, options.alternative),
      ...common,
      variant: counts.xTies.length + counts.yTies.length > 0 ? 'normal approximation with tie correction' : 'normal approximation',
    };
  },
};

function tieCorrectedVariance({n, xTies, yTies}: KendallCounts): number {
  const sum = (ties: readonly number[], f: (t: number) => number) => ties.reduce((s, t) => s + f(t), 0);
  const v0 = n * (n - 1) * (2 * n + 5);
  const vt = sum(xTies, (t) => t * (t - 1) * (2 * t + 5));
  const vu = sum(yTies, (u) => u * (u - 1) * (2 * u + 5));
  const v1 = (sum(xTies, (t) => t * (t - 1)) * sum(yTies, (u) => u * (u - 1))) / (2 * n * (n - 1));
  const v2 =
    (sum(xTies, (t) => t * (t - 1) * (t - 2)) * sum(yTies, (u) => u * (u - 1) * (u - 2))) / (9 * n * (n - 1) * (n - 2));
  return (v0 - vt - vu) / 18 + v1 + v2;
}
