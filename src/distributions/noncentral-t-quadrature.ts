import {findRoot} from './find-root.js';
import {integrate} from './integrate.js';
import {normalPdf, normalSf} from './normal.js';
import {stirlingError} from './poisson-term.js';

/**
 * Either tail of the noncentral t by quadrature over the chi variable. Used
 * for P(T > t) with t ≥ 0 and ncp = -d < 0, the tail where the series of
 * `noncentral-t-series.ts` would subtract nearly equal sums (at t = 0 it
 * reduces to 1 - erf(d/√2)), and for ncp above 200, where the series would
 * need ~ncp² terms. With T = (Z - d)/S and S² ~ χ²_ν/ν,
 *
 *   P(T > t) = E[Φc(tS + d)] = ∫ Φc(t e^u + d) ν p(ν/2, (ν/2) e^{2u}) du,
 *
 * over u = log S, where p(α, g) = e^{-g} g^α / Γ(α+1). The integrand is
 * positive, so the tail keeps full relative precision however small it is
 * (the approach of Witkovský 2013, "A note on computing extreme tail
 * probabilities of the noncentral t distribution with large noncentrality
 * parameter", Acta Univ. Palacki. Olomuc. Math. 52:131). The Poisson-type
 * factor is written as exp(-δ(α) - α(e^{2u} - 1 - 2u)) / √(2πα) (Loader's
 * saddle-point form), which stays accurate for ν up to 1e15.
 *
 * The log-integrand has one peak (its derivative falls from 2α to -∞ and,
 * in e^u, crosses 0 once); u₀ is found with Brent's method on the
 * derivative, its width from the second derivative, and the range is
 * cut where the integrand falls below e^-50 of the peak. Adaptive
 * Gauss-Legendre integrates the rest to 1e-15 relative.
 */

/** e^w - 1 - w without cancellation for small |w|. */
function expm1mx(w: number): number {
  if (Math.abs(w) > 0.5) return Math.expm1(w) - w;
  let term = (w * w) / 2;
  let sum = term;
  for (let k = 3; k < 40; k++) {
    term *= w / k;
    const next = sum + term;
    if (next === sum) break;
    sum = next;
  }
  return sum;
}

/** φ(z)/Φc(z); far out the bound-mean (z + √(z²+4))/2, enough to place the peak. */
function hazard(z: number): number {
  return z < 5 ? normalPdf(z) / normalSf(z) : (z + Math.sqrt(z * z + 4)) / 2;
}

/** log Φc(z), with the leading asymptotic term where Φc underflows. */
function logNormalSf(z: number): number {
  return z < 37 ? Math.log(normalSf(z)) : -0.5 * z * z - Math.log(z) - 0.9189385332046728;
}

/**
 * P(T ≤ t) (upper false) or P(T > t) (upper true) for t ≥ 0, any ncp and
 * 0 < df < ∞. Both are E[Φc(c S + d)] with (c, d) = (t, -ncp) for the upper
 * tail and (-t, ncp) for the lower one.
 */
export function noncentralTQuadrature(t: number, df: number, ncp: number, upper: boolean): number {
  const c = upper ? t : -t;
  const d = upper ? -ncp : ncp;
  if (t === 0) return normalSf(d);
  const alpha = df / 2;
  const logIntegrand = (u: number): number => logNormalSf(c * Math.exp(u) + d) - alpha * expm1mx(2 * u);
  const slope = (u: number): number => {
    const e = Math.exp(u);
    return -c * e * hazard(c * e + d) - 2 * alpha * Math.expm1(2 * u);
  };
  // slope → 2α > 0 as u → -∞ and → -∞ as u → ∞: bracket the peak.
  let lo = -1;
  while (slope(lo) <= 0 && lo > -1e4) lo *= 2;
  let hi = 1;
  while (slope(hi) >= 0 && hi < 1e4) hi *= 2;
  const peak = findRoot(slope, lo, hi, {xTol: 1e-9});
  const e = Math.exp(peak);
  const z = c * e + d;
  const h = hazard(z);
  // -L''(u₀), using H'(z) = H(H - z) for the hazard H.
  const curvature = c * e * h + c * c * e * e * h * (h - z) + 4 * alpha * e * e;
  const width = curvature > 0 ? 1 / Math.sqrt(curvature) : 1;
  const top = logIntegrand(peak);
  if (top < -745) return 0;
  const edge = (direction: number): number => {
    let step = width;
    let u = peak + direction * step;
    for (let i = 0; i < 200 && logIntegrand(u) > top - 50; i++) {
      step *= 1.5;
      u = peak + direction * step;
    }
    return u;
  };
  const integrand = (u: number): number => normalSf(c * Math.exp(u) + d) * Math.exp(-alpha * expm1mx(2 * u));
  // Split at the peak and where c e^u + d = 0: for large t the tail factor
  // steps from 0 to 1 there over a width of 1/t, too narrow for the rule to find.
  const step = -d / c > 0 ? Math.log(-d / c) : NaN;
  const points = [edge(-1), peak, edge(1)];
  if (step > (points[0] as number) && step < (points[2] as number) && step !== peak) points.push(step);
  points.sort((p, q) => p - q);
  let area = 0;
  for (let i = 1; i < points.length; i++) area += integrate(integrand, points[i - 1] as number, points[i] as number);
  return Math.sqrt(df / Math.PI) * Math.exp(-stirlingError(alpha)) * area;
}
