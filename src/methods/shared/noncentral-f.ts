import {betaTerm, incompleteBeta} from '../../distributions/incomplete-beta.js';
import {poissonTerm} from '../../distributions/poisson-term.js';

/**
 * The noncentral F distribution with df1, df2 > 0 and noncentrality λ ≥ 0,
 * as a Poisson mixture of incomplete beta functions,
 *
 *   P(F ≤ x) = Σ_j e^{−λ/2} (λ/2)^j / j! · I_w(df1/2 + j, df2/2),
 *   w = df1·x / (df1·x + df2)
 *
 * (Johnson, Kotz & Balakrishnan 1995, "Continuous Univariate Distributions"
 * vol. 2, ch. 30), summed from the Poisson mode outwards with the
 * recurrences I_w(a+1, b) = I_w(a, b) − T(a) and
 * T(a+1) = T(a)·w·(a+b)/(a+1) (Abramowitz & Stegun 26.5.16), as in Benton &
 * Krishnamoorthy (2003, Comput. Stat. Data Anal. 43:249–267). Each tail is
 * summed separately, so neither is 1 minus the other; only one incomplete
 * beta is evaluated, at the mode. The number of terms grows as √λ (about
 * 17√(λ/2)), so λ is limited to NONCENTRAL_F_MAX_LAMBDA.
 *
 * It lives beside the R² interval, its only user, until the distributions
 * module has a noncentral F.
 */
export const NONCENTRAL_F_MAX_LAMBDA = 1e9;

/** P(F ≤ x) (upper false) or P(F > x) (upper true). */
export function noncentralFTail(x: number, df1: number, df2: number, lambda: number, upper: boolean): number {
  if (!(df1 > 0 && df2 > 0 && lambda >= 0 && lambda <= NONCENTRAL_F_MAX_LAMBDA) || Number.isNaN(x)) return NaN;
  if (x <= 0) return upper ? 1 : 0;
  if (x === Infinity) return upper ? 0 : 1;
  const ratio = df2 / (df1 * x);
  const w = 1 / (1 + ratio);
  const v = ratio / (1 + ratio);
  const a = df1 / 2;
  const b = df2 / 2;
  const mu = lambda / 2;
  const mode = Math.floor(mu);
  const weightAtMode = poissonTerm(mode, mu);
  const termAtMode = betaTerm(a + mode, b, w, v);
  const tailAtMode = incompleteBeta(a + mode, b, w, v, upper, termAtMode);
  // The lower tail falls by T as j rises, the upper tail rises by T.
  const sign = upper ? 1 : -1;
  let sum = weightAtMode * tailAtMode;
  // Forwards: j = mode + 1, mode + 2, …
  let weight = weightAtMode;
  let term = termAtMode;
  let tail = tailAtMode;
  for (let j = mode; ; j++) {
    tail = clamp(tail + sign * term);
    term *= (w * (a + j + b)) / (a + j + 1);
    weight *= mu / (j + 1);
    const contribution = weight * tail;
    sum += contribution;
    // Weights now fall at least geometrically with ratio μ/(j+2).
    const remaining = j + 2 > mu ? (weight * (j + 2)) / (j + 2 - mu) : Infinity;
    if ((upper ? remaining : remaining * tail) <= 1e-17 * sum || weight === 0) break;
  }
  // Backwards: j = mode − 1, …, 0.
  weight = weightAtMode;
  term = termAtMode;
  tail = tailAtMode;
  for (let j = mode; j > 0; j--) {
    term *= (a + j) / (w * (a + j - 1 + b));
    tail = clamp(tail - sign * term);
    weight *= j / mu;
    sum += weight * tail;
    // Going down, weights fall and so does the upper tail; the lower tail stays ≤ 1.
    if ((upper ? weight * tail * j : weight * j) <= 1e-17 * sum || weight === 0) break;
  }
  return Math.min(1, sum);
}

function clamp(p: number): number {
  return p < 0 ? 0 : p > 1 ? 1 : p;
}
