import {normalCdf, normalPdf, normalQuantile, normalSf} from './normal.js';
import {gaussLegendre, gaussLegendreRule} from './gauss-legendre-rule.js';
import {trapezoidWalk} from './trapezoid-walk.js';

/**
 * Either tail of the range W of k independent standard normal variables,
 * which is the studentized range at ν = ∞. With x the largest value (the
 * classical form, Tippett 1925, Biometrika 17:364-387; the inner integral
 * of Copenhaver & Holland 1988),
 *
 *   P(W ≤ w) = k ∫ φ(x) D(x)^{k-1} dx,          D(x) = Φ(x) - Φ(x - w),
 *   P(W > w) = k ∫ φ(x) [Φ(x)^{k-1} - D(x)^{k-1}] dx.
 *
 * The second integrand is written Φ(x)^{k-1} (1 - (1 - r)^{k-1}) with
 * r = Φ(x-w)/Φ(x) and evaluated as -expm1((k-1) log1p(-r)), or through
 * log(D/Φ(x)) when r > ½, so both tails are integrals of positive terms with
 * full relative precision, down to the underflow threshold. D itself is
 * taken from whichever tails of Φ do not cancel, and for short intervals
 * near the centre by a 10-point Gauss-Legendre rule on φ. The integral
 * itself is the trapezoidal rule of trapezoid-walk.ts, started near the
 * peak with a step from the integrand's width.
 */

const SHORT_RULE = gaussLegendreRule(10);

/**
 * Φ(x) - Φ(x - w) for w > 0. Tails on one side of 0 cancel by less than a
 * factor 1.6 once w ≥ 1 or w·min(|x|, |x-w|) ≥ 1 (the ratio of the two
 * tails is then below e^-1); otherwise the interval is short and the rule
 * is exact to about 1e-20 (|midpoint|·w/2 ≤ 0.75 there).
 */
export function normalMass(x: number, w: number): number {
  const lo = x - w;
  if (w < 1 && w * Math.min(Math.abs(x), Math.abs(lo)) < 1) {
    // Centre and half-width from w itself: the rounding of x - w would be
    // a relative error of eps·|x|/w in the interval's length.
    const half = w / 2;
    const mid = x - half;
    return gaussLegendre((t) => normalPdf(mid + half * t), -1, 1, SHORT_RULE) * half;
  }
  if (lo >= 0) return normalSf(lo) - normalSf(x);
  if (x <= 0) return normalCdf(x) - normalCdf(lo);
  // Straddles 0 with w ≥ 1: D ≥ 0.34, so the absolute error is also relative.
  return 1 - normalSf(x) - normalCdf(lo);
}

/** P(W ≤ w) (upper false) or P(W > w) (upper true) for integer k ≥ 2. */
export function normalRangeTail(w: number, k: number, upper: boolean): number {
  if (Number.isNaN(w)) return NaN;
  if (!(w > 0)) return upper ? 1 : 0;
  if (w === Infinity) return upper ? 0 : 1;
  const m = k - 1;
  // Zero bounds mean zero tails: P(W > w) ≤ k(k-1) Φc(w/√2) (Bonferroni over
  // pairs) and P(W ≤ w) ≤ k D_max^{k-1}, D_max = Φ(w/2) - Φ(-w/2).
  if (upper && k * m * normalSf(w / Math.SQRT2) === 0) return 0;
  if (!upper && k * Math.pow(normalMass(w / 2, w), m) === 0) return 0;
  const integrand = upper
    ? (x: number): number => {
        const a = normalCdf(x);
        if (a === 0) return 0;
        const r = normalCdf(x - w) / a;
        const t = r <= 0.5 ? m * Math.log1p(-r) : m * Math.log(normalMass(x, w) / a);
        return k * normalPdf(x) * Math.pow(a, m) * -Math.expm1(t);
      }
    : (x: number): number => k * normalPdf(x) * Math.pow(normalMass(x, w), m);
  // The peak: near the mode of the maximum for the bulk, near w/2 (the two
  // extremes symmetric about 0) in the far upper tail and for small w.
  const mode = normalQuantile(k / (k + 1));
  const start = upper ? Math.max(w / 2, mode) : Math.min(w / 2, mode);
  // The integrand's width: about 1/√(1 + log k) for the maximum of k normals,
  // 1/√k for the lower tail at small w (all k values within w of each other).
  const spread = upper ? 1 + Math.log(k) : 1 + Math.log(k) + m / (1 + w * w);
  const width = 1.5 / Math.sqrt(spread);
  return Math.min(1, trapezoidWalk(integrand, start, width));
}
