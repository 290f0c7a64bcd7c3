import {chiSquareCdf, chiSquareQuantile, chiSquareSf, chiSquareUpperQuantile} from '../../distributions/chi-square.js';
import {findRoot} from '../../distributions/find-root.js';
import {noncentralFNcpForCdf} from '../../distributions/noncentral-f.js';
import {logGamma} from '../../distributions/poisson-term.js';

/**
 * Confidence interval for R² of a regression with fixed predictors, by
 * inverting the noncentral F distribution of the overall F statistic in its
 * noncentrality λ (Steiger & Fouladi 1997, in Harlow, Mulaik & Steiger
 * (eds) "What if there were no significance tests?", ch. 9; Steiger 2004,
 * Psychol. Methods 9:164–182): λ_L and λ_U solve P(F > F_obs; λ_L) = α/2 and
 * P(F ≤ F_obs; λ_U) = α/2 (0 when the central F already passes the target),
 * and each maps to the population R² of the design, λ/(λ + n): with
 * λ = β'X'Xβ/σ² (X centred when there is an intercept) this is
 * β'X'Xβ/(β'X'Xβ + nσ²), the fixed-regressor conversion of Kelley's MBESS
 * `ci.R2` and the η² interval of shared/eta-squared-interval.ts. The
 * interval is two-sided at `confidence` whatever the block's alternative:
 * R² has no direction.
 *
 * The noncentral F series costs about 20√(λ/2) terms per evaluation (0.4 s
 * for NIST Norris, λ ≈ 5e6). Beyond λ = 1e7 the bounds come from a
 * second-order expansion in the numerator's spread instead: with
 * X = χ²(df1, λ) ≈ m + sZ, m = λ + df1, s² = 2(df1 + 2λ), V = χ²(df2) and
 * c = F·df1/df2,
 *   P(F ≤ F_obs) = P(X ≤ cV) ≈ S_V(v) − s²/(2c²)·f_V'(v),  v = m/c,
 * whose neglected terms are smaller by the ratio of the numerator's relative
 * spread (2/√λ) to the denominator's (√(2/df2)). Measured against the exact
 * series for λ from 1.2e7 to 2e8 and df2 from 1 to 1e5: λ within 1.3e-9
 * relative, except 2.7e-7 at λ = 1.2e7, df2 = 1e5, which moves R² by 2e-9.
 */
export const EXACT_MAX_LAMBDA = 1e7;

export function rSquaredInterval(
  f: number,
  df1: number,
  df2: number,
  n: number,
  confidence: number,
): readonly [number, number] {
  const tail = (1 - confidence) / 2;
  const toR2 = (lambda: number): number => (lambda === Infinity ? 1 : lambda / (lambda + n));
  if (f === 0) return [0, 0];
  return [toR2(ncpForTail(f, df1, df2, tail, true)), toR2(ncpForTail(f, df1, df2, tail, false))];
}

/** λ where P(F > f) (upper) or P(F ≤ f) equals target; 0 when λ = 0 already passes it. */
function ncpForTail(f: number, df1: number, df2: number, target: number, upper: boolean): number {
  if (f === Infinity) return Infinity;
  // First order, χ²(df1, λ) ≈ λ + df1: λ = df1·F·Q/df2 − df1 with Q the χ²(df2) quantile.
  const q = upper ? chiSquareQuantile(target, df2) : chiSquareUpperQuantile(target, df2);
  const firstOrder = (df1 * f * q) / df2 - df1;
  if (!(firstOrder > EXACT_MAX_LAMBDA)) {
    return noncentralFNcpForCdf(f, df1, df2, upper ? 1 - target : target);
  }
  const c = (f * df1) / df2;
  const g = (lambda: number): number => {
    const v = (lambda + df1) / c;
    const spread = (2 * (df1 + 2 * lambda)) / (2 * c * c);
    const slope = chiSquareDensity(v, df2) * ((df2 / 2 - 1) / v - 0.5);
    // Upper tail P(F > f) = F_V(v) + spread·f_V'(v) rises with λ; the lower tail falls.
    return upper ? chiSquareCdf(v, df2) + spread * slope - target : target - (chiSquareSf(v, df2) - spread * slope);
  };
  const step = 1e-3 * firstOrder;
  let lo = firstOrder - step;
  let hi = firstOrder + step;
  while (g(lo) > 0) lo -= step;
  while (g(hi) < 0) hi += step;
  return findRoot(g, lo, hi);
}

/** Density of χ²(k) at v > 0. */
function chiSquareDensity(v: number, k: number): number {
  return Math.exp((k / 2 - 1) * Math.log(v / 2) - v / 2 - logGamma(k / 2)) / 2;
}
