import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {binomial} from '../../src/methods/binomial.js';
import {MethodError} from '../../src/methods/method-error.js';
import type {MethodOptions, ProportionDesign} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, pDigits} from './helpers.js';

const opts = (overrides: Partial<MethodOptions> = {}): MethodOptions =>
  options({correction: 'none', intercept: true, posthoc: undefined, ...overrides});

const design = (successes: number, trials: number): ProportionDesign => ({kind: 'proportion', successes, trials, success: 'yes'});

interface Mendel {
  data: {successes_giant: number; n: number};
  published: {p_value: number; conf_int: number[]; estimate: number};
  scipy: {p_value: number};
}

describe('exact binomial test', () => {
  it('matches R ?binom.test on Conover’s Mendelian cross (682 of 925 against 3/4)', () => {
    const reference = example<Mendel>('binomial_exact--r-binom-conover1971-mendel.json');
    const result = binomial.compute(design(reference.data.successes_giant, reference.data.n), opts({mu: 0.75}));
    // scipy 1.10 binomtest(682, 925, p=0.75) in the reference file; mpmath 1.3.0 at 40 digits
    // (exact sum of the probabilities ≤ 1.0000001 × the observed one) gives 0.3824915595748517
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(lre(result.p, 0.3824915595748517)).toBeGreaterThanOrEqual(13);
    // mpmath 1.3.0 at 40 digits: bisection of the regularized incomplete beta tails. scipy 1.17.1's
    // proportion_ci(method='exact') upper bound 0.7654065582414781 carries only 13 digits.
    expect(lre(result.estimate!.ci[0], 0.707668264079039)).toBeGreaterThanOrEqual(13);
    expect(lre(result.estimate!.ci[1], 0.7654065582415253)).toBeGreaterThanOrEqual(13);
    // R stats-Ex.Rout.save: p-value = 0.3825, CI 0.7076683 0.7654066, estimate 0.7372973
    expect(Number(result.p.toPrecision(4))).toBe(reference.published.p_value);
    expect(result.estimate!.ci.map((b) => Number(b.toPrecision(7)))).toEqual(reference.published.conf_int);
    expect(Number(result.estimate!.value.toPrecision(7))).toBe(reference.published.estimate);
    expect(result.variant).toBe('exact');
    expect(result.estimate!.name).toBe('proportion of yes');
  });

  it('matches the scipy documentation example (3 of 15 against 0.1, greater)', () => {
    const reference = example<{published: {p_value: number; conf_int: number[]}}>('binomial_exact--scipy-doc-car-safety.json');
    const result = binomial.compute(design(3, 15), opts({mu: 0.1, alternative: 'greater'}));
    // SciPy docs binomtest(3, 15, p=0.1, alternative='greater'), full double precision
    expect(lre(result.p, reference.published.p_value)).toBeGreaterThanOrEqual(pDigits);
    // mpmath 1.3.0 at 40 digits: P(X ≥ 3; p) = 0.05 by bisection (SciPy docs print 0.05684686759024681)
    expect(lre(result.estimate!.ci[0], 0.0568468675902468)).toBeGreaterThanOrEqual(13);
    expect(result.estimate!.ci[1]).toBe(1);
  });

  it('reports Cohen’s h against mu with the interval mapped from Clopper–Pearson', () => {
    const result = binomial.compute(design(682, 925), opts({mu: 0.75}));
    const h = (p: number) => 2 * Math.asin(Math.sqrt(p)) - 2 * Math.asin(Math.sqrt(0.75));
    expect(result.effect!.name).toBe('cohens-h');
    expect(result.effect!.value).toBe(h(682 / 925));
    expect(result.effect!.ci).toEqual([h(result.estimate!.ci[0]), h(result.estimate!.ci[1])]);
  });

  it('refuses mu outside (0, 1) and empty samples', () => {
    expect(() => binomial.compute(design(3, 10), opts({mu: 0}))).toThrow(MethodError);
    expect(() => binomial.compute(design(3, 10), opts({mu: 1.5}))).toThrow(/strictly between 0 and 1/);
    expect(() => binomial.compute(design(0, 0), opts({mu: 0.5}))).toThrow(/no observations/);
  });

  it('gives twice the smaller one-sided p at mu = ½, p in [0, 1], intervals containing the estimate (fast-check)', () => {
    const cases = fc.integer({min: 1, max: 400}).chain((n) => fc.tuple(fc.integer({min: 0, max: n}), fc.constant(n)));
    fc.assert(
      fc.property(cases, fc.double({min: 0.01, max: 0.99, noNaN: true}), ([x, n], mu) => {
        const two = binomial.compute(design(x, n), opts({mu: 0.5})).p;
        const greater = binomial.compute(design(x, n), opts({mu: 0.5, alternative: 'greater'})).p;
        const less = binomial.compute(design(x, n), opts({mu: 0.5, alternative: 'less'})).p;
        expect(lre(two, Math.min(1, 2 * Math.min(greater, less)))).toBeGreaterThanOrEqual(12);
        const result = binomial.compute(design(x, n), opts({mu}));
        expect(result.p).toBeGreaterThanOrEqual(0);
        expect(result.p).toBeLessThanOrEqual(1);
        expect(result.estimate!.ci[0]).toBeLessThanOrEqual(x / n);
        expect(result.estimate!.ci[1]).toBeGreaterThanOrEqual(x / n);
      }),
      {numRuns: 150},
    );
  });
});
