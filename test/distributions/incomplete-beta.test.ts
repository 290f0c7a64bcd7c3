import betainc from '@stdlib/math-base-special-betainc';
import {describe, expect, it} from 'vitest';
import {betaTerm, incompleteBeta} from '../../src/distributions/incomplete-beta.js';
import {lre} from '../helpers/lre.js';

describe('incompleteBeta', () => {
  it('matches closed forms at a = 1 and b = 1', () => {
    // I_x(1, b) = 1 - (1-x)^b and I_x(a, 1) = x^a: common practice, no source
    expect(lre(incompleteBeta(1, 4, 0.2, 0.8, false), 1 - 0.8 ** 4)).toBeGreaterThanOrEqual(15);
    expect(lre(incompleteBeta(3, 1, 0.2, 0.8, false), 0.2 ** 3)).toBeGreaterThanOrEqual(15);
    expect(lre(incompleteBeta(1, 4, 0.2, 0.8, true), 0.8 ** 4)).toBeGreaterThanOrEqual(15);
  });

  it('keeps relative precision on the small side beyond the mean, where Boost loses it', () => {
    const y = 1 / 11;
    const x = 1 - y;
    // mpmath 1.3.0 betainc(163.5, 5, 0, 1 - y) at 50 digits, with the double y
    const exact = 0.00047693023806314893349;
    expect(lre(incompleteBeta(163.5, 5, x, y, false), exact)).toBeGreaterThanOrEqual(14.5);
    // The Boost port alone: recorded so a fixed upstream can be noticed.
    expect(lre(betainc(y, 5, 163.5, true, true), exact)).toBeLessThan(12);
    // mpmath 1.3.0 betainc(5, 163.5, 0, y): the complement, near 1
    expect(lre(incompleteBeta(163.5, 5, x, y, true), 0.99952306976193685107)).toBeGreaterThanOrEqual(15);
  });

  it('handles tiny values with large b', () => {
    // mpmath 1.3.0 betainc(40.5, 500, 0, 4.9e-4) at 50 digits. The deviance
    // term here is about 160, and its ~ε·330 absolute error caps the result
    // at ~13.4 digits (documented in the module).
    expect(lre(incompleteBeta(40.5, 500, 4.9e-4, 1 - 4.9e-4, false), 1.3116202143582627013e-73)).toBeGreaterThanOrEqual(
      13,
    );
  });
});

describe('betaTerm', () => {
  it('is the step I_x(a, b) - I_x(a+1, b)', () => {
    // mpmath 1.3.0: Γ(a+b)/(Γ(a+1)Γ(b)) x^a y^b at a = 12.5, b = 7, x = 0.3
    expect(lre(betaTerm(12.5, 7, 0.3, 0.7), 0.00053963071096232308331)).toBeGreaterThanOrEqual(14.5);
    const step = incompleteBeta(2.5, 7, 0.3, 0.7, false) - incompleteBeta(3.5, 7, 0.3, 0.7, false);
    expect(lre(betaTerm(2.5, 7, 0.3, 0.7), step)).toBeGreaterThanOrEqual(13);
    expect(betaTerm(2, 3, 0, 1)).toBe(0);
  });
});
