import {chiSquareQuantile, chiSquareUpperQuantile} from '../../distributions/chi-square.js';
import {findRoot} from '../../distributions/find-root.js';
import {NONCENTRAL_F_MAX_LAMBDA, noncentralFTail} from './noncentral-f.js';

/**
 * Confidence interval for R² of a regression with fixed predictors, by
 * inverting the noncentral F distribution of the overall F statistic in its
 * noncentrality λ (Steiger & Fouladi 1997, in Harlow, Mulaik & Steiger
 * (eds) "What if there were no significance tests?", ch. 9; Steiger 2004,
 * Psychol. Methods 9:164–182): λ_L and λ_U solve
 * P(F > F_obs; λ_L) = α/2 and P(F ≤ F_obs; λ_U) = α/2 (0 when the central F
 * already passes the target), and each maps to the population R² of the
 * design, λ/(λ + n) (the fixed-regressor conversion of Kelley's MBESS
 * `ci.R2`; with λ = β'X'Xβ/σ², centred when there is an intercept, this is
 * β'X'Xβ/(β'X'Xβ + nσ²)). The interval is two-sided at `confidence`
 * whatever the block's alternative: R² has no direction.
 *
 * Beyond λ = 5e8 the Poisson sum grows long (17√(λ/2) terms per
 * evaluation), and χ²(df1, λ) ≈ λ + df1 holds to 2/√λ < 1e-4 relative, so
 * λ = df1·F·Q/df2 − df1 with Q the χ²(df2) quantile at the tail. Measured at
 * F = 6e8 on (1, 1e5) df: the exact tail at that λ is 0.025019 for a target
 * of 0.025, which moves each bound of R² by about 1.5e-6 of its distance
 * from 1 (2.5e-10 there).
 */
export function rSquaredInterval(
  f: number,
  df1: number,
  df2: number,
  n: number,
  confidence: number,
): readonly [number, number] {
  const tail = (1 - confidence) / 2;
  const lower = ncpForTail(f, df1, df2, tail, true);
  const upper = ncpForTail(f, df1, df2, tail, false);
  return [lower / (lower + n), upper / (upper + n)];
}

/** λ ≥ 0 where the upper (P(F > f)) or lower tail at f equals target; 0 if it cannot. */
function ncpForTail(f: number, df1: number, df2: number, target: number, upper: boolean): number {
  if (f === Infinity) return Infinity;
  // The upper tail rises with λ, the lower tail falls.
  const g = (lambda: number): number => (upper ? 1 : -1) * (noncentralFTail(f, df1, df2, lambda, upper) - target);
  if (g(0) >= 0) return 0;
  const asymptotic = upper
    ? (df1 * f * chiSquareQuantile(target, df2)) / df2 - df1
    : (df1 * f * chiSquareUpperQuantile(target, df2)) / df2 - df1;
  if (asymptotic > NONCENTRAL_F_MAX_LAMBDA / 2) return asymptotic;
  let lo = 0;
  let hi = Math.max(1, asymptotic);
  while (g(hi) < 0) {
    lo = hi;
    hi *= 2;
    if (hi > NONCENTRAL_F_MAX_LAMBDA) return asymptotic;
  }
  return findRoot(g, lo, hi);
}
