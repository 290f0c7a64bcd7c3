import {betaTerm, incompleteBeta} from './incomplete-beta.js';
import {normalCdf} from './normal.js';
import {poissonTerm} from './poisson-term.js';
import {CompensatedSum} from './compensated-sum.js';

/**
 * The noncentral t distribution for t > 0 and ncp δ ≥ 0 as a Poisson
 * mixture of incomplete beta functions (Guenther 1978, J. Stat. Comput.
 * Simul. 6:199; Lenth 1989, Applied Statistics 38:185, algorithm AS 243):
 *
 *   P(T ≤ t) = Φ(-δ) + ½ Σ_{m≥0} w_m I_x(m/2 + ½, ν/2)
 *   P(T > t) =         ½ Σ_{m≥0} w_m I^c_x(m/2 + ½, ν/2)
 *
 * with x = t²/(ν+t²) and w_m = e^{-λ} λ^{m/2} / Γ(m/2 + 1), λ = δ²/2 (even m
 * are Lenth's p_j, odd m his q_j). Every term is positive, so each tail is
 * summed directly with full relative precision. The second identity follows
 * from the first because Σ w_m = 1 + erf(δ/√2).
 *
 * AS 243 starts at m = 0, where e^{-λ} underflows for δ > 38 and the series
 * fails silently. Here, as in Benton & Krishnamoorthy (2003, Comput. Stat.
 * Data Anal. 43:249) and Boost's non_central_t, each parity is summed from
 * a start near the Poisson mode, with I_x(a±1, b) from the recurrence
 * I_x(a+1, b) = I_x(a, b) - T(a), T(a) = Γ(a+b) x^a (1-x)^b / (Γ(a+1) Γ(b))
 * (A&S 26.5.16). The recurrence is run only in the direction in which it
 * adds positive numbers (downwards for I, upwards for I^c), so no digits are
 * lost to cancellation; the start lies where the terms beyond it are below
 * 1e-17 of the sum. Weights and T come from Loader's saddle-point forms,
 * re-evaluated along the way when that is more accurate (`SteppedTerm`). Results
 * smaller than about 1e-280 may underflow to 0.
 */

/** Terms beyond this fraction of the running sum are dropped. */
const TRUNCATION = 1e-17;
/** How often (in steps) a stepped term considers a direct re-evaluation. */
const REANCHOR = 4;
/** Smallest beta term a recurrence may start from without underflowing. */
const TINY = 1e-280;

/**
 * A weight or beta term stepped by its recurrence and re-evaluated directly
 * when that is more accurate. Loader's direct forms err by about
 * ε·(1 + |log value|) (their deviance), the recurrence by about ε per step
 * since the last direct value. So, checked every REANCHOR steps, the term is
 * re-evaluated when it has grown since its last anchor or when the steps
 * since exceed 10 + |log value|; and always after an underflow.
 */
class SteppedTerm {
  private anchor: number;
  private since = 0;
  constructor(public value: number) {
    this.anchor = value;
  }
  step(factor: number, index: number, direct: () => number): void {
    this.value *= factor;
    this.since++;
    const stale =
      index % REANCHOR === 0 && (this.value > this.anchor || this.since > 10 + Math.abs(Math.log(this.value)));
    if (this.value === 0 || !Number.isFinite(this.value) || stale) {
      this.value = direct();
      this.anchor = this.value;
      this.since = 0;
    }
  }
}

/** Σ_j w(s+j) I_x(s+j+½, b), run downwards from where the tail is negligible. */
function lowerChain(s: number, x: number, y: number, b: number, lambda: number): number {
  let j = Math.max(0, Math.ceil(lambda - s + 10 * Math.sqrt(lambda) + 40));
  // T(a) decreases for a above its peak (x b - 1)/y; lower the start to the
  // largest index where it is still representable.
  const representable = (m: number) => betaTerm(s + m + 0.5, b, x, y) >= TINY;
  if (!representable(j)) {
    const peak = Math.max(0, Math.floor((x * b - 1) / y - s));
    if (representable(peak)) j = edgeOf(peak, j, representable);
  }
  let a = s + j + 0.5;
  const w = new SteppedTerm(poissonTerm(s + j, lambda));
  const term = new SteppedTerm(betaTerm(a, b, x, y));
  let i = incompleteBeta(a, b, x, y, false, term.value);
  const sum = new CompensatedSum();
  sum.add(w.value * i);
  while (j > 0) {
    const top = a;
    a -= 1;
    j -= 1;
    const k = s + j;
    term.step(top / (x * (a + b)), j, () => betaTerm(a, b, x, y));
    i += term.value;
    w.step((k + 1) / lambda, j, () => poissonTerm(k, lambda));
    sum.add(w.value * i);
    // Below the mode the remaining weights shrink at least geometrically by k/λ, and I ≤ 1.
    if (k < lambda && (w.value * k) / (lambda - k) < TRUNCATION * sum.value) break;
  }
  return sum.value;
}

/** Σ_j w(s+j) I^c_x(s+j+½, b), run upwards from where the head is negligible. */
function upperChain(s: number, x: number, y: number, b: number, lambda: number): number {
  let j = Math.max(0, Math.floor(lambda - s - 10 * Math.sqrt(lambda) - 10));
  const mode = Math.max(j, Math.floor(lambda - s));
  // Below its peak T(a) increases; move the start up to where it is representable.
  const representable = (m: number) => betaTerm(s + m + 0.5, b, x, y) >= TINY;
  if (!representable(j) && representable(mode)) j = edgeOf(mode, j, representable);
  let a = s + j + 0.5;
  const w = new SteppedTerm(poissonTerm(s + j, lambda));
  const term = new SteppedTerm(betaTerm(a, b, x, y));
  let ic = incompleteBeta(a, b, x, y, true, term.value);
  const sum = new CompensatedSum();
  sum.add(w.value * ic);
  const limit = j + 100 + 20 * Math.ceil(lambda + 10 * Math.sqrt(lambda));
  while (j < limit) {
    ic += term.value;
    const bottom = a;
    a += 1;
    j += 1;
    const k = s + j;
    term.step((x * (bottom + b)) / a, j, () => betaTerm(a, b, x, y));
    w.step(lambda / k, j, () => poissonTerm(k, lambda));
    sum.add(w.value * ic);
    // Above the mode the remaining weights shrink at least geometrically by λ/(k+1), and I^c ≤ 1.
    if (k + 1 > lambda && (w.value * lambda) / (k + 1 - lambda) < TRUNCATION * sum.value) break;
  }
  return sum.value;
}

/** P(T ≤ t) (upper = false) or P(T > t) (upper = true) for t > 0, 0 < ncp, 0 < df < ∞. */
export function noncentralTSeries(t: number, df: number, ncp: number, upper: boolean): number {
  // x = t²/(ν+t²) and y = ν/(ν+t²): the smaller is formed directly (without
  // overflow) and the other as its exact complement, so x + y = 1.
  const r = t < 1 ? (t * t) / df : 1 / (df / t / t);
  const small = r <= 1 ? r / (1 + r) : 1 / (1 + r);
  const x = r <= 1 ? small : 1 - small;
  const y = r <= 1 ? 1 - small : small;
  const b = df / 2;
  const lambda = (ncp * ncp) / 2;
  if (upper) return (upperChain(0, x, y, b, lambda) + upperChain(0.5, x, y, b, lambda)) / 2;
  return normalCdf(-ncp) + (lowerChain(0, x, y, b, lambda) + lowerChain(0.5, x, y, b, lambda)) / 2;
}

/**
 * Bisection between an index whose beta term is representable (`good`) and
 * one whose term underflows (`bad`): the representable index next to the
 * edge. T(a) is monotone between them, so the edge is unique.
 */
function edgeOf(good: number, bad: number, representable: (index: number) => boolean): number {
  while (Math.abs(bad - good) > 1) {
    const mid = Math.floor((good + bad) / 2);
    if (representable(mid)) good = mid;
    else bad = mid;
  }
  return good;
}
