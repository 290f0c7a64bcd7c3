import {describe, expect, it} from 'vitest';
import {etaSquaredInterval} from '../../../src/methods/shared/eta-squared-interval.js';
import {lre} from '../../helpers/lre.js';

/**
 * Published intervals for (partial) η² at 90%, printed to 4 decimals, as
 * asserted in apaTables' tests (dstanley4/apaTables,
 * tests/testthat/test_anova_ci.R): Smithson (2001, Educ. Psychol. Meas.
 * 61:605, p. 619) and Fidler & Thompson (2001, Educ. Psychol. Meas. 61:575,
 * Tables 6 and 8). N = df1 + df2 + 1, as for a one-way design.
 */
const PUBLISHED: readonly (readonly [number, number, number, number, number, number])[] = [
  // F, df1, df2, lower, upper, decimals of the lower bound
  [6, 1, 42, 0.0117, 0.2801, 4],
  [2.65, 6, 42, 0.0174, 0.3577, 4],
  [2.5, 6, 42, 0.009, 0.3455, 3],
  [1.5, 1, 16, 0, 0.3167, 4],
  [4, 3, 16, 0.0357, 0.5671, 4],
  [1.5, 3, 16, 0, 0.3778, 4],
];

describe('etaSquaredInterval', () => {
  it('reproduces the published intervals of Smithson (2001) and Fidler & Thompson (2001)', () => {
    for (const [f, df1, df2, lower, upper, decimals] of PUBLISHED) {
      const [lo, hi] = etaSquaredInterval(f, df1, df2, df1 + df2 + 1, 0.9);
      expect(lo.toFixed(decimals), `F(${df1}, ${df2}) = ${f}`).toBe(lower.toFixed(decimals));
      expect(hi.toFixed(4), `F(${df1}, ${df2}) = ${f}`).toBe(upper.toFixed(4));
    }
  });

  it('maps the 40-digit noncentrality bounds to λ/(λ + N)', () => {
    // mpmath 1.3.0 at 40 digits: λ at P(F' ≤ 6.338028169014073; 1, 18, λ) = .95 and .05 (Lakens 2013 movies, N = 20)
    const [lo, hi] = etaSquaredInterval(6.338028169014073, 1, 18, 20, 0.9);
    expect(lre(lo, 0.47130035148866496492 / 20.47130035148866496492)).toBeGreaterThanOrEqual(13);
    expect(lre(hi, 18.213568947246226547 / 38.213568947246226547)).toBeGreaterThanOrEqual(13);
  });

  it('clamps the lower bound at 0 and collapses to [0, 0] at F = 0', () => {
    expect(etaSquaredInterval(0.5, 2, 20, 23, 0.95)[0]).toBe(0);
    expect(etaSquaredInterval(0, 2, 20, 23, 0.95)).toEqual([0, 0]);
  });
});
