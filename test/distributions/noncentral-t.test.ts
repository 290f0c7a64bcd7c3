import erfc from '@stdlib/math-base-special-erfc';
import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {normalCdf} from '../../src/distributions/normal.js';
import {
  noncentralTCdf,
  noncentralTNcpForCdf,
  noncentralTNcpForSf,
  noncentralTSf,
} from '../../src/distributions/noncentral-t.js';
import {studentTCdf, studentTSf} from '../../src/distributions/student-t.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';

/**
 * Regularized lower/upper incomplete gamma P(a, x), Q(a, x) for integer or
 * half-integer a: Q by its finite sums (A&S 6.5.13 for integer a; for
 * a = m + ½, Q = erfc(√x) + e^-x Σ_{k=1..m} x^(k-½)/Γ(k+½), A&S 26.4.4-5)
 * where Q is the smaller side, P by its power series otherwise (A&S
 * 6.5.29). Every sum has positive terms, so each side keeps its digits;
 * e^-x x^n/n! is built as a product of n factors x e^(-x/n)/j so that
 * nothing overflows or underflows on the way.
 */
function poissonProduct(x: number, n: number, offset: number): number {
  // e^-x x^n / Π_{j=1..n} (j - 1 + offset + ... ) with factors j + offset - 1
  let value = 1;
  const share = Math.exp(-x / Math.max(n, 1));
  for (let j = 1; j <= n; j++) value *= (x * share) / (j - 1 + offset);
  return n === 0 ? Math.exp(-x) : value;
}

function gammaPQ(a: number, x: number): {p: number; q: number} {
  if (x === 0) return {p: 0, q: 1};
  const half = !Number.isInteger(a);
  if (x < a + 1) {
    // P = e^-x x^a / Γ(a+1) · Σ x^n / ((a+1)…(a+n))
    const prefactor = half
      ? poissonProduct(x, a + 0.5, 0.5) / Math.sqrt(Math.PI * x) // e^-x x^(m+1) / Π(k+½), then /√(πx)
      : poissonProduct(x, a, 1);
    let term = 1;
    let sum = 1;
    for (let n = 1; n < 10000 && term > 1e-18 * sum; n++) {
      term *= x / (a + n);
      sum += term;
    }
    const p = prefactor * sum;
    return {p, q: 1 - p};
  }
  // Q: the largest term of the finite sum first (x > a), then downwards.
  let sum = 0;
  if (half) {
    const m = a - 0.5;
    // e^-x x^(k-½)/Γ(k+½) at k = m is e^-x x^m / Π_{j=0..m-1}(j+½) / √(πx)
    let term = m === 0 ? 0 : poissonProduct(x, m, 0.5) / Math.sqrt(Math.PI * x);
    for (let k = m; k >= 1; k--) {
      sum += term;
      term *= (k - 0.5) / x;
    }
    return {p: 1 - (erfc(Math.sqrt(x)) + sum), q: erfc(Math.sqrt(x)) + sum};
  }
  let term = poissonProduct(x, a - 1, 1); // e^-x x^(a-1)/(a-1)!
  for (let k = a - 1; k >= 0; k--) {
    sum += term;
    term *= k / x;
  }
  return {p: 1 - sum, q: sum};
}

/**
 * Independent reference for t > 0 and integer df: it conditions on Z where
 * the implementation conditions on the chi variable (or sums a series):
 *   P(T ≤ t) = Φ(-δ) + ∫_{-δ}^∞ φ(z) Q(ν/2, ν(z+δ)²/(2t²)) dz
 *   P(T > t) =          ∫_{-δ}^∞ φ(z) P(ν/2, ν(z+δ)²/(2t²)) dz
 * integrated by Boole's rule (composite Simpson on 6000 and 12000 panels
 * plus one Richardson step) over the window where the integrand exceeds
 * 1e-25 of its peak.
 */
function referenceTail(t: number, df: number, ncp: number, upper: boolean): number {
  const h = df / 2;
  const f = (z: number): number => {
    if (z < -ncp) return 0;
    const u = (z + ncp) / t;
    const {p, q} = gammaPQ(h, h * u * u);
    return (Math.exp(-z * z / 2) / Math.sqrt(2 * Math.PI)) * (upper ? p : q);
  };
  const start = Math.max(-ncp, -45);
  let peak = start;
  let top = 0;
  for (let z = start; z < start + 90; z += 0.01) {
    const v = f(z);
    if (v > top) [peak, top] = [z, v];
  }
  let lo = peak;
  while (lo > start && f(lo) > top * 1e-25) lo = Math.max(start, lo - 0.05);
  let hi = peak;
  while (f(hi) > top * 1e-25) hi += 0.05;
  const simpson = (n: number): number => {
    const step = (hi - lo) / n;
    let sum = f(lo) + f(hi);
    for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * f(lo + i * step);
    return (sum * step) / 3;
  };
  const coarse = simpson(6000);
  const fine = simpson(12000);
  const area = fine + (fine - coarse) / 15;
  return upper ? area : normalCdf(-ncp) + area;
}

describe('noncentral t against an independent integration', () => {
  // Each case: [t, df, ncp, which tail]. Values span both tails, both signs
  // of ncp, ncp up to 40, far tails (1e-36) and the jstat failure (t 31, ncp 30).
  const cases: [number, number, number, boolean][] = [
    [31, 10, 30, true],
    [31, 10, 30, false],
    [40, 10, 40, false],
    [20, 10, 40, false],
    [3, 1, 40, false],
    [5, 2, 3, true],
    [5, 2, 3, false],
    [10, 1000, 30, false],
    [1, 10, -2, true],
    [0.5, 30, -10, true],
    [2.0243941639119696, 38, -Math.sqrt(10), true],
  ];
  for (const [t, df, ncp, upper] of cases) {
    it(`${upper ? 'sf' : 'cdf'}(${t}; df ${df}, ncp ${ncp.toPrecision(4)})`, () => {
      const value = upper ? noncentralTSf(t, df, ncp) : noncentralTCdf(t, df, ncp);
      // Boole's rule on this grid reaches about 14 digits; measured agreement 13.6 to 15.4.
      expect(lre(value, referenceTail(t, df, ncp, upper))).toBeGreaterThanOrEqual(13);
    });
  }
});

describe('noncentral t against mpmath where the integration above does not apply', () => {
  it('handles df = 1e6 and non-integer df', () => {
    // mpmath 1.3.0, 60 digits: quadrature of the mixture over log S, computed for this test
    expect(lre(noncentralTCdf(10, 1e6, 40), 5.0181147505244539517e-198)).toBeGreaterThanOrEqual(13);
    expect(lre(noncentralTSf(42, 1e6, 40), 0.022798329616192190603)).toBeGreaterThanOrEqual(14);
    expect(lre(noncentralTSf(1.5, 30.7, -2.5), 0.000044396605817646919188)).toBeGreaterThanOrEqual(14);
    expect(lre(noncentralTCdf(35, 30.7, 30), 0.84958991787163571929)).toBeGreaterThanOrEqual(14);
    expect(lre(noncentralTSf(28, 30.7, 30), 0.7302828034666453951)).toBeGreaterThanOrEqual(14);
    expect(lre(noncentralTCdf(5, 2.5, 10), 0.016745801634242767264)).toBeGreaterThanOrEqual(14);
  });
});

describe('noncentral t identities and sanity bounds', () => {
  it('equals the central t at ncp = 0', () => {
    for (const [t, df] of [[-3, 4], [0.7, 18.3], [2.5, 1e6]] as const) {
      expect(noncentralTCdf(t, df, 0)).toBe(studentTCdf(t, df));
      expect(noncentralTSf(t, df, 0)).toBe(studentTSf(t, df));
    }
    // and is continuous there: ncp = 1e-12 differs by φ(0)·1e-12 at most,
    // and a subnormal ncp (whose square underflows) by nothing representable
    expect(Math.abs(noncentralTCdf(1.3, 7, 1e-12) - studentTCdf(1.3, 7))).toBeLessThan(1e-12);
    expect(noncentralTCdf(5e-324, 1, 5e-324)).toBe(0.5);
  });

  it('is symmetric: cdf(t; ν, δ) = sf(-t; ν, -δ)', () => {
    expect(noncentralTCdf(-2.1, 12, 3)).toBe(noncentralTSf(2.1, 12, -3));
    expect(noncentralTSf(-2.1, 12, 3)).toBe(noncentralTCdf(2.1, 12, -3));
  });

  it('gives Φ(-δ) at t = 0 and the normal at df = Infinity', () => {
    // P(T ≤ 0) = P(Z ≤ -δ): common practice, no source
    expect(noncentralTCdf(0, 9, 2.5)).toBe(normalCdf(-2.5));
    expect(noncentralTCdf(1, Infinity, 3)).toBe(normalCdf(-2));
  });

  it('stays near the normal approximation at ncp 30 and 40 (A&S 26.7.10)', () => {
    // Φ((t(1 - 1/(4ν)) - δ)/√(1 + t²/(2ν))) is good to O(1/ν) (Abramowitz & Stegun 26.7.10).
    const approximation = (t: number, df: number, ncp: number) =>
      normalCdf((t * (1 - 1 / (4 * df)) - ncp) / Math.sqrt(1 + (t * t) / (2 * df)));
    expect(Math.abs(noncentralTCdf(40, 10, 40) - approximation(40, 10, 40))).toBeLessThan(0.02);
    expect(Math.abs(noncentralTCdf(25, 30, 30) - approximation(25, 30, 30))).toBeLessThan(0.005);
    expect(Math.abs(noncentralTCdf(41, 1e6, 40) - approximation(41, 1e6, 40))).toBeLessThan(1e-5);
  });

  it('returns NaN for invalid input', () => {
    expect(noncentralTCdf(NaN, 3, 1)).toBeNaN();
    expect(noncentralTCdf(1, -3, 1)).toBeNaN();
    expect(noncentralTSf(1, 3, NaN)).toBeNaN();
    expect(noncentralTNcpForCdf(1, 3, 1.5)).toBeNaN();
    expect(noncentralTNcpForCdf(NaN, 3, 0.5)).toBeNaN();
  });
});

describe('noncentralTNcpForCdf', () => {
  it('reproduces the noncentral-t CI for Cohen d_s in Lakens (2013)', () => {
    const scipy = example<{scipy: {independent: {t: number; d_s_95CI_noncentral_t: [number, number]}}}>(
      'effect_size_cohens_d_hedges_g--lakens2013-movies.json',
    ).scipy.independent;
    const scale = Math.sqrt(1 / 10 + 1 / 10);
    const lower = noncentralTNcpForCdf(scipy.t, 18, 0.975) * scale;
    const upper = noncentralTNcpForCdf(scipy.t, 18, 0.025) * scale;
    // scipy 1.10 nct + brentq in the reference file; its nct carries ~12 digits,
    // and a 40-digit mpmath solve gives 0.16307653243960222 and 2.0621458336122068.
    const [refLower, refUpper] = scipy.d_s_95CI_noncentral_t;
    expect(lre(lower, refLower)).toBeGreaterThanOrEqual(12);
    expect(lre(upper, refUpper)).toBeGreaterThanOrEqual(14);
    // mpmath 1.3.0 root of the 40-digit mixture integral, computed for this test
    expect(lre(lower, 0.1630765324396022246)).toBeGreaterThanOrEqual(14.5);
    expect(lre(upper, 2.0621458336122067806)).toBeGreaterThanOrEqual(14.5);
    // The bounds solve the defining equations (checked by the independent integration).
    expect(lre(referenceTail(scipy.t, 18, lower / scale, true), 0.025)).toBeGreaterThanOrEqual(13.5);
    expect(lre(referenceTail(scipy.t, 18, upper / scale, false), 0.025)).toBeGreaterThanOrEqual(13.5);
  });

  it('is the inverse in ncp of the cdf and sf, including large ncp and far tails', () => {
    for (const [t, df, p] of [[35, 30.7, 0.3], [2, 1, 1e-20], [-5, 4, 0.999], [45, 1e6, 0.5]] as const) {
      const ncp = noncentralTNcpForCdf(t, df, p);
      const tail = p > 0.5 ? noncentralTSf(t, df, ncp) : noncentralTCdf(t, df, ncp);
      expect(lre(tail, p > 0.5 ? 1 - p : p)).toBeGreaterThanOrEqual(13);
      // The sf form with q = 1 - p, where 1 - p still carries p's digits
      if (p > 1e-3) expect(lre(noncentralTNcpForSf(t, df, 1 - p), noncentralTNcpForCdf(t, df, 1 - (1 - p)))).toBeGreaterThanOrEqual(15);
    }
  });

  it('returns the infinite ends and the normal closed form', () => {
    expect(noncentralTNcpForCdf(1, 5, 0)).toBe(Infinity);
    expect(noncentralTNcpForCdf(1, 5, 1)).toBe(-Infinity);
    // Φ(t - δ) = p ⇒ δ = t - z_p: common practice, no source
    expect(noncentralTNcpForCdf(1, Infinity, 0.5)).toBe(1);
  });
});

describe('noncentral t properties (fast-check)', () => {
  const df = fc.oneof(fc.double({min: 1, max: 60, noNaN: true}), fc.double({min: 60, max: 1e6, noNaN: true}));
  const ncp = fc.double({min: -40, max: 40, noNaN: true});
  const t = fc.double({min: -60, max: 60, noNaN: true});

  it('cdf is within [0, 1] and non-decreasing in t', () => {
    fc.assert(
      fc.property(t, t, df, ncp, (a, b, nu, delta) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        const p = noncentralTCdf(lo, nu, delta);
        const q = noncentralTCdf(hi, nu, delta);
        return p >= 0 && q <= 1 && (q < 1e-290 || p <= q * (1 + 1e-13));
      }),
      {numRuns: 60},
    );
  });

  it('cdf is non-increasing in ncp', () => {
    fc.assert(
      fc.property(t, df, ncp, ncp, (x, nu, a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        const atLo = noncentralTCdf(x, nu, lo);
        // Near the subnormal range (< 1e-290) doubles keep fewer digits than this tolerance.
        return atLo < 1e-290 || noncentralTCdf(x, nu, hi) <= atLo * (1 + 1e-13);
      }),
      {numRuns: 60},
    );
  });

  it('cdf + sf = 1 to 1e-14 where neither is tiny', () => {
    fc.assert(
      fc.property(t, df, ncp, (x, nu, delta) => {
        const c = noncentralTCdf(x, nu, delta);
        const s = noncentralTSf(x, nu, delta);
        return Math.min(c, s) < 1e-3 || Math.abs(c + s - 1) <= 1e-14;
      }),
      {numRuns: 60},
    );
  });

  it('ncpForCdf / ncpForSf recover ncp from the smaller tail', () => {
    fc.assert(
      fc.property(fc.double({min: -20, max: 20, noNaN: true}), df, fc.double({min: -30, max: 30, noNaN: true}), (x, nu, delta) => {
        const p = noncentralTCdf(x, nu, delta);
        const q = noncentralTSf(x, nu, delta);
        if (Math.min(p, q) < 1e-12) return true;
        // Each tail is inverted where it has relative precision (a cdf near 1 has not).
        const back = p <= q ? noncentralTNcpForCdf(x, nu, p) : noncentralTNcpForSf(x, nu, q);
        // The smaller tail holds ~1e-14 relative and its log-derivative in δ is at
        // least ~0.1 here, so δ comes back to ~1e-13; allow 1e-10.
        return Math.abs(back - delta) <= 1e-10 * Math.max(1, Math.abs(delta));
      }),
      {numRuns: 40},
    );
  });
});
