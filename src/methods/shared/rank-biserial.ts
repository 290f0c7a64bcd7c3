import {normalQuantile} from '../../distributions/normal.js';
import type {Alternative, EffectSize} from '../types.js';
import {tailAlpha} from './sided-p.js';

/**
 * The rank-biserial correlation: the proportion of favourable minus
 * unfavourable comparisons (Kerby 2014, "The simple difference formula: an
 * approach to teaching nonparametric correlation", Comprehensive Psychology
 * 3:11.IT.3.1). For two groups r = (U_second - U_first)/(mn), Glass's (1965)
 * form, equal to Cliff's delta; for pairs r = (T+ - T-)/(T+ + T-), the
 * matched-pairs form (King, Rosopa & Minium 2011, "Statistical Reasoning in
 * the Behavioral Sciences", 6th ed.). Positive when the second condition
 * tends to be larger.
 *
 * Interval: a normal approximation on Fisher's z = atanh(r) scale with the
 * standard deviation of r under the null, √((m+n+1)/(3mn)) for two groups
 * and √(n(n+1)(2n+1)/6)/(n(n+1)/2) for pairs (the rank statistics' null
 * variances rescaled), as in the R package effectsize (Ben-Shachar,
 * Lüdecke & Makowski 2020, JOSS 5(56):2815). It is an approximation: the
 * null spread is used whatever the true effect, and it ignores ties.
 *
 * At complete separation (|r| = 1) atanh is infinite and the interval
 * would collapse onto the boundary; the inner bound is then computed from r
 * moved half a step of the statistic inwards (1 - `halfStep`), a
 * continuity adjustment in the spirit of Haldane's ½ for empty cells, and
 * the outer bound stays at ±1.
 */
export interface RankBiserialInput {
  readonly r: number;
  /** Null standard deviation of r. */
  readonly sd: number;
  /** Half the change in r from one unit of the rank statistic: 1/(mn) or 1/(n(n+1)/2). */
  readonly halfStep: number;
  readonly alternative: Alternative;
  readonly confidence: number;
}

export function rankBiserial(input: RankBiserialInput): EffectSize {
  const {r, sd, halfStep, alternative, confidence} = input;
  const adjusted = Math.abs(r) >= 1 ? Math.sign(r) * (1 - halfStep) : r;
  const z = Math.atanh(adjusted);
  const half = -normalQuantile(tailAlpha(alternative, confidence)) * sd;
  const lower = alternative === 'less' || r <= -1 ? -1 : Math.tanh(z - half);
  const upper = alternative === 'greater' || r >= 1 ? 1 : Math.tanh(z + half);
  return {name: 'rank-biserial', value: r, ci: [lower, upper]};
}
