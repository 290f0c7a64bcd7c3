import {pooledSd} from './shared/pooled-sd.js';
import {twoGroupTOutcome} from './shared/two-group-t.js';
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
  compute(design, options) {
    return twoGroupTOutcome(design, options, (a, b) => ({
      se: pooledSd(a, b) * Math.sqrt(1 / a.n + 1 / b.n),
      df: a.n + b.n - 2,
    }));
  },
};
