import {describe, expect, it} from 'vitest';
import {newcombeInterval, newcombePairedInterval} from '../../../src/methods/shared/newcombe-interval.js';
import {lre} from '../../helpers/lre.js';

describe('Newcombe hybrid score intervals', () => {
  it('independent samples: Perondi et al. (2004) as printed by contingencytables (Fagerland et al. 2017)', () => {
    // Newcombe_hybrid_score_CI_2x2: estimate = 0.1765 (95% CI 0.0189 to 0.3404); mpmath 1.3.0 at 40 digits for the full values
    const ci = newcombeInterval({successes: 1, trials: 34}, {successes: 7, trials: 34}, 0.95, 'two-sided');
    expect(ci.map((b) => b.toFixed(4))).toEqual(['0.0189', '0.3404']);
    expect(lre(ci[0], 0.018921443885773017)).toBeGreaterThanOrEqual(13);
    expect(lre(ci[1], 0.3403686870327074)).toBeGreaterThanOrEqual(13);
  });

  it('independent samples: one-sided bounds at the one-sided level, the other at ±1', () => {
    const greater = newcombeInterval({successes: 5, trials: 83}, {successes: 12, trials: 99}, 0.95, 'greater');
    // mpmath 1.3.0 at 40 digits: the formula with z = Φ⁻¹(0.95)
    expect(lre(greater[0], -0.01219172928372813)).toBeGreaterThanOrEqual(13);
    expect(greater[1]).toBe(1);
    const less = newcombeInterval({successes: 5, trials: 83}, {successes: 12, trials: 99}, 0.95, 'less');
    expect(less[0]).toBe(-1);
    expect(lre(less[1], 0.13214460188359903)).toBeGreaterThanOrEqual(13);
  });

  it('paired samples: Cavo et al. (2012) as printed by contingencytables, with the φ correction', () => {
    // Newcombe_square_and_add_CI_paired_2x2: estimate = -0.0621 (95% CI -0.1186 to -0.0046)
    const ci = newcombePairedInterval([[59, 6], [16, 80]], 0.95, 'two-sided');
    expect(ci.map((b) => b.toFixed(4))).toEqual(['-0.1186', '-0.0046']);
    // mpmath 1.3.0 at 40 digits
    expect(lre(ci[0], -0.11862119563870992)).toBeGreaterThanOrEqual(13);
    expect(lre(ci[1], -0.004625113933050066)).toBeGreaterThanOrEqual(12);
  });

  it('paired samples: φ = 0 when a margin is empty, and the interval reduces to the independent form', () => {
    // All subjects at the second level on the second measurement: the second margin has no first level.
    const ci = newcombePairedInterval([[0, 4], [0, 6]], 0.95, 'two-sided');
    const independent = newcombeInterval({successes: 6, trials: 10}, {successes: 10, trials: 10}, 0.95, 'two-sided');
    expect(ci).toEqual(independent);
  });
});
