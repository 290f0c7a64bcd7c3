import {correlationPairs} from './shared/correlation-pairs.js';
import {correlationT} from './shared/correlation-t-test.js';
import {fisherZInterval, fisherZSe} from './shared/fisher-z-interval.js';
import {midRanks} from './shared/mid-ranks.js';
import {pearsonR} from './shared/pearson-r.js';
import {sidedP} from './shared/sided-p.js';
import {SPEARMAN_EXACT_MAX_N, spearmanExactTails} from './shared/spearman-exact.js';
import type {BivariateDesign, MethodDefinition} from './types.js';

/**
 * Spearman's rank correlation rho: Pearson's r of the mid-ranks (Spearman
 * 1904, Am. J. Psychol. 15:72–101; Kendall & Gibbons 1990, "Rank
 * Correlation Methods", 5th ed.).
 *
 * Test, as the method catalogue pins it:
 * - n ≤ 10: the exact permutation distribution over all n! pairings
 *   (shared/spearman-exact.ts), conditional on the ties when there are any;
 *   statistic S = (n³ − n)(1 − rho)/6, which is Σd² without ties (the S of
 *   R's cor.test); the two-sided p is twice the smaller tail, capped at 1
 *   (R's rule);
 * - n > 10: t = rho √((n−2)/(1−rho²)) on n − 2 df (scipy's spearmanr).
 * Interval: Fisher z with the Bonett & Wright (2000) standard error
 * √((1 + rho²/2)/(n−3)). Needs at least 4 pairs.
 *
 * @example tuna data of ?cor.test (n = 9): rho = 0.6, S = 48, one-sided exact p = 0.04840
 */
export const spearman: MethodDefinition<BivariateDesign> = {
  id: 'spearman',
  title: 'Spearman’s rank correlation',
  design: 'bivariate',
  question: 'association',
  compute(design, options) {
    const {x, y, n} = correlationPairs(design, 'Spearman’s rank correlation', 4);
    const rx = midRanks(x.values);
    const ry = midRanks(y.values);
    const rho = pearsonR(rx.ranks, ry.ranks);
    const ci = fisherZInterval(rho, fisherZSe.spearman(rho, n), options.alternative, options.confidence);
    const common = {
      estimate: {name: 'Spearman rho', value: rho, ci, level: options.confidence},
      effect: {name: 'rho', value: rho, ci},
    };
    if (n > SPEARMAN_EXACT_MAX_N) {
      const test = correlationT(rho, n, options.alternative);
      return {statistic: {name: 't', value: test.t}, df: test.df, p: test.p, ...common, variant: 't approximation'};
    }
    const tails = spearmanExactTails(rx.ranks, ry.ranks);
    const ties = rx.ties.length + ry.ties.length > 0;
    return {
      statistic: {name: 'S', value: ((n * n * n - n) * (1 - rho)) / 6},
      df: null,
      p: sidedP(tails, options.alternative),
      ...common,
      variant: ties ? 'exact permutation distribution, conditional on the ties' : 'exact permutation distribution',
    };
  },
};

