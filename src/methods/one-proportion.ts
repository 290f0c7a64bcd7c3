import {checkProportion, cohensH} from './shared/proportion-checks.js';
import {wilsonInterval} from './shared/wilson-interval.js';
import {zTestP} from './shared/z-test-p.js';
import type {MethodDefinition, ProportionDesign} from './types.js';

/**
 * The one-proportion z test (score test): z = (p̂ - p₀) / √(p₀(1 - p₀)/n),
 * with the standard error under the null (Agresti 2013, "Categorical Data
 * Analysis", 3rd ed., §1.3; R's prop.test(correct = FALSE), whose X² is
 * z²). The Wilson interval (shared/wilson-interval.ts) inverts this same
 * test, so the interval and the p-value agree. Warns when n·p₀ or
 * n·(1 - p₀) is below 5 and points to the exact `binomial` test.
 *
 * Effect: Cohen's h against `mu`, with the interval mapped from the Wilson
 * bounds.
 *
 * @example 52 of 100 against 0.5: z = 0.4, p = 0.6892, CI [0.4232, 0.6154]
 */
export const oneProportion: MethodDefinition<ProportionDesign> = {
  id: 'one-proportion',
  title: 'one-proportion z test',
  design: 'proportion',
  question: 'proportion',
  needsMu: true,
  needsSuccess: true,
  compute(design, options) {
    const {successes, trials, success} = design;
    const mu = options.mu;
    checkProportion(design, mu, 'The one-proportion z test');
    const proportion = successes / trials;
    const z = (successes - trials * mu) / Math.sqrt(trials * mu * (1 - mu));
    const ci = wilsonInterval(successes, trials, options.confidence, options.alternative);
    const small = Math.min(trials * mu, trials * (1 - mu)) < 5;
    return {
      statistic: {name: 'z', value: z},
      df: null,
      p: zTestP(z, options.alternative),
      estimate: {name: `proportion of ${success}`, value: proportion, ci, level: options.confidence},
      effect: {name: 'cohens-h', value: cohensH(proportion, mu), ci: [cohensH(ci[0], mu), cohensH(ci[1], mu)]},
      ...(small
        ? {warnings: [{kind: 'few-expected' as const, trials, mu, alternative: 'binomial'}]}
        : {}),
      details: {successes, trials, null_proportion: mu},
    };
  },
};
