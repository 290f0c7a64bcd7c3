import {twoGroupTOutcome, welchStandardError} from './shared/two-group-t.js';
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
  compute: (design, options) => twoGroupTOutcome(design, options, welchStandardError),
};
