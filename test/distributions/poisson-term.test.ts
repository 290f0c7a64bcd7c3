import {describe, expect, it} from 'vitest';
import {
  binomialTerm,
  devianceTerm,
  logGamma,
  poissonTerm,
  stirlingError,
} from '../../src/distributions/poisson-term.js';
import {lre} from '../helpers/lre.js';

describe('stirlingError', () => {
  it('matches mpmath off the half-integer table, at the series switch and far out', () => {
    // mpmath 1.3.0: loggamma(n+1) - (n+½)log n + n - log√(2π) at 50 digits, computed for
    // this test. δ(n) enters an exponent, so its absolute error is what counts: a few ulps
    // of 1 (5e-16) cost at most 5e-16 relative in the terms built from it.
    expect(Math.abs(stirlingError(0.3) - 0.23606490074821558839)).toBeLessThan(5e-16);
    expect(Math.abs(stirlingError(7.25) - 0.011487002684428696791)).toBeLessThan(5e-16);
    expect(Math.abs(stirlingError(15.5) - 0.0053755990329268344936)).toBeLessThan(5e-16);
    expect(lre(stirlingError(1e6), 8.3333333333330555556e-8)).toBeGreaterThanOrEqual(15);
  });

  it('is continuous where the table, recurrence and series meet', () => {
    // Absolute agreement is what matters: δ(n) enters an exponent.
    expect(Math.abs(stirlingError(15) - stirlingError(15 + 1e-9))).toBeLessThan(1e-12);
    expect(Math.abs(stirlingError(2.5) - stirlingError(2.5 + 1e-12))).toBeLessThan(1e-13);
  });
});

describe('logGamma', () => {
  it('matches mpmath', () => {
    // mpmath 1.3.0 loggamma at 50 digits
    expect(lre(logGamma(0.5), 0.57236494292470008707)).toBeGreaterThanOrEqual(15);
    expect(lre(logGamma(123.4), 469.33609744219058579)).toBeGreaterThanOrEqual(15);
  });
});

describe('devianceTerm', () => {
  it('is x log(x/m) + m - x, and 0 at x = m', () => {
    expect(devianceTerm(7, 7)).toBe(0);
    // direct formula at well-separated arguments: common practice, no source
    expect(lre(devianceTerm(1, 3), Math.log(1 / 3) + 2)).toBeGreaterThanOrEqual(15);
    // series branch: Σ 2x v^(2j+1)/(2j+1) - (x - m)v with v = (x-m)/(x+m); at (1, 1.1)
    // this equals log(1/1.1) + 0.1 (computed from the closed form with log1p)
    expect(lre(devianceTerm(1, 1.1), 0.1 - Math.log1p(0.1))).toBeGreaterThanOrEqual(13);
  });
});

describe('poissonTerm', () => {
  it('equals e^-λ λ^k / k! at small integers', () => {
    // closed form: common practice, no source
    expect(lre(poissonTerm(3, 2), (Math.exp(-2) * 8) / 6)).toBeGreaterThanOrEqual(15);
    expect(poissonTerm(0, 2.5)).toBe(Math.exp(-2.5));
    expect(poissonTerm(0, 0)).toBe(1);
    expect(poissonTerm(2, 0)).toBe(0);
  });

  it('keeps its digits at the mode of a large Poisson and at half-integers', () => {
    // mpmath 1.3.0: exp(-λ + k log λ - loggamma(k+1)) at 50 digits
    expect(lre(poissonTerm(800, 800), 0.014103270421583719428)).toBeGreaterThanOrEqual(15);
    expect(lre(poissonTerm(10.5, 3.125), 0.000579734392609150431)).toBeGreaterThanOrEqual(15);
  });
});

describe('binomialTerm', () => {
  it('equals the binomial probability at small integers', () => {
    // C(5,2)·0.3²·0.7³ = 0.3087: common practice, no source
    expect(lre(binomialTerm(2, 3, 0.3, 0.7), 0.3087)).toBeGreaterThanOrEqual(15);
  });

  it('stays accurate for n = 5e5 where log-gamma differences cancel', () => {
    // mpmath 1.3.0 at 50 digits with q = 1 - p exactly
    expect(lre(binomialTerm(5.5, 500000, 1e-5, 1 - 1e-5), 0.16354897507109516019)).toBeGreaterThanOrEqual(14);
  });
});
