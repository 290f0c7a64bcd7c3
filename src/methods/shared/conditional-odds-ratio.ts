import {bracketRoot, findRoot} from '../../distributions/find-root.js';
import type {Alternative} from '../types.js';

/**
 * The conditional maximum-likelihood estimate of the odds ratio ψ of a 2×2
 * table [[a, b], [c, d]] (ψ = ad/bc in the population) and its exact
 * conditional confidence interval (Cornfield 1956, Proc. Third Berkeley
 * Symp. 4:135; the estimate and interval of R's fisher.test and of scipy's
 * `contingency.odds_ratio(kind='conditional')`).
 *
 * Given the margins, a follows Fisher's noncentral hypergeometric
 * distribution, P(a = i; ψ) ∝ C(m, i) C(n, k-i) ψ^i on lo ≤ i ≤ hi, with
 * m = a + c, n = b + d, k = a + b. The estimate solves E[a; ψ] = a; the
 * lower bound P(A ≥ a; ψ) = α and the upper bound P(A ≤ a; ψ) = α. a = lo
 * gives the estimate and lower bound 0, a = hi the estimate and upper bound
 * ∞. R solves these with `uniroot` at its default tolerance (about 1e-4),
 * so its printed values hold to 4–6 digits; here each equation is solved in
 * θ = log ψ with Brent's method to full precision.
 *
 * Weights are kept as logarithms relative to the observed cell, built from
 * the ratio of consecutive terms, (m-i)(k-i) / ((i+1)(n-k+i+1)): nothing
 * underflows however unlikely the table is under independence, and each
 * weight carries a relative error of about |i - a|·ε.
 */
export interface ConditionalOddsRatio {
  readonly estimate: number;
  readonly ci: readonly [number, number];
}

export type Table2x2 = readonly [readonly [number, number], readonly [number, number]];

export function conditionalOddsRatio(table: Table2x2, confidence: number, alternative: Alternative): ConditionalOddsRatio {
  const dist = noncentralHypergeometric(table);
  const {x, lo, hi} = dist;
  const alpha = alternative === 'two-sided' ? (1 - confidence) / 2 : 1 - confidence;
  const estimate = x === lo ? 0 : x === hi ? Infinity : Math.exp(solve(dist.meanExcess));
  const lower = alternative === 'less' || x === lo ? 0 : Math.exp(solve((t) => dist.upperTail(t) - alpha));
  const upper = alternative === 'greater' || x === hi ? Infinity : Math.exp(solve((t) => alpha - dist.lowerTail(t)));
  return {estimate, ci: [lower, upper]};
}

/** The root in θ of a function increasing in θ = log ψ. */
function solve(f: (theta: number) => number): number {
  const [lo, hi] = bracketRoot(f, 0, 1, false);
  return findRoot(f, lo, hi);
}

interface NoncentralHypergeometric {
  readonly x: number;
  readonly lo: number;
  readonly hi: number;
  /** E[A; e^θ] - x */
  meanExcess(theta: number): number;
  /** P(A ≥ x; e^θ) */
  upperTail(theta: number): number;
  /** P(A ≤ x; e^θ) */
  lowerTail(theta: number): number;
}

function noncentralHypergeometric(table: Table2x2): NoncentralHypergeometric {
  const [[a, b], [c, d]] = table;
  const m = a + c;
  const n = b + d;
  const k = a + b;
  const lo = Math.max(0, k - n);
  const hi = Math.min(k, m);
  const x = a;
  // logWeight[i - lo] = log(C(m, i) C(n, k-i)) - log(C(m, x) C(n, k-x)).
  const logWeight = new Float64Array(hi - lo + 1);
  const ratio = (i: number) => Math.log(m - i) + Math.log(k - i) - Math.log(i + 1) - Math.log(n - k + i + 1);
  for (let i = x; i < hi; i++) logWeight[i + 1 - lo] = logWeight[i - lo]! + ratio(i);
  for (let i = x; i > lo; i--) logWeight[i - 1 - lo] = logWeight[i - lo]! - ratio(i - 1);
  /** Unnormalized probabilities at θ, scaled so the largest is 1. */
  const weights = (theta: number): Float64Array => {
    const w = new Float64Array(logWeight.length);
    let max = -Infinity;
    for (let j = 0; j < w.length; j++) {
      w[j] = logWeight[j]! + theta * (j + lo - x);
      if (w[j]! > max) max = w[j]!;
    }
    for (let j = 0; j < w.length; j++) w[j] = Math.exp(w[j]! - max);
    return w;
  };
  const tail = (theta: number, upper: boolean): number => {
    const w = weights(theta);
    let total = 0;
    let part = 0;
    for (let j = 0; j < w.length; j++) {
      total += w[j]!;
      if (upper ? j + lo >= x : j + lo <= x) part += w[j]!;
    }
    return part / total;
  };
  return {
    x,
    lo,
    hi,
    meanExcess(theta) {
      const w = weights(theta);
      let total = 0;
      let moment = 0;
      // Summing deviations from x keeps E[A] - x free of cancellation.
      for (let j = 0; j < w.length; j++) {
        total += w[j]!;
        moment += w[j]! * (j + lo - x);
      }
      return moment / total;
    },
    upperTail: (theta) => tail(theta, true),
    lowerTail: (theta) => tail(theta, false),
  };
}
