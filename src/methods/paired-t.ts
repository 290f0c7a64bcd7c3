import {hedgesG} from './shared/hedges-g.js';
import {summarize} from './shared/summarize.js';
import {tInference} from './shared/t-inference.js';
import {tSensitivity} from './shared/t-sensitivity.js';
import type {MethodDefinition, PairedDesign} from './types.js';

/**
 * Paired t test: a one-sample t test on the within-pair differences
 * `second - first` (Student 1908). Effect: Hedges' g_z, the mean difference
 * over the SD of the differences with J on n - 1 df (Lakens 2013, eq. 6),
 * and its noncentral-t interval.
 */
export const pairedT: MethodDefinition<PairedDesign> = {
  id: 'paired-t',
  title: 'paired t test',
  design: 'paired',
  compute({first, second}, options) {
    const differences = second.values.map((value, i) => value - first.values[i]!);
    const {n, mean, sd} = summarize(differences);
    const df = n - 1;
    const inference = tInference({
      estimate: mean,
      se: sd / Math.sqrt(n),
      df,
      nullValue: options.mu,
      alternative: options.alternative,
      confidence: options.confidence,
    });
    return {
      statistic: {name: 't', value: inference.t},
      df,
      p: inference.p,
      estimate: {
        name: `mean difference (${second.label} - ${first.label})`,
        value: mean,
        ci: inference.ci,
        level: options.confidence,
      },
      effect: hedgesG({
        d: (mean - options.mu) / sd,
        t: inference.t,
        df,
        scale: 1 / Math.sqrt(n),
        alternative: options.alternative,
        confidence: options.confidence,
        standardizer: 'standard deviation of the differences',
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
