import {describe, expect, it} from 'vitest';
import {conditionalOddsRatio} from '../../../src/methods/shared/conditional-odds-ratio.js';
import {lre} from '../../helpers/lre.js';

describe('conditionalOddsRatio', () => {
  // References: mpmath 1.3.0 at 60 digits, exact binomial coefficients and bisection of
  // E[a; ψ] = a, P(A ≥ a; ψ) = α/2 and P(A ≤ a; ψ) = α/2 in log ψ.
  it('keeps its digits on tables far from independence, where the central weights underflow', () => {
    const strong = conditionalOddsRatio([[999, 1], [1, 999]], 0.95, 'two-sided');
    expect(lre(strong.estimate, 597987.4366372993)).toBeGreaterThanOrEqual(12);
    expect(lre(strong.ci[0], 53173.5145219603)).toBeGreaterThanOrEqual(12);
    expect(lre(strong.ci[1], 39248619.946463406)).toBeGreaterThanOrEqual(11);
    const inverse = conditionalOddsRatio([[60, 940], [900, 100]], 0.95, 'two-sided');
    expect(lre(inverse.estimate, 0.007133002261462214)).toBeGreaterThanOrEqual(12);
    expect(lre(inverse.ci[0], 0.005007426289840479)).toBeGreaterThanOrEqual(12);
    expect(lre(inverse.ci[1], 0.010014980500916827)).toBeGreaterThanOrEqual(12);
  });

  it('puts the estimate and one bound at ∞ (or 0) at the edge of the support', () => {
    const edge = conditionalOddsRatio([[3, 0], [1, 2]], 0.95, 'two-sided');
    expect(edge.estimate).toBe(Infinity);
    expect(edge.ci[1]).toBe(Infinity);
    expect(lre(edge.ci[0], 0.20314400741878383)).toBeGreaterThanOrEqual(12);
    const mirrored = conditionalOddsRatio([[0, 3], [2, 1]], 0.95, 'two-sided');
    expect(mirrored.estimate).toBe(0);
    expect(mirrored.ci[0]).toBe(0);
    expect(lre(mirrored.ci[1], 1 / 0.20314400741878383)).toBeGreaterThanOrEqual(12);
  });

  it('gives 1 for a table at independence and one-sided bounds at the full alpha', () => {
    const flat = conditionalOddsRatio([[4, 4], [4, 4]], 0.95, 'two-sided');
    expect(Math.abs(flat.estimate - 1)).toBeLessThan(1e-14);
    expect(lre(flat.ci[0] * flat.ci[1], 1)).toBeGreaterThanOrEqual(12);
    const greater = conditionalOddsRatio([[8, 2], [1, 5]], 0.95, 'greater');
    const twoSided90 = conditionalOddsRatio([[8, 2], [1, 5]], 0.9, 'two-sided');
    expect(greater.ci[1]).toBe(Infinity);
    expect(lre(greater.ci[0], twoSided90.ci[0])).toBeGreaterThanOrEqual(13);
  });
});
