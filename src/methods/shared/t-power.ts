import {findRoot} from '../../distributions/find-root.js';
import {noncentralTCdf, noncentralTNcpForSf, noncentralTSf} from '../../distributions/noncentral-t.js';
import {studentTQuantile} from '../../distributions/student-t.js';
import type {Alternative} from '../types.js';

/**
 * Power of the one-sample, paired and two-sample t tests from the noncentral
 * t distribution of the statistic under the alternative (Owen 1965,
 * Technometrics 7:78; Cohen 1988, "Statistical Power Analysis", ch. 2).
 * Callers convert an effect δ (outcome units) to the noncentrality:
 * one-sample and paired ncp = δ/sd·√n; two-sample ncp = δ/sd_pooled ·
 * √(n₁n₂/(n₁+n₂)).
 *
 * Two-sided power counts both rejection regions, P(T > t_{1-α/2}) +
 * P(T < -t_{1-α/2}), as statsmodels does; R's power.t.test (strict = FALSE)
 * drops the far region, which changes the power by 2e-7 at n = 20 per
 * group, δ = sd. Critical values are taken as -t_{α}, never t_{1-α}, so that
 * tiny α keeps its digits. Invalid numbers give NaN.
 *
 * @example tTestPower({ncp: Math.sqrt(10), df: 38, alpha: 0.05, alternative: 'two-sided'}) // 0.86895302…
 */

export interface TTestPowerInput {
  /** Noncentrality of the t statistic; negative for effects below the null. */
  readonly ncp: number;
  readonly df: number;
  /** Significance level, 0 < alpha < 1. */
  readonly alpha: number;
  readonly alternative: Alternative;
}

export interface TTestNcpForPowerInput {
  /** Target power, 0 < power < 1. */
  readonly power: number;
  readonly df: number;
  readonly alpha: number;
  readonly alternative: Alternative;
}

function isProbability(p: number): boolean {
  return p > 0 && p < 1;
}

/** The probability that the test rejects when the statistic has noncentrality `ncp`. */
export function tTestPower(input: TTestPowerInput): number {
  const {ncp, df, alpha, alternative} = input;
  if (Number.isNaN(ncp) || !(df > 0) || !isProbability(alpha)) return NaN;
  if (alternative === 'greater') return noncentralTSf(-studentTQuantile(alpha, df), df, ncp);
  if (alternative === 'less') return noncentralTCdf(studentTQuantile(alpha, df), df, ncp);
  if (alternative !== 'two-sided') throw new Error(`tTestPower: unknown alternative "${String(alternative)}"`);
  const critical = -studentTQuantile(alpha / 2, df);
  return noncentralTSf(critical, df, ncp) + noncentralTCdf(-critical, df, ncp);
}

/**
 * The smallest noncentrality magnitude at which the test reaches `power`
 * (for `less` the effect points downwards; the magnitude is returned). The
 * power at ncp = 0 is alpha, so a target ≤ alpha gives 0.
 */
export function tTestNcpForPower(input: TTestNcpForPowerInput): number {
  const {power, df, alpha, alternative} = input;
  if (!isProbability(power) || !(df > 0) || !isProbability(alpha)) return NaN;
  if (alternative !== 'two-sided' && alternative !== 'greater' && alternative !== 'less') {
    throw new Error(`tTestNcpForPower: unknown alternative "${String(alternative)}"`);
  }
  if (power <= alpha) return 0;
  if (alternative !== 'two-sided') {
    // P(T < t_α; -δ) = P(T > -t_α; δ): `less` mirrors `greater`.
    return noncentralTNcpForSf(-studentTQuantile(alpha, df), df, power);
  }
  const critical = -studentTQuantile(alpha / 2, df);
  // The far region adds between 0 and α/2 (its value at ncp = 0) to the
  // near one, so the root lies between the one-sided solutions for
  // power - α/2 and power.
  const upper = noncentralTNcpForSf(critical, df, power);
  const lower = noncentralTNcpForSf(critical, df, power - alpha / 2);
  if (!(upper > lower)) return upper;
  const excess = (ncp: number): number =>
    noncentralTSf(critical, df, ncp) + noncentralTCdf(-critical, df, ncp) - power;
  if (excess(upper) <= 0) return upper;
  if (excess(lower) >= 0) return lower;
  return findRoot(excess, lower, upper);
}
