/**
 * Inverts a tail area of a distribution on (0, ∞): finds x with tail(x) = p,
 * where tail is the cdf (upper false) or the survival function (upper true),
 * evaluated directly so that a small p keeps its relative precision.
 *
 * Newton's method on d = ±(log tail(x) - log p) as a function of log x,
 * signed so that d increases. Far tails are close to power laws (near 0) or
 * exponentials (far out), on which d is linear or nearly so, so the Newton
 * step is nearly exact there. d' = x·f(x)/tail(x), with `xDensity(x)` =
 * x·f(x). The iteration is safeguarded as in rtsafe (Press et al. 2007,
 * Numerical Recipes 3rd ed., §9.4): it keeps the bracket of points where
 * d < 0 and d > 0 seen so far and bisects it whenever a Newton step would
 * leave it or land where the tail underflows. It stops when a step changes
 * x by less than 1e-15 relatively, so the result is as accurate as the
 * tail evaluation allows: its relative error is that of tail(x) divided by
 * the elasticity x·f(x)/tail(x).
 */
export function invertTail(
  tail: (x: number) => number,
  xDensity: (x: number) => number,
  p: number,
  upper: boolean,
  start: number,
): number {
  const sign = upper ? -1 : 1;
  const logP = Math.log(p);
  let x = start > 0 && start < Infinity ? start : 1;
  let lo = 0; // d < 0 here (0: none seen yet)
  let hi = Infinity; // d > 0 here
  for (let i = 0; i < 300; i++) {
    const area = tail(x);
    let step: number; // in log x
    if (!(area > 0)) {
      // Underflow: beyond the far end of the tail being inverted.
      if (upper) hi = x;
      else lo = x;
      step = sign * -1;
    } else {
      // log of the ratio, not a difference of logs near -690 that would carry 1e-13.
      const ratio = area / p;
      const d = sign * (ratio > 0 && ratio < Infinity ? Math.log(ratio) : Math.log(area) - logP);
      if (d === 0) return x;
      if (d < 0) lo = x;
      else hi = x;
      step = Math.max(-50, Math.min(50, (d * area) / xDensity(x)));
    }
    // x·e^(-step) keeps x's relative precision, which a state u = log x would not.
    let next = x * Math.exp(-step);
    if (!(next > lo && next < hi)) {
      if (!(lo > 0 && hi < Infinity)) next = Math.min(Math.max(next, Number.MIN_VALUE), Number.MAX_VALUE);
      else next = Math.sqrt(lo) * Math.sqrt(hi); // bisect in log x
      if (hi / lo - 1 < 1e-15) return next;
    }
    if (Math.abs(next / x - 1) < 1e-15) return next;
    x = next;
  }
  return x;
}
