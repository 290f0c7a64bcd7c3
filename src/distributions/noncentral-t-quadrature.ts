import {findRoot} from './find-root.js';
import {integrate} from './integrate.js';
import {normalPdf, normalSf} from './normal.js';
import {stirlingError} from './poisson-term.js';

/**
 * P(T > t) for t ≥ 0 and ncp = -d ≤ 0, the tail where the series of
 * `noncentral-t-series.ts` would subtract nearly equal sums (at t = 0 it
 * reduces to 1 - erf(d/√2)). With T = (Z - d)/S and S² ~ χ²_ν/ν,
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
 * The log-integrand is concave; its peak u₀ is found with Brent's method on
 * the derivative, its width from the second derivative, and the range is
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

/** P(T > t) for t ≥ 0, d = -ncp ≥ 0, 0 < df < ∞. */
export function noncentralTOppositeTail(t: number, df: number, d: number): number {
  if (t === 0) return normalSf(d);
  const alpha = df / 2;
  const logIntegrand = (u: number): number => logNormalSf(t * Math.exp(u) + d) - alpha * expm1mx(2 * u);
  const slope = (u: number): number => {
    const e = Math.exp(u);
    return -t * e * hazard(t * e + d) - 2 * alpha * Math.expm1(2 * u);
  };
  // slope(0) < 0 and slope → 2α > 0 as u → -∞: bracket the peak below 0.
  let lo = -1;
  while (slope(lo) < 0 && lo > -1e4) lo *= 2;
  const peak = slope(lo) < 0 ? lo : findRoot(slope, lo, 0, {xTol: 1e-9});
  const e = Math.exp(peak);
  const z = t * e + d;
  const h = hazard(z);
  const curvature = t * e * h + t * t * e * e * h * (h - z) + 4 * alpha * e * e;
  const width = 1 / Math.sqrt(curvature);
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
  const integrand = (u: number): number => normalSf(t * Math.exp(u) + d) * Math.exp(-alpha * expm1mx(2 * u));
  const area = integrate(integrand, edge(-1), peak) + integrate(integrand, peak, edge(1));
  return Math.sqrt(df / Math.PI) * Math.exp(-stirlingError(alpha)) * area;
}
