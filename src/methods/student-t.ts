import {pooledSd} from './shared/pooled-sd.js';
import {summarize} from './shared/summarize.js';
import {tInference} from './shared/t-inference.js';
import {tSensitivity} from './shared/t-sensitivity.js';
import {pooledHedgesG} from './shared/two-group-t.js';
import type {MethodDefinition, TwoGroupDesign} from './types.js';

/**
 * Student's two-sample t test with pooled variance (Student 1908; Fisher
 * 1925, "Statistical Methods for Research Workers", §24): t = (m2 - m1) /
 * (sp sqrt(1/n1 + 1/n2)) on n1 + n2 - 2 df. Assumes equal population
 * variances; the block stage reports Levene's check and points to `welch-t`.
 */
export const studentT: MethodDefinition<TwoGroupDesign> = {
  id: 'student-t',
  title: 'Student’s t test',
  design: 'two-group',
  compute({first, second}, options) {
    const a = summarize(first.values);
    const b = summarize(second.values);
    const df = a.n + b.n - 2;
    const sp = pooledSd(a, b);
    const scale = Math.sqrt(1 / a.n + 1 / b.n);
    const inference = tInference({
      estimate: b.mean - a.mean,
      se: sp * scale,
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
        value: b.mean - a.mean,
        ci: inference.ci,
        level: options.confidence,
      },
      effect: pooledHedgesG(a, b, options.alternative, options.confidence),
      sensitivity: tSensitivity({
        ncpPerUnit: 1 / (sp * scale),
        df,
        alpha: options.alpha,
        alternative: options.alternative,
        smallestEffect: options.smallestEffect,
      }),
    };
  },
};
