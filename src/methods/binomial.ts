import {binomialTestP} from './shared/binomial-test-p.js';
import {clopperPearsonInterval} from './shared/clopper-pearson.js';
import {checkProportion, cohensH} from './shared/proportion-checks.js';
import type {MethodDefinition, ProportionDesign} from './types.js';

/**
 * The exact binomial test of a proportion against `mu` (Conover 1999,
 * "Practical Nonparametric Statistics", 3rd ed., §3.1): one-sided p-values
 * are binomial tails; the two-sided p sums the probabilities of every
 * outcome no more probable than the observed one (relative tolerance
 * 1 + 1e-7, as R's binom.test; shared/binomial-test-p.ts).
 *
 * Estimate: the sample proportion with the Clopper–Pearson interval
 * (shared/clopper-pearson.ts; one-sided alternatives give a one-sided bound
 * with the other at 0 or 1). Effect: Cohen's h against `mu`, with the
 * interval mapped from the Clopper–Pearson bounds (h is increasing in p).
 *
 * @example 682 of 925 against 3/4 (Conover 1971, p. 97f): p = 0.3825, CI [0.7077, 0.7654]
 */
export const binomial: MethodDefinition<ProportionDesign> = {
  id: 'binomial',
  title: 'exact binomial test',
  design: 'proportion',
  question: 'proportion',
  needsMu: true,
  needsSuccess: true,
  compute(design, options) {
    const {successes, trials, success} = design;
    const mu = options.mu;
    checkProportion(design, mu, 'The exact binomial test');
    const ci = clopperPearsonInterval(successes, trials, options.confidence, options.alternative);
    const proportion = successes / trials;
    return {
      statistic: {name: 'k', value: successes},
      df: null,
      p: binomialTestP(successes, trials, mu, options.alternative),
      estimate: {name: `proportion of ${success}`, value: proportion, ci, level: options.confidence},
      effect: {name: 'cohens-h', value: cohensH(proportion, mu), ci: [cohensH(ci[0], mu), cohensH(ci[1], mu)]},
      variant: 'exact',
      details: {successes, trials, null_proportion: mu},
    };
  },
};
