import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {chiSquareGof} from '../../src/methods/chi-square-gof.js';
import {MethodError} from '../../src/methods/method-error.js';
import type {CountsDesign, MethodOptions} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, pDigits} from './helpers.js';

const opts = (overrides: Partial<MethodOptions> = {}): MethodOptions =>
  options({correction: 'none', intercept: true, posthoc: undefined, ...overrides});

function counts(values: number[], expected?: number[]): CountsDesign {
  return {kind: 'counts', levels: values.map((_, i) => `L${i}`), counts: values, expected};
}

interface Case {
  X_squared: number;
  p_value: number;
}

describe('chi-square goodness-of-fit test', () => {
  it('matches R ?chisq.test with equal proportions (20, 15, 25)', () => {
    const reference = example<{published: Case & {df: number}; scipy: Case}>('chisq_gof--r-chisq-uniform-20-15-25.json');
    const result = chiSquareGof.compute(counts([20, 15, 25]), opts());
    // scipy 1.10 chisquare([20, 15, 25]) in the reference file; R prints X-squared = 2.5, df = 2, p-value = 0.2865
    expect(lre(result.statistic.value, reference.scipy.X_squared)).toBeGreaterThanOrEqual(15);
    expect(result.df).toBe(reference.published.df);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(Number(result.p.toPrecision(4))).toBe(reference.published.p_value);
    // Cohen's w = √(2.5/60); interval: mpmath 1.3.0 at 40 digits, bisection of the noncentral chi-square series
    expect(result.effect!.name).toBe('cohens-w');
    expect(lre(result.effect!.value, 0.2041241452319315)).toBeGreaterThanOrEqual(15);
    expect(result.effect!.ci![0]).toBe(0); // p = 0.29 ≥ 0.025: no λ > 0 puts X² at the upper 2.5%
    expect(lre(result.effect!.ci![1], 0.42855159420365685)).toBeGreaterThanOrEqual(13);
    expect(result.estimate).toBeUndefined();
  });

  it('matches R ?chisq.test with given probabilities, warning on the small expected count', () => {
    const reference = example<{data: {observed: number[]}; published: {case_a: Case; case_b: Case}; scipy: {case_a: Case; case_b: Case}}>(
      'chisq_gof--r-chisq-given-probabilities.json',
    );
    const cases = [
      ['case_a', [0.4, 0.2, 0.2, 0.15, 0.05]],
      ['case_b', [0.4, 0.2, 0.2, 0.19, 0.01]],
    ] as const;
    for (const [key, p] of cases) {
      const result = chiSquareGof.compute(counts(reference.data.observed, [...p]), opts());
      // scipy 1.10 chisquare(x, f_exp=p * sum(x)) in the reference file
      expect(lre(result.statistic.value, reference.scipy[key].X_squared), key).toBeGreaterThanOrEqual(13);
      expect(lre(result.p, reference.scipy[key].p_value), key).toBeGreaterThanOrEqual(pDigits);
      // R stats-Ex.Rout.save, printed to 4-5 digits
      expect(result.statistic.value.toFixed(4), key).toBe(reference.published[key].X_squared.toFixed(4));
      expect(result.p.toPrecision(4), key).toBe(reference.published[key].p_value.toPrecision(4));
    }
    const b = chiSquareGof.compute(counts(reference.data.observed, [0.4, 0.2, 0.2, 0.19, 0.01]), opts());
    expect(b.warnings![0]).toMatchObject({kind: 'small-expected', below: 1, cells: 5});
    expect((b.warnings![0] as {smallest: number}).smallest.toPrecision(3)).toBe('1.86');
    expect((b.details as {expected: number[]}).expected[4]).toBeCloseTo(1.86, 12);
  });

  it('matches the scipy documentation examples (uniform and given f_exp)', () => {
    const reference = example<{data: {observed: number[]; f_exp_case_2: number[]}; published: {case_1: Case; case_2: Case}}>('chisq_gof--scipy-doc-chisquare.json');
    const observed = reference.data.observed;
    const uniform = chiSquareGof.compute(counts(observed), opts());
    // SciPy docs, full double precision
    expect(lre(uniform.statistic.value, reference.published.case_1.X_squared)).toBeGreaterThanOrEqual(15);
    expect(lre(uniform.p, reference.published.case_1.p_value)).toBeGreaterThanOrEqual(pDigits);
    const total = observed.reduce((a, b) => a + b, 0);
    const given = chiSquareGof.compute(counts(observed, reference.data.f_exp_case_2.map((e) => e / total)), opts());
    expect(lre(given.statistic.value, reference.published.case_2.X_squared)).toBeGreaterThanOrEqual(15);
    expect(lre(given.p, reference.published.case_2.p_value)).toBeGreaterThanOrEqual(pDigits);
  });

  it('refuses impossible declarations with a MethodError', () => {
    expect(() => chiSquareGof.compute(counts([5, 5], [0.5, 0.6]), opts())).toThrow(/sum to 1.1/);
    expect(() => chiSquareGof.compute(counts([5, 5], [1, 0]), opts())).toThrow(/expected with proportion 0/);
    expect(() => chiSquareGof.compute(counts([5]), opts())).toThrow(MethodError);
    expect(() => chiSquareGof.compute(counts([0, 0]), opts())).toThrow(/no observations/);
    expect(() => chiSquareGof.compute(counts([5, 6]), opts({alternative: 'less'}))).toThrow(MethodError);
  });

  it('drops levels expected and observed 0 times from the degrees of freedom', () => {
    const result = chiSquareGof.compute(counts([20, 15, 25, 0], [1 / 3, 1 / 3, 1 / 3, 0]), opts());
    expect(result.df).toBe(2);
    expect(lre(result.statistic.value, 2.5)).toBeGreaterThanOrEqual(14);
  });

  it('is invariant under relabelling levels, with p in [0, 1] (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({min: 0, max: 200}), {minLength: 2, maxLength: 8}), (values) => {
        fc.pre(values.some((v) => v > 0));
        const result = chiSquareGof.compute(counts(values), opts());
        const reversed = chiSquareGof.compute(counts([...values].reverse()), opts());
        expect(result.p).toBeGreaterThanOrEqual(0);
        expect(result.p).toBeLessThanOrEqual(1);
        expect(lre(reversed.statistic.value, result.statistic.value)).toBeGreaterThanOrEqual(12);
      }),
      {numRuns: 80},
    );
  });
});
