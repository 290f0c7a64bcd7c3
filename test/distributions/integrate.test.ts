import {describe, expect, it} from 'vitest';
import {integrate} from '../../src/distributions/integrate.js';
import {lre} from '../helpers/lre.js';

describe('integrate (adaptive Gauss-Legendre)', () => {
  it('integrates polynomials of degree ≤ 39 exactly on one panel', () => {
    // ∫₀¹ x^39 dx = 1/40: common practice, no source
    expect(lre(integrate((x) => x ** 39, 0, 1), 1 / 40)).toBeGreaterThanOrEqual(15);
  });

  it('reaches 1e-15 on smooth integrands', () => {
    // ∫₀^π sin = 2; ∫₋₈⁸ e^{-x²/2} = √(2π)·(1 - 2Φ(-8)) with 2Φ(-8) = 1.2e-15 (closed forms)
    expect(lre(integrate(Math.sin, 0, Math.PI), 2)).toBeGreaterThanOrEqual(15);
    expect(lre(integrate((x) => Math.exp(-x * x / 2), -30, 30), Math.sqrt(2 * Math.PI))).toBeGreaterThanOrEqual(15);
  });

  it('refines a narrow peak that its first panel can see', () => {
    // ∫ e^{-(x-3)²/(2·0.2²)} dx over [-10, 10] = 0.2·√(2π) (closed form)
    const peak = (x: number) => Math.exp(-((x - 3) ** 2) / (2 * 0.04));
    expect(lre(integrate(peak, -10, 10), 0.2 * Math.sqrt(2 * Math.PI))).toBeGreaterThanOrEqual(14.5);
  });

  it('cannot find a spike that no node samples: callers must centre the interval', () => {
    // Documented limitation of any adaptive rule: the noncentral t quadrature
    // therefore splits its range at the located peak.
    const spike = (x: number) => Math.exp(-((x - 3) ** 2) / (2 * 1e-6));
    expect(integrate(spike, -50, 50)).toBeLessThan(1e-10);
    expect(lre(integrate(spike, -1, 3) + integrate(spike, 3, 7), 1e-3 * Math.sqrt(2 * Math.PI))).toBeGreaterThanOrEqual(
      14.5,
    );
  });
});
