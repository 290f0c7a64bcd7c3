import {findRoot} from './find-root.js';
import {incompleteGamma} from './incomplete-gamma.js';
import {poissonTerm} from './poisson-term.js';
import {CompensatedSum} from './compensated-sum.js';

/**
 * The noncentral chi-square distribution χ²_ν(λ) with real df ν > 0 (finite)
 * and noncentrality λ ≥ 0: cdf, survival function, and the λ at which either
 * tail takes a given value (for intervals of Cramér's V and Cohen's w by
 * inverting the chi-square test: Smithson 2003, "Confidence Intervals", Sage
 * QASS 140, ch. 4).
 *
 * Both tails are Poisson mixtures of central chi-square tails (Johnson, Kotz
 * & Balakrishnan 1995, "Continuous Univariate Distributions" vol. 2,
 * ch. 29), with y = x/2, k = ν/2 and weights w_j = e^{-μ} μ^j / j!, μ = λ/2:
 *
 *   P(X ≤ x) = Σ_j w_j P(k + j, y),   P(X > x) = Σ_j w_j Q(k + j, y)
 *
 * with P, Q the regularized incomplete gamma functions. Every term is
 * positive, so each tail is summed directly (never 1 - cdf). As in Benton &
 * Krishnamoorthy (2003, Comput. Stat. Data Anal. 43:249) one incomplete
 * gamma is evaluated and the others follow from the recurrence
 * P(a, y) = P(a+1, y) + e^{-y} y^a / Γ(a+1) (A&S 6.5.21), run only in the
 * direction in which it adds: downwards from μ + 10√μ + 40 for the cdf,
 * upwards from μ - 10√μ - 10 for the survival function (the same scheme as
 * noncentral-f.ts). Weights and recurrence terms come directly from Loader's
 * saddle-point Poisson term at every step, without drift. Terms left out are
 * bounded by the Poisson tail beyond the start and, at the end, by a
 * geometric bound on the remaining weights (below 1e-17 of the sum).
 * Measured against a 40-digit mpmath evaluation of the series for ν from 1
 * to 500, λ from 0.5 to 5000, x from the mean - 6 sd to the mean + 60 sd and
 * both tails down to 1e-246: at least 12.9 digits, 13.3 above 1e-240 (the
 * central incomplete gamma sets that floor); the ncp solvers agree with
 * 40-digit roots to 15 digits. See test/distributions/noncentral-chi-square.test.ts.
 *
 * @example noncentralChiSquareSf(30.07, 2, 10) // 0.0138438967…
 */

const TRUNCATION = 1e-17;

/** Σ_j w_j P(k + j, y), downwards from where the remaining weights are negligible. */
function lowerSeries(k: number, y: number, mu: number): number {
  let j = Math.ceil(mu + 10 * Math.sqrt(mu) + 40);
  let a = k + j;
  let p = incompleteGamma(a, y, false);
  const sum = new CompensatedSum();
  sum.add(poissonTerm(j, mu) * p);
  while (j > 0) {
    j -= 1;
    a -= 1;
    p += poissonTerm(a, y);
    const w = poissonTerm(j, mu);
    sum.add(w * p);
    // Below the mode the weights shrink at least geometrically by j/μ, and P ≤ 1.
    if (j < mu && (w * j) / (mu - j) <= TRUNCATION * sum.value) break;
  }
  return sum.value;
}

/** Σ_j w_j Q(k + j, y), upwards from where the earlier weights are negligible. */
function upperSeries(k: number, y: number, mu: number): number {
  let j = Math.max(0, Math.floor(mu - 10 * Math.sqrt(mu) - 10));
  let a = k + j;
  let q = incompleteGamma(a, y, true);
  const sum = new CompensatedSum();
  sum.add(poissonTerm(j, mu) * q);
  const limit = j + 100 + 20 * Math.ceil(mu + 10 * Math.sqrt(mu));
  while (j < limit) {
    q += poissonTerm(a, y);
    a += 1;
    j += 1;
    const w = poissonTerm(j, mu);
    sum.add(w * q);
    // Above the mode the weights shrink at least geometrically by μ/(j+1), and Q ≤ 1.
    if (j + 1 > mu && (w * mu) / (j + 1 - mu) <= TRUNCATION * sum.value) break;
  }
  return sum.value;
}

function validParameters(df: number, ncp: number): boolean {
  return df > 0 && df < Infinity && ncp >= 0;
}

/** P(X ≤ x) (upper false) or P(X > x) (upper true). */
function tail(x: number, df: number, ncp: number, upper: boolean): number {
  if (Number.isNaN(x) || !validParameters(df, ncp)) return NaN;
  if (!(x > 0) || ncp === Infinity) return upper ? 1 : 0;
  if (x === Infinity) return upper ? 0 : 1;
  const k = df / 2;
  const y = x / 2;
  if (ncp === 0) return incompleteGamma(k, y, upper);
  const mu = ncp / 2;
  return Math.min(1, upper ? upperSeries(k, y, mu) : lowerSeries(k, y, mu));
}

/** P(X ≤ x) for noncentrality ncp ≥ 0. */
export function noncentralChiSquareCdf(x: number, df: number, ncp: number): number {
  return tail(x, df, ncp, false);
}

/** P(X > x) for noncentrality ncp ≥ 0, summed directly (never 1 - cdf). */
export function noncentralChiSquareSf(x: number, df: number, ncp: number): number {
  return tail(x, df, ncp, true);
}

/**
 * The ncp ≥ 0 at which P(X ≤ x) = p; the cdf decreases in ncp, so the root
 * is unique. When even the central cdf is at or below p no ncp ≥ 0 reaches
 * it and the result is 0 (the boundary, as a confidence bound needs). p = 0
 * gives Infinity; invalid input or x outside (0, ∞) gives NaN.
 */
export function noncentralChiSquareNcpForCdf(x: number, df: number, p: number): number {
  if (!(p >= 0 && p <= 1)) return NaN;
  return p > 0.5 ? ncpForTail(x, df, 1 - p, true) : ncpForTail(x, df, p, false);
}

/** The ncp ≥ 0 at which P(X > x) = q (increasing in ncp); as noncentralChiSquareNcpForCdf. */
export function noncentralChiSquareNcpForSf(x: number, df: number, q: number): number {
  if (!(q >= 0 && q <= 1)) return NaN;
  return q > 0.5 ? ncpForTail(x, df, 1 - q, false) : ncpForTail(x, df, q, true);
}

/**
 * The ncp at which the lower (upper = false) or upper tail at x equals
 * target ≤ ½, solved with Brent's method on that tail, which keeps relative
 * accuracy at small targets.
 */
function ncpForTail(x: number, df: number, target: number, upper: boolean): number {
  if (!(x > 0 && x < Infinity) || !validParameters(df, 0) || Number.isNaN(target)) return NaN;
  // A lower tail of 0 needs ncp = ∞; an upper tail of 0 lies below the central one.
  if (target === 0) return upper ? 0 : Infinity;
  // Decreasing in ncp on either side: the cdf falls and the survival function rises.
  const excess = (ncp: number): number => (upper ? target - tail(x, df, ncp, true) : tail(x, df, ncp, false) - target);
  if (excess(0) <= 0) return 0;
  // E[X] = ν + λ: start the bracket near x - ν, doubling outwards.
  let lo = 0;
  let hi = Math.max(4, 2 * x);
  for (let i = 0; i < 200 && excess(hi) > 0; i++) {
    lo = hi;
    hi *= 2;
  }
  if (!(excess(hi) <= 0)) return NaN;
  return findRoot(excess, lo, hi);
}
