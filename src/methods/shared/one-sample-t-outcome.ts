import type {MethodOptions, MethodOutcome} from '../types.js';
import {hedgesG} from './hedges-g.js';
import {summarize} from './summarize.js';
import {tInference} from './t-inference.js';
import {tSensitivity} from './t-sensitivity.js';

/**
 * The one-sample t test on a set of values against `options.mu`, shared by
 * the one-sample test (the values themselves) and the paired test (the
 * within-pair differences): t = (mean - mu) / (sd / sqrt(n)) on n - 1 df,
 * Hedges' g with its noncentral-t interval, and the design's sensitivity.
 */
export function oneSampleTOutcome(
  values: Float64Array,
  options: MethodOptions,
  words: {readonly estimate: string; readonly standardizer: string},
): MethodOutcome {
  const {n, mean, sd} = summarize(values);
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
    estimate: {name: words.estimate, value: mean, ci: inference.ci, level: options.confidence},
    effect: hedgesG({
      d: (mean - options.mu) / sd,
      t: inference.t,
      df,
      scale: 1 / Math.sqrt(n),
      alternative: options.alternative,
      confidence: options.confidence,
      standardizer: words.standardizer,
    }),
    sensitivity: tSensitivity({
      ncpPerUnit: Math.sqrt(n) / sd,
      df,
      alpha: options.alpha,
      alternative: options.alternative,
      smallestEffect: options.smallestEffect,
    }),
  };
}
