import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {oneProportion} from '../../src/methods/one-proportion.js';
import type {MethodOptions, ProportionDesign} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, pDigits} from './helpers.js';

const opts = (overrides: Partial<MethodOptions> = {}): MethodOptions =>
  options({correction: 'none', intercept: true, posthoc: undefined, ...overrides});

const design = (successes: number, trials: number): ProportionDesign => ({kind: 'proportion', successes, trials, success: 'heads'});

interface Coin {
  published: {without_continuity_correction: {X_squared: number; p_value: number; conf_int: number[]}};
  scipy: {without_continuity_correction: {z: number; p_value: number; conf_int: number[]}};
}

describe('one-proportion z test', () => {
  it('matches R ?prop.test(52, 100, correct = FALSE): score z, Wilson interval', () => {
    const reference = example<Coin>('proportion_z_one_sample--r-prop-test-52-of-100.json');
    const result = oneProportion.compute(design(52, 100), opts({mu: 0.5}));
    const scipy = reference.scipy.without_continuity_correction;
    // statsmodels 0.13 proportions_ztest(prop_var=0.5) and proportion_confint(method='wilson') in the reference file
    expect(lre(result.statistic.value, 0.4)).toBeGreaterThanOrEqual(15); // (52 - 50)/√25 exactly
    expect(lre(result.statistic.value, scipy.z)).toBeGreaterThanOrEqual(14);
    expect(lre(result.p, scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    // mpmath 1.3.0 at 40 digits, Wilson's closed form
    expect(lre(result.estimate!.ci[0], 0.4231657776522396)).toBeGreaterThanOrEqual(14);
    expect(lre(result.estimate!.ci[1], 0.615354482419481)).toBeGreaterThanOrEqual(14);
    // R stats-Ex.Rout.save: X-squared = 0.16, p-value = 0.6892, CI 0.4231658 0.6153545
    const published = reference.published.without_continuity_correction;
    expect(result.statistic.value ** 2).toBeCloseTo(published.X_squared, 12);
    expect(Number(result.p.toPrecision(4))).toBe(published.p_value);
    expect(result.estimate!.ci.map((b) => Number(b.toPrecision(7)))).toEqual(published.conf_int);
    expect(result.warnings).toBeUndefined();
  });

  it('uses the null standard error, not the Wald one (statsmodels docstring example, 5 of 83 against 0.05)', () => {
    const reference = example<{published: {p_value: number}; scipy: {z_score_test: number; p_score_test: number}}>('proportion_z_one_sample--statsmodels-doc.json');
    const result = oneProportion.compute(design(5, 83), opts({mu: 0.05}));
    // statsmodels 0.13 proportions_ztest(5, 83, value=0.05, prop_var=0.05) in the reference file
    expect(lre(result.statistic.value, reference.scipy.z_score_test)).toBeGreaterThanOrEqual(14);
    expect(lre(result.p, reference.scipy.p_score_test)).toBeGreaterThanOrEqual(pDigits);
    // The docstring's 0.695 is the Wald form; the score test must not reproduce it.
    expect(result.p.toFixed(3)).not.toBe(reference.published.p_value.toFixed(3));
    // mpmath 1.3.0 at 40 digits, Wilson's closed form
    expect(lre(result.estimate!.ci[0], 0.026003401041882014)).toBeGreaterThanOrEqual(14);
    expect(lre(result.estimate!.ci[1], 0.13338428093238414)).toBeGreaterThanOrEqual(14);
    // n·p₀ = 4.15 < 5
    expect(result.warnings![0]).toMatchObject({kind: 'few-expected', alternative: 'binomial'});
  });

  it('gives one-sided bounds at 0 or 1 and one-sided p-values from the right tail', () => {
    const greater = oneProportion.compute(design(52, 100), opts({mu: 0.5, alternative: 'greater'}));
    const less = oneProportion.compute(design(52, 100), opts({mu: 0.5, alternative: 'less'}));
    expect(greater.estimate!.ci[1]).toBe(1);
    expect(less.estimate!.ci[0]).toBe(0);
    expect(lre(greater.p + less.p, 1)).toBeGreaterThanOrEqual(15);
    // z at the one-sided level: 95% one-sided lower bound = 90% two-sided lower bound
    const ninety = oneProportion.compute(design(52, 100), opts({mu: 0.5, confidence: 0.9}));
    expect(lre(greater.estimate!.ci[0], ninety.estimate!.ci[0])).toBeGreaterThanOrEqual(14);
  });

  it('keeps the p-value and the Wilson interval consistent: p < α exactly when mu is outside the interval (fast-check)', () => {
    const cases = fc.integer({min: 5, max: 500}).chain((n) => fc.tuple(fc.integer({min: 0, max: n}), fc.constant(n)));
    fc.assert(
      fc.property(cases, fc.double({min: 0.02, max: 0.98, noNaN: true}), ([x, n], mu) => {
        const result = oneProportion.compute(design(x, n), opts({mu}));
        const [lower, upper] = result.estimate!.ci;
        const outside = mu < lower || mu > upper;
        // Away from the boundary (where rounding decides) the two must agree.
        fc.pre(Math.abs(result.p - 0.05) > 1e-9);
        expect(outside).toBe(result.p < 0.05);
      }),
      {numRuns: 300},
    );
  });
});
