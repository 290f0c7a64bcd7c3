import {noncentralFNcpForCdf} from '../../distributions/noncentral-f.js';

/**
 * Confidence interval for the population proportion of variance explained
 * (η², which ω² estimates too) by inverting the noncentral F distribution
 * of the F statistic (Steiger 2004, Psychological Methods 9:164, §"Confidence
 * intervals for η²"; Smithson 2001, Educ. Psychol. Meas. 61:605): the bounds
 * on the noncentrality λ are the values at which the observed F sits at the
 * upper and lower tail probability (1 - confidence)/2, and each becomes
 * λ/(λ + N) on the η² scale. A bound whose λ would be negative is 0, so the
 * lower bound is 0 whenever p > (1 - confidence)/2.
 *
 * The interval is two-sided at the block's confidence. Steiger suggests a
 * 90% interval beside an α = .05 F test, whose lower bound excludes 0
 * exactly when p < .05; that choice is left to the block's `confidence`.
 *
 * @example etaSquaredInterval(6, 1, 42, 44, 0.9) // [0.0117…, 0.2801…] (Smithson 2001, p. 619)
 */
export function etaSquaredInterval(
  f: number,
  df1: number,
  df2: number,
  n: number,
  confidence: number,
): readonly [number, number] {
  // F = 0 sits at the bottom of every noncentral F: the interval collapses to 0.
  if (f === 0) return [0, 0];
  const tail = (1 - confidence) / 2;
  const toEta = (ncp: number): number => (ncp === Infinity ? 1 : ncp / (ncp + n));
  return [toEta(noncentralFNcpForCdf(f, df1, df2, 1 - tail)), toEta(noncentralFNcpForCdf(f, df1, df2, tail))];
}
