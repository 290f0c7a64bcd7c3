import {noncentralTNcpForCdf} from '../../distributions/noncentral-t.js';
import type {Alternative, EffectSize} from '../types.js';

/**
 * Hedges' g: a standardized mean difference with the small-sample bias
 * correction J = 1 - 3 / (4 df - 1) (Hedges & Olkin 1985, "Statistical Methods
 * for Meta-Analysis", eq. 5.10; the form used by Lakens 2013, Front. Psychol.
 * 4:863, eq. 4).
 *
 * Its interval inverts the noncentral t distribution of the t statistic
 * (Steiger & Fouladi 1997; Cumming & Finch 2001, Educ. Psychol. Meas. 61(4)):
 * find the noncentrality parameters at which the observed t sits at the
 * interval's tail probabilities, convert them to the d scale with `scale`
 * (d = ncp * scale), then apply J to the bounds.
 */
export interface HedgesGInput {
  /** Cohen's d: the difference divided by the standardizer. */
  readonly d: number;
  /** The t statistic whose noncentrality is d / scale. */
  readonly t: number;
  readonly df: number;
  /** d = ncp * scale: sqrt(1/n1 + 1/n2) for two groups, 1/sqrt(n) for one. */
  readonly scale: number;
  readonly alternative: Alternative;
  readonly confidence: number;
  /** What the difference was divided by, in words. */
  readonly standardizer: string;
}

export function hedgesG(input: HedgesGInput): EffectSize {
  const {d, t, df, scale, alternative, confidence} = input;
  const j = 1 - 3 / (4 * df - 1);
  const tail = alternative === 'two-sided' ? (1 - confidence) / 2 : 1 - confidence;
  const lower = alternative === 'less' ? -Infinity : noncentralTNcpForCdf(t, df, 1 - tail) * scale * j;
  const upper = alternative === 'greater' ? Infinity : noncentralTNcpForCdf(t, df, tail) * scale * j;
  return {name: 'hedges-g', value: d * j, ci: [lower, upper], standardizer: input.standardizer};
}
