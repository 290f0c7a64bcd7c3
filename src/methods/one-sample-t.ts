import {hedgesG} from './shared/hedges-g.js';
import {summarize} from './shared/summarize.js';
import {tInference} from './shared/t-inference.js';
import {tSensitivity} from './shared/t-sensitivity.js';
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
    const {n, mean, sd} = summarize(sample.values);
    const df = n - 1;
    const se = sd / Math.sqrt(n);
    const inference = tInference({
      estimate: mean,
      se,
      df,
      nullValue: options.mu,
      alternative: options.alternative,
      confidence: options.confidence,
    });
    return {
      statistic: {name: 't', value: inference.t},
      df,
      p: inference.p,
      estimate: {name: 'mean', value: mean, ci: inference.ci, level: options.confidence},
      effect: hedgesG({
        d: (mean - options.mu) / sd,
        t: inference.t,
        df,
        scale: 1 / Math.sqrt(n),
        alternative: options.alternative,
        confidence: options.confidence,
        standardizer: 'standard deviation',
      }),
      sensitivity: tSensitivity({
        ncpPerUnit: Math.sqrt(n) / sd,
        df,
        alpha: options.alpha,
        alternative: options.alternative,
        smallestEffect: options.smallestEffect,
      }),
    };
  },
};
