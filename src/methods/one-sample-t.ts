import {oneSampleTOutcome} from './shared/one-sample-t-outcome.js';
import type {MethodDefinition, OneSampleDesign} from './types.js';

/**
 * One-sample Student t test of a mean against `mu` (Student 1908, Biometrika
 * 6(1)): t = (mean - mu) / (sd / sqrt(n)) on n - 1 degrees of freedom.
 * Effect: Hedges' g = J (mean - mu) / sd with a noncentral-t interval.
 */
export const oneSampleT: MethodDefinition<OneSampleDesign> = {
  id: 'one-sample-t',
  title: 'one-sample t test',
  design: 'one-sample',
  needsMu: true,
  compute({sample}, options) {
    return oneSampleTOutcome(sample.values, options, {estimate: 'mean', standardizer: 'standard deviation'});
  },
};
