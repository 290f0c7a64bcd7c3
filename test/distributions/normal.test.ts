import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {normalCdf, normalPdf, normalQuantile, normalSf, normalTwoSidedP} from '../../src/distributions/normal.js';
import {lre} from '../helpers/lre.js';

/**
 * Upper tail by Laplace's continued fraction for the Mills ratio,
 * Φc(z) = φ(z) / (z + 1/(z + 2/(z + 3/(z + …)))) (A&S 26.2.14), summed from
 * the bottom with 500 levels: an independent method, exact to rounding for
 * z ≥ 9. For integer z, z²/2 is exact, so φ(z) = exp(-z²/2)/√(2π) is too.
 */
function millsTail(z: number): number {
  let fraction = z;
  for (let k = 500; k >= 1; k--) fraction = z + k / fraction;
  return Math.exp(-(z * z) / 2) / Math.sqrt(2 * Math.PI) / fraction;
}

describe('normalCdf / normalSf', () => {
  it('is ½ at 0 and symmetric', () => {
    expect(normalCdf(0)).toBe(0.5); // common practice, no source
    expect(normalSf(0)).toBe(0.5);
    expect(normalCdf(-1.5)).toBe(normalSf(1.5));
  });

  it('matches mpmath at ordinary arguments', () => {
    // mpmath 1.3.0 ncdf(-1.5) at 50 digits, computed for this test
    expect(lre(normalCdf(-1.5), 0.066807201268858066004)).toBeGreaterThanOrEqual(15);
    // mpmath 1.3.0 ncdf(8) at 50 digits: the cdf near 1 keeps its absolute precision
    expect(lre(normalCdf(8), 0.9999999999999993779039426)).toBeGreaterThanOrEqual(15);
  });

  it('keeps full precision in the far tails (z = -9, -20, -37)', () => {
    // mpmath 1.3.0 ncdf(z) at 50 digits, computed for this test
    expect(lre(normalCdf(-9), 1.1285884059538406477e-19)).toBeGreaterThanOrEqual(15);
    expect(lre(normalCdf(-20), 2.7536241186062336951e-89)).toBeGreaterThanOrEqual(15);
    expect(lre(normalCdf(-37), 5.7255712225245768227e-300)).toBeGreaterThanOrEqual(15);
    // Laplace continued fraction computed here (independent of erfc)
    for (const z of [9, 20, 37]) {
      expect(lre(normalSf(z), millsTail(z))).toBeGreaterThanOrEqual(15);
      expect(normalCdf(-z)).toBe(normalSf(z));
    }
  });

  it('corrects the rounding of z/√2 that a bare erfc call would keep', () => {
    // mpmath 1.3.0 ncdf(-37.5): the last value above the subnormal range
    expect(lre(normalCdf(-37.5), 4.6053530095819548438e-308)).toBeGreaterThanOrEqual(14.5);
  });

  it('gives the two-sided p-value without 1 - cdf', () => {
    expect(normalTwoSidedP(-20)).toBe(2 * normalSf(20));
    expect(normalTwoSidedP(0)).toBe(1);
  });

  it('returns NaN for NaN and the limits at ±Infinity', () => {
    expect(normalCdf(NaN)).toBeNaN();
    expect(normalSf(NaN)).toBeNaN();
    expect(normalCdf(-Infinity)).toBe(0);
    expect(normalCdf(Infinity)).toBe(1);
    expect(normalSf(Infinity)).toBe(0);
  });
});

describe('normalPdf', () => {
  it('matches mpmath in the tail', () => {
    // mpmath 1.3.0 npdf(-37) at 50 digits
    expect(lre(normalPdf(-37), 2.1200065515246056269e-298)).toBeGreaterThanOrEqual(15);
    expect(normalPdf(0)).toBe(0.3989422804014327); // 1/√(2π) rounded, common practice, no source
  });
});

describe('normalQuantile', () => {
  it('matches mpmath from the centre to p = 1e-300', () => {
    // mpmath 1.3.0: root of ncdf(x) = p at 60 digits, computed for this test
    expect(lre(normalQuantile(0.025), -1.9599639845400542355)).toBeGreaterThanOrEqual(15);
    expect(lre(normalQuantile(0.975), 1.9599639845400542355)).toBeGreaterThanOrEqual(15);
    expect(lre(normalQuantile(1e-20), -9.2623400897984075737)).toBeGreaterThanOrEqual(15);
    expect(lre(normalQuantile(1e-300), -37.047096299361199237)).toBeGreaterThanOrEqual(15);
  });

  it('handles the ends and invalid probabilities', () => {
    expect(normalQuantile(0)).toBe(-Infinity);
    expect(normalQuantile(1)).toBe(Infinity);
    expect(normalQuantile(0.5)).toBe(0);
    expect(normalQuantile(-0.1)).toBeNaN();
    expect(normalQuantile(1.5)).toBeNaN();
    expect(normalQuantile(NaN)).toBeNaN();
  });
});

describe('normal properties (fast-check)', () => {
  const z = fc.double({min: -37, max: 37, noNaN: true});

  it('cdf is within [0, 1] and non-decreasing', () => {
    fc.assert(
      fc.property(z, z, (a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        const p = normalCdf(lo);
        return p >= 0 && p <= 1 && p <= normalCdf(hi);
      }),
    );
  });

  it('cdf + sf = 1 to 1e-15', () => {
    fc.assert(fc.property(z, (x) => Math.abs(normalCdf(x) + normalSf(x) - 1) <= 1e-15));
  });

  it('quantile inverts the cdf on its smaller tail', () => {
    fc.assert(
      fc.property(fc.double({min: -37, max: 0, noNaN: true}), (x) => {
        // Near the median p = Φ(x) carries only absolute precision (1.1e-16),
        // which limits x to about 3e-16 absolute; further out, 14 digits.
        const back = normalQuantile(normalCdf(x));
        return lre(back, x) >= 14 || Math.abs(back - x) <= 3e-16;
      }),
    );
  });
});
