import {bracketRoot, findRoot} from './find-root.js';
import {normalRangeTail} from './normal-range.js';
import {stirlingError} from './poisson-term.js';
import {studentTQuantile} from './student-t.js';
import {trapezoidWalk} from './trapezoid-walk.js';

/**
 * The studentized range distribution Q = W/S: the range W of k independent
 * standard normals over an independent S with νS² ~ χ²_ν (the reference
 * distribution of Tukey's HSD and the Games–Howell procedure). Cdf, survival
 * function and quantile for integer k ≥ 2 and real ν > 0; ν = Infinity
 * gives the range of k normals itself.
 *
 * The double integral of Copenhaver & Holland (1988, "Computation of the
 * distribution of the maximum studentized range statistic with application
 * to multiple significance testing of simple effects", J. Statist. Comput.
 * Simul. 30:1-15), taken over u = log S:
 *
 *   P(Q ≤ q) = ∫ ν p(ν/2, (ν/2) e^{2u}) P(W ≤ q e^u) du,
 *
 * with p(α, λ) = e^{-λ} λ^α / Γ(α+1) in Loader's saddle-point form
 * exp(-δ(α) - α(e^{2u} - 1 - 2u)) / √(2πα), accurate for any ν, and the
 * inner range probabilities of normal-range.ts. Where Copenhaver & Holland
 * use fixed Gauss-Legendre panels, both levels here use the trapezoidal
 * rule on the whole line with step halving (trapezoid-walk.ts): the
 * integrands are analytic and decay fast, where it converges geometrically
 * and needed half or fewer of the nodes for the same digits. Each tail is an
 * integral of positive terms, so the survival function keeps full relative
 * precision far into the tail (it falls like q^-ν for small ν).
 *
 * Measured (test/distributions/studentized-range.test.ts): against mpmath
 * 1.3.0 double integration at 20-200 digits, 14.5-16 digits for k = 2-20
 * and ν = 1-∞ (non-integer too), tails down to 1e-175 included, and
 * quantiles to 14.6 digits; against the exact k = 2 case (Student's t) at
 * least 13.3 digits for ν from 0.5 to 1e15 and tails down to 1e-275, the
 * loss being the conditioning of the far tail; 14 digits at q = 1e100,
 * ν = 3 (p = 1.3e-299) against the q^-ν asymptote; self-consistency
 * (halved steps, tighter tolerances) at least 13.4 digits over k = 2-1000,
 * ν = 1-∞, q = 0.05-1e4. jstat, a port of R's ptukey, is wrong in the
 * upper tail for ν ≤ 5 (q(0.999; 10, 2): 58.85 against 100.498). A call
 * costs about 5,000 integrand evaluations (10,000 of Φ, a few ms); the
 * quantile about ten calls.
 *
 * @example studentizedRangeSf(3.877, 3, 10) // 0.04998708875325442
 */

function isValid(k: number, df: number): boolean {
  return Number.isInteger(k) && k >= 2 && df > 0;
}

/** e^w - 1 - w without cancellation for small |w| (its Taylor series). */
function expm1mx(w: number): number {
  if (Math.abs(w) > 0.5) return Math.expm1(w) - w;
  let term = (w * w) / 2;
  let sum = term;
  for (let n = 3; n < 40; n++) {
    term *= w / n;
    const next = sum + term;
    if (next === sum) break;
    sum = next;
  }
  return sum;
}

/** P(Q ≤ q) (upper false) or P(Q > q) (upper true), each computed directly. */
function tail(q: number, k: number, df: number, upper: boolean): number {
  if (Number.isNaN(q) || !isValid(k, df)) return NaN;
  if (!(q > 0)) return upper ? 1 : 0;
  if (q === Infinity) return upper ? 0 : 1;
  if (df === Infinity) return normalRangeTail(q, k, upper);
  const alpha = df / 2;
  const scale = Math.sqrt(df / Math.PI) * Math.exp(-stirlingError(alpha));
  const integrand = (u: number): number => {
    const weight = Math.exp(-alpha * expm1mx(2 * u));
    return weight === 0 ? 0 : weight * normalRangeTail(q * Math.exp(u), k, upper);
  };
  // Peak of ν·u - (ν/2 + q²/4) e^{2u} (the upper tail, from log P(W > w) ≈ -w²/4)
  // or of (ν+k-1)·u - (ν/2) e^{2u} (the lower tail, P(W ≤ w) ∝ w^{k-1} at small w).
  const centre = upper ? 0.5 * Math.log(df / (df + (q * q) / 2)) : 0.5 * Math.log1p((k - 1) / df);
  // Width 1/√(2ν) from the chi factor; the range factor narrows it as k grows.
  const sigma = 1 / Math.sqrt(2 * df + k);
  // The left tail is an exponential e^{νu}, 40/ν long before it is negligible.
  // u = centre + t - B e^{-(t+D)/B} leaves the peak alone (t > -D) and makes
  // that tail decay doubly exponentially in t, on the scale B it decays on
  // anyway (a change of variables of the kind Trefethen & Weideman 2014 use
  // to give the trapezoidal rule fast-decaying tails).
  const b = Math.max(1 / df, sigma);
  const d = 6 * sigma + b;
  const mapped = (t: number): number => {
    const e = Math.exp(-(t + d) / b);
    const u = centre + t - b * e;
    return u === -Infinity ? 0 : integrand(u) * (1 + e);
  };
  const area = trapezoidWalk(mapped, 0, 1.5 * sigma);
  return Math.min(1, scale * area);
}

/** P(Q ≤ q) for k groups and df degrees of freedom. */
export function studentizedRangeCdf(q: number, k: number, df: number): number {
  const upper = tail(q, k, df, true);
  // The complement is exact enough once it is above ½.
  return upper < 0.5 ? 1 - upper : tail(q, k, df, false);
}

/** P(Q > q), computed directly so small p-values keep their digits. */
export function studentizedRangeSf(q: number, k: number, df: number): number {
  return tail(q, k, df, true);
}

/**
 * Lower-tail quantile: 0 at p = 0, Infinity at 1, NaN outside [0, 1]. For
 * p ≥ ½ it solves P(Q > q) = 1 - p (exact in floating point), below ½
 * P(Q ≤ q) = p, each on the log scale of q and of the tail (Brent's method).
 */
export function studentizedRangeQuantile(p: number, k: number, df: number): number {
  if (!(p >= 0 && p <= 1) || !isValid(k, df)) return NaN;
  if (p === 0) return 0;
  if (p === 1) return Infinity;
  const upper = p >= 0.5;
  const target = Math.log(upper ? 1 - p : p);
  // Clamped where the tail underflows, so Brent's interpolation stays finite.
  const f = (x: number): number => Math.max(Math.log(tail(Math.exp(x), k, df, upper)), -800) - target;
  // Start from the Bonferroni bound √2·t(1 - α/(k(k-1)); ν), α = 1 - p.
  const alpha = upper ? 1 - p : 0.5;
  const guess = Math.SQRT2 * -studentTQuantile(alpha / (k * (k - 1)), df);
  const [lo, hi] = bracketRoot(f, Math.log(guess), 0.25, upper);
  return Math.exp(findRoot(f, lo, hi, {xTol: 1e-14}));
}
