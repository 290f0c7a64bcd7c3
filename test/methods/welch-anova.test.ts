import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {MethodError} from '../../src/methods/method-error.js';
import type {MethodOptions, Sample} from '../../src/methods/types.js';
import {welchAnova} from '../../src/methods/welch-anova.js';
import {welchT} from '../../src/methods/welch-t.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {intervalDigits, options as baseOptions, pDigits, sample} from './helpers.js';

const options = (overrides: Partial<MethodOptions> = {}): MethodOptions =>
  baseOptions({posthoc: undefined, correction: 'none', intercept: true, ...overrides});

const run = (samples: Sample[], overrides: Partial<MethodOptions> = {}) =>
  welchAnova.compute({kind: 'k-group', samples}, options(overrides));

type Groups = Record<string, number[]>;
const groupsOf = (data: Groups): Sample[] => Object.entries(data).map(([label, values]) => sample(label, values));

interface WelchReference {
  data: Groups;
  published: {F: number; denom_df?: number; p_value: number};
  scipy: {F: number; df1: number; df2: number; p_value: number};
}

describe('Welch’s ANOVA', () => {
  it('matches R oneway.test on PlantGrowth (as reproduced) and statsmodels', () => {
    const reference = example<WelchReference>('anova_welch--r-plantgrowth.json');
    const result = run(groupsOf(reference.data));
    const [df1, df2] = result.df as [number, number];
    // statsmodels 0.13.5 anova_oneway(use_var='unequal') in the reference file
    expect(lre(result.statistic.value, reference.scipy.F)).toBeGreaterThanOrEqual(13);
    expect(df1).toBe(2);
    expect(lre(df2, reference.scipy.df2)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    // R prints F = 5.181, denom df = 17.128, p-value = 0.01739
    expect(result.statistic.value.toFixed(3)).toBe(reference.published.F.toFixed(3));
    expect(df2.toFixed(3)).toBe(reference.published.denom_df!.toFixed(3));
    expect(Number(result.p.toPrecision(4))).toBe(reference.published.p_value);
  });

  it('matches R’s 15-digit oneway.test output stored in scipy’s tests (very unequal variances)', () => {
    const reference = example<WelchReference>('anova_welch--scipy-tests-r-oneway-toy.json');
    const result = run(groupsOf(reference.data));
    // R full-precision values (scipy test_stats.py TestFOneWay.test_unequal_var)
    expect(lre(result.statistic.value, reference.published.F)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.published.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(lre((result.df as [number, number])[1], reference.scipy.df2)).toBeGreaterThanOrEqual(13);
  });

  it('equals the square of Welch’s t with two groups (R ?oneway.test on sleep)', () => {
    const reference = example<WelchReference & {scipy: {welch_t_test: {t: number; df: number}}}>('anova_welch--r-oneway-sleep.json');
    const [a, b] = groupsOf(reference.data) as [Sample, Sample];
    const result = run([a, b]);
    const t = welchT.compute({kind: 'two-group', first: a, second: b}, options());
    // statsmodels in the reference file; R prints F = 3.4626, denom df = 17.776, p-value = 0.07939
    expect(lre(result.statistic.value, reference.scipy.F)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(lre(result.statistic.value, t.statistic.value ** 2)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, t.p)).toBeGreaterThanOrEqual(12);
    // With k = 2 the Bonferroni interval is the Welch t interval (group2 has the larger mean).
    expect(result.estimate!.name).toBe('largest difference in means (group2 - group1)');
    expect(intervalDigits(result.estimate!.ci, t.estimate!.ci, lre)).toBeGreaterThanOrEqual(13);
  });

  it('reports ω² from Welch’s F with its noncentral-F interval', () => {
    const reference = example<WelchReference>('anova_welch--r-plantgrowth.json');
    const effect = run(groupsOf(reference.data)).effect!;
    expect(effect.name).toBe('omega-squared');
    // numpy recomputation: 2(F - 1)/(2(F - 1) + 30) with Welch's F
    expect(lre(effect.value, 0.21797499726055186)).toBeGreaterThanOrEqual(13);
    // mpmath 1.3.0 at 40 digits: λ at P(F' ≤ F; 2, 17.128418616644137, λ) = .975 and .025, over λ + 30
    expect(lre(effect.ci![0], 0.0085201242855012397049)).toBeGreaterThanOrEqual(11);
    expect(lre(effect.ci![1], 0.4837494399366416341)).toBeGreaterThanOrEqual(12);

    const toy = run(groupsOf(example<WelchReference>('anova_welch--scipy-tests-r-oneway-toy.json').data)).effect!;
    // Welch F < 1: ω² is negative (numpy recomputation) and the lower bound is 0
    expect(lre(toy.value, -0.05489083546361194)).toBeGreaterThanOrEqual(13);
    expect(toy.ci![0]).toBe(0);
    // mpmath 1.3.0 at 40 digits, as above with df2 = 5.8298948937673405, N = 15
    expect(lre(toy.ci![1], 0.34932061971829504759)).toBeGreaterThanOrEqual(12);
  });

  it('estimates the largest difference with Welch standard errors, Bonferroni-adjusted', () => {
    const reference = example<WelchReference>('anova_welch--r-plantgrowth.json');
    const estimate = run(groupsOf(reference.data)).estimate!;
    expect(estimate.name).toBe('largest difference in means (trt2 - trt1)');
    // scipy 1.17.1: t.ppf(1 - .05/6, Welch–Satterthwaite df of the pair) · √(s₁²/n₁ + s₂²/n₂)
    expect(intervalDigits(estimate.ci, [0.8650000000000002 - 0.7802249314513353, 0.8650000000000002 + 0.7802249314513353], lre)).toBeGreaterThanOrEqual(12);
  });

  it('reports sensitivity with Welch’s weights and df; power at the 80% effect is 80%', () => {
    const groups = groupsOf(example<WelchReference>('anova_welch--r-plantgrowth.json').data);
    const mde = run(groups).sensitivity!.min_detectable_effect_80;
    expect(mde).toBeGreaterThan(0);
    // Consistency, not a reference value.
    expect(lre(run(groups, {smallestEffect: mde}).sensitivity!.power_at_smallest_effect!, 0.8)).toBeGreaterThanOrEqual(10);
  });

  it('needs two observations and a nonzero SD in every group', () => {
    expect(() => run([sample('a', [1, 2, 3]), sample('b', [4])])).toThrow(/b has a single observation/);
    expect(() => run([sample('a', [1, 2, 3]), sample('b', [4, 4])])).toThrow(/b has no variation/);
    expect(() => run([sample('a', [1, 2, 3])])).toThrow(MethodError);
    expect(() => run([sample('a', [1, 2]), sample('b', [2, 4])], {alternative: 'less'})).toThrow(MethodError);
  });

  describe('properties', () => {
    const groupsArb = fc.array(
      fc.array(fc.integer({min: -1e6, max: 1e6}).map((v) => v / 1000), {minLength: 2, maxLength: 8}).filter((g) => g.some((v) => v !== g[0])),
      {minLength: 2, maxLength: 5},
    );

    it('keeps p in [0, 1] and is unchanged by reordering rows and groups', () => {
      fc.assert(
        fc.property(groupsArb, (groups) => {
          const base = run(groups.map((g, i) => sample(`g${i}`, g)));
          expect(base.p).toBeGreaterThanOrEqual(0);
          expect(base.p).toBeLessThanOrEqual(1);
          const moved = run(groups.map((g, i) => sample(`other ${i}`, [...g].reverse())).reverse());
          expect(lre(moved.statistic.value, base.statistic.value)).toBeGreaterThanOrEqual(11);
          expect(lre((moved.df as readonly [number, number])[1], (base.df as readonly [number, number])[1])).toBeGreaterThanOrEqual(11);
          expect(lre(moved.p, base.p)).toBeGreaterThanOrEqual(10);
        }),
        {numRuns: 100},
      );
    });
  });
});
