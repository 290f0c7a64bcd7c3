import gammainc from '@stdlib/math-base-special-gammainc';
import {poissonTerm} from './poisson-term.js';

/**
 * The regularized incomplete gamma functions P(a, x) and Q(a, x) = 1 - P.
 *
 * Both sides share the prefactor e^-x x^a / Γ(a+1), taken from Loader's
 * saddle-point Poisson term (`poissonTerm`), which keeps a few ulps where
 * e^-x x^a and Γ(a+1) are each far out of range. Below x = a + 1 the power
 * series P = term · Σ xⁿ / ((a+1)…(a+n)) (A&S 6.5.29) converges; above it
 * Legendre's continued fraction Q = a·term · 1/(x+1-a- 1(1-a)/(x+3-a- …))
 * (A&S 6.5.31), by the modified Lentz method (Press et al. 2007, Numerical
 * Recipes 3rd ed., §6.2). Both take O(√a) terms near x = a.
 *
 * The continued-fraction side is below ½ (the median lies below the mean a;
 * Chen & Rubin 1986, Stat. Probab. Lett. 4:281), so P = 1 - Q there loses
 * nothing; on the series side Q = 1 - P while P ≤ 0.7. P exceeds 0.7 there
 * only for a below about 6; Q then comes from the continued fraction (which
 * converges for all x > 0, slowly for small x) when x ≥ 1, and for x < 1
 * from @stdlib's `gammainc` (Boost's tgamma_small_upper_part, DiDonato &
 * Morris 1986, ACM TOMS 12:377), accurate there. @stdlib's `gammainc` is
 * not used elsewhere: at a = 5000 it returns 2 correct digits near x = a
 * (its large-a branch).
 */

/** Σ xⁿ / ((a+1)…(a+n)), n ≥ 0. */
function lowerSeries(a: number, x: number): number {
  let term = 1;
  let sum = 1;
  for (let n = 1; n < 1e7; n++) {
    term *= x / (a + n);
    sum += term;
    if (term <= sum * 1e-17) break;
  }
  return sum;
}

/** The continued fraction with Q(a, x) = a·term · value (modified Lentz). */
function upperFraction(a: number, x: number): number {
  const tiny = 1e-300;
  // (x - a) is exact near x = a (Sterbenz); x + 1 - a would round first.
  let b = x - a + 1;
  let c = 1 / tiny;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < 1e7; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (d === 0) d = tiny;
    c = b + an / c;
    if (c === 0) c = tiny;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) <= 1e-16) break;
  }
  return h;
}

/** P(a, x) (upper false) or Q(a, x) (upper true), for a > 0 and finite x > 0. */
export function incompleteGamma(a: number, x: number, upper: boolean): number {
  const term = poissonTerm(a, x);
  if (x < a + 1) {
    const lower = term * lowerSeries(a, x);
    if (!upper) return lower;
    // 1 - lower keeps relative precision (within 2.3 times lower's error) up to 0.7.
    if (lower <= 0.7) return 1 - lower;
    return x >= 1 ? a * term * upperFraction(a, x) : gammainc(x, a, true, true);
  }
  const q = a * term * upperFraction(a, x);
  return upper ? q : 1 - q;
}
