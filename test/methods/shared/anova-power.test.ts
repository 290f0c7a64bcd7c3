import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {anovaNcpForPower, anovaPower, anovaSensitivity, ncpPerSquaredUnit} from '../../../src/methods/shared/anova-power.js';
import {lre} from '../../helpers/lre.js';

/** PlantGrowth (R datasets): MS_within as computed by scipy 1.10 in shared/reference/examples. */
const MS_WITHIN = 0.38859592592592596;

describe('ANOVA sensitivity', () => {
  it('gives the power of the F test from the noncentral F', () => {
    // mpmath 1.3.0 at 40 digits: P(F' > F_.95(2, 27); 2, 27, λ), F_.95 = 3.3541308285291978589
    expect(lre(anovaPower({ncp: 3.2167089683752233388, df1: 2, df2: 27, alpha: 0.05}), 0.30996387524330000414)).toBeGreaterThanOrEqual(12);
    expect(lre(anovaPower({ncp: 12.866835873500893355, df1: 2, df2: 27, alpha: 0.05}), 0.86820613441894669385)).toBeGreaterThanOrEqual(12);
    // At λ = 0 the power is alpha.
    expect(lre(anovaPower({ncp: 0, df1: 3, df2: 40, alpha: 0.05}), 0.05)).toBeGreaterThanOrEqual(12);
    // mpmath 1.3.0 at 40 digits: λ with power 0.8, as above
    expect(lre(anovaNcpForPower(0.8, 2, 27, 0.05), 10.788562202782547307)).toBeGreaterThanOrEqual(12);
    expect(anovaNcpForPower(0.04, 2, 27, 0.05)).toBe(0);
  });

  it('reads smallest-effect as a range of means: equal n gives Cohen’s f = δ/(σ√(2k))', () => {
    const weights = [10, 10, 10].map((n) => n / MS_WITHIN);
    const sensitivity = anovaSensitivity({weights, df1: 2, df2: 27, alpha: 0.05, smallestEffect: 0.5})!;
    // λ = f²N with f = 0.5/(σ√6), N = 30; power as above (mpmath 1.3.0 at 40 digits)
    expect(lre(sensitivity.power_at_smallest_effect!, 0.30996387524330000414)).toBeGreaterThanOrEqual(11);
    expect(lre(sensitivity.min_detectable_effect_80, 0.91568458746445343447)).toBeGreaterThanOrEqual(11);
    expect(anovaSensitivity({weights, df1: 2, df2: 27, alpha: 0.05, smallestEffect: undefined})!.power_at_smallest_effect).toBeNull();
  });

  it('places the extremes on the least favourable pair: no spread of means with range δ has a smaller λ', () => {
    const arb = fc.tuple(
      fc.array(fc.integer({min: 2, max: 60}), {minLength: 2, maxLength: 6}),
      fc.array(fc.double({min: 0, max: 1, noNaN: true}), {minLength: 6, maxLength: 6}),
      fc.nat(),
      fc.nat(),
    );
    fc.assert(
      fc.property(arb, ([sizes, positions, first, second]) => {
        const k = sizes.length;
        const [i, j] = [first % k, second % k];
        fc.pre(i !== j);
        // Means in [0, 1] with groups i and j at the ends: range exactly 1.
        const means = sizes.map((_, g) => (g === i ? 0 : g === j ? 1 : positions[g]!));
        const total = sizes.reduce((a, b) => a + b, 0);
        const centre = sizes.reduce((sum, n, g) => sum + n * means[g]!, 0) / total;
        const lambda = sizes.reduce((sum, n, g) => sum + n * (means[g]! - centre) ** 2, 0);
        expect(lambda).toBeGreaterThanOrEqual(ncpPerSquaredUnit(sizes) * (1 - 1e-12));
      }),
    );
    // The bound is reached: the two smallest groups at the ends, the others at the weighted mean.
    const sizes = [12, 5, 30, 8];
    const centre = (5 * 0 + 8 * 1) / 13;
    const means = [centre, 0, centre, 1];
    const grand = sizes.reduce((sum, n, g) => sum + n * means[g]!, 0) / 55;
    const lambda = sizes.reduce((sum, n, g) => sum + n * (means[g]! - grand) ** 2, 0);
    expect(lre(lambda, ncpPerSquaredUnit(sizes))).toBeGreaterThanOrEqual(14);
    expect(ncpPerSquaredUnit(sizes)).toBe((5 * 8) / 13);
  });

  it('has 80% power at the 80% detectable effect', () => {
    const input = {weights: [4, 9, 2.5], df1: 2, df2: 14.2, alpha: 0.01};
    const mde = anovaSensitivity({...input, smallestEffect: undefined})!.min_detectable_effect_80;
    expect(lre(anovaSensitivity({...input, smallestEffect: mde})!.power_at_smallest_effect!, 0.8)).toBeGreaterThanOrEqual(11);
  });
});
