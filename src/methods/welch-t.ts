import {summarize} from './shared/summarize.js';
import {tInference} from './shared/t-inference.js';
import {tSensitivity} from './shared/t-sensitivity.js';
import {pooledHedgesG, welchStandardError} from './shared/two-group-t.js';
import type {MethodDefinition, TwoGroupDesign} from './types.js';

/**
 * Welch's unequal-variances t test (Welch 1947, Biometrika 34(1-2)):
 * t = (m2 - m1) / sqrt(s1²/n1 + s2²/n2) with the Welch–Satterthwaite df
 * (Satterthwaite 1946, Biometrics Bulletin 2(6)).
 *
 * Hedges' g keeps the pooled-SD standardizer, and its interval inverts the
 * pooled t on n1 + n2 - 2 df, so the effect size means the same thing in
 * every two-group block; sensitivity uses the Welch standard error and df.
 */
export const welchT: MethodDefinition<TwoGroupDesign> = {
  id: 'welch-t',
  title: 'Welch’s t test',
  design: 'two-group',
  compute({first, second}, options) {
    const a = summarize(first.values);
    const b = summarize(second.values);
    const {se, df} = welchStandardError(a, b);
    const difference = b.mean - a.mean;
    const inference = tInference({
      estimate: difference,
      se,
      df,
      nullValue: 0,
      alternative: options.alternative,
      confidence: options.confidence,
    });
    return {
      statistic: {name: 't', value: inference.t},
      df,
      p: inference.p,
      estimate: {
        name: `difference in means (${second.label} - ${first.label})`,
        value: difference,
        ci: inference.ci,
        level: options.confidence,
      },
      effect: pooledHedgesG(a, b, options.alternative, options.confidence),
      sensitivity: tSensitivity({
        ncpPerUnit: 1 / se,
        df,
        alpha: options.alpha,
        alternative: options.alternative,
        smallestEffect: options.smallestEffect,
      }),
    };
  },
};
