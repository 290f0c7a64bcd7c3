/**
 * Root finding for monotone functions of one variable: Brent's method and a
 * bracket search that widens geometrically from a first guess.
 *
 * `findRoot` is the classic zeroin of Brent (1973, "Algorithms for
 * Minimization without Derivatives", ch. 4), as published in Forsythe,
 * Malcolm & Moler (1977, "Computer Methods for Mathematical Computations",
 * §7.2, netlib `zeroin.f`): inverse quadratic interpolation or the secant
 * step when it stays well inside the bracket, bisection otherwise. It keeps
 * a sign-changing bracket at every step, so it converges even when f is
 * evaluated with rounding noise, and it stops when the bracket is narrower
 * than 4·eps·|x| + xTol (xTol defaults to 0: full machine precision).
 */

const EPS = 2.220446049250313e-16;

export interface FindRootOptions {
  /** Absolute tolerance on x added to the relative 4·eps·|x|; default 0. */
  readonly xTol?: number;
  /** Maximum number of evaluations of f; default 200. */
  readonly maxIterations?: number;
}

/** A zero of f in [lo, hi]; f(lo) and f(hi) must not have the same sign. */
export function findRoot(
  f: (x: number) => number,
  lo: number,
  hi: number,
  options: FindRootOptions = {},
): number {
  const xTol = options.xTol ?? 0;
  const maxIterations = options.maxIterations ?? 200;
  let a = lo;
  let b = hi;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (Number.isNaN(fa) || Number.isNaN(fb) || Math.sign(fa) === Math.sign(fb)) {
    throw new Error(`findRoot: f(${lo}) = ${fa} and f(${hi}) = ${fb} do not bracket a root`);
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let i = 0; i < maxIterations; i++) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * EPS * Math.abs(b) + 0.5 * xTol;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < 3 * m * q - Math.abs(tol * q) && p < Math.abs(0.5 * e * q)) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    if (Number.isNaN(fb)) throw new Error(`findRoot: f(${b}) is NaN`);
  }
  return b;
}

/**
 * A bracket [lo, hi] around the zero of a monotone f, searched outwards from
 * `guess` in steps of `step` that double each time (at most 100 doublings).
 * `decreasing` tells the direction: f(lo) > 0 > f(hi) when true.
 */
export function bracketRoot(
  f: (x: number) => number,
  guess: number,
  step: number,
  decreasing: boolean,
): [number, number] {
  const sign = decreasing ? 1 : -1;
  let lo = guess - step;
  let hi = guess + step;
  let width = step;
  for (let i = 0; i < 100 && sign * f(lo) < 0; i++) {
    hi = lo;
    width *= 2;
    lo -= width;
  }
  width = step;
  for (let i = 0; i < 100 && sign * f(hi) > 0; i++) {
    lo = hi;
    width *= 2;
    hi += width;
  }
  return [lo, hi];
}
