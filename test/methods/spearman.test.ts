import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {MethodError} from '../../src/methods/method-error.js';
import {spearman} from '../../src/methods/spearman.js';
import type {Alternative, BivariateDesign} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, pDigits, sample} from './helpers.js';
import {nistRegression} from './nist-regression.js';

function design(x: readonly number[] | Float64Array, y: readonly number[] | Float64Array): BivariateDesign {
  return {kind: 'bivariate', x: [sample('x', Array.from(x))], y: sample('y', Array.from(y))};
}

type ByAlternative = Record<Alternative, number>;

function expectP(x: readonly number[] | Float64Array, y: readonly number[] | Float64Array, expected: ByAlternative, digits: number) {
  for (const [alternative, p] of Object.entries(expected) as [Alternative, number][]) {
    expect(lre(spearman.compute(design(x, y), options({alternative})).p, p), alternative).toBeGreaterThanOrEqual(digits);
  }
}

const tuna = example<{
  data: {x_hunter_L: number[]; y_panel_score: number[]};
  published: {S: number; rho: number; p_value: number};
  scipy: {p_value_exact_enumeration: number};
}>('spearman_correlation--r-cortest-hollander-wolfe-1973-p187.json');
const judges = example<{data: {CONT: number[]; INTG: number[]}}>('pearson_correlation--r-cortest-usjudgeratings.json');

describe('Spearman’s rank correlation, exact (n ≤ 10)', () => {
  it('matches R ?cor.test on the tuna data: S = 48, rho = 0.6, exact one-sided p = 0.0484', () => {
    const result = spearman.compute(design(tuna.data.x_hunter_L, tuna.data.y_panel_score), options({alternative: 'greater'}));
    // R stats-Ex.Rout.save prints S = 48, p-value = 0.0484, rho 0.6
    expect(result.statistic).toEqual({name: 'S', value: tuna.published.S});
    expect(lre(result.estimate!.value, tuna.published.rho)).toBeGreaterThanOrEqual(15);
    expect(Number(result.p.toPrecision(3))).toBe(tuna.published.p_value);
    expect(result.df).toBeNull();
    expect(result.variant).toBe('exact permutation distribution');
    // full enumeration of 9! pairings in shared/reference/examples/spearman_correlation--r-cortest-hollander-wolfe-1973-p187.json
    expect(lre(result.p, tuna.scipy.p_value_exact_enumeration)).toBeGreaterThanOrEqual(15);
  });

  it('matches scipy’s exact permutation test for every alternative, with and without ties', () => {
    const doc = example<{data: {x: number[]; y: number[]}}>('pearson_correlation--scipy-doc.json').data;
    const ties = example<{data: {x: number[]; y: number[]}; published: {rho: number}}>('spearman_correlation--scipy-doc-ties.json');
    // scipy 1.17.1: stats.permutation_test((x,), lambda u: stats.spearmanr(u, y).statistic,
    //   permutation_type='pairings', alternative=alt, n_resamples=np.inf).pvalue
    expectP(tuna.data.x_hunter_L, tuna.data.y_panel_score, {'two-sided': 0.09679783950617284, greater: 0.04839891975308642, less: 0.9571373456790123}, 15);
    expectP(doc.x, doc.y, {'two-sided': 0.04801587301587302, greater: 0.9829365079365079, less: 0.02400793650793651}, 15);
    expectP(ties.data.x, ties.data.y, {'two-sided': 0.13333333333333333, greater: 0.06666666666666667, less: 0.9666666666666667}, 15);
    const tied = spearman.compute(design(ties.data.x, ties.data.y), options());
    // SciPy docs, scipy.stats.spearmanr example: rho with mid-ranks, full double precision
    expect(lre(tied.estimate!.value, ties.published.rho)).toBeGreaterThanOrEqual(15);
    expect(tied.variant).toBe('exact permutation distribution, conditional on the ties');
  });

  it('gives the Bonett–Wright Fisher-z interval', () => {
    const twoSided = spearman.compute(design(tuna.data.x_hunter_L, tuna.data.y_panel_score), options());
    // mpmath 1.3.0 at 40 digits: tanh(atanh(0.6) ± z_.975 √((1 + 0.6²/2)/6))
    expect(lre(twoSided.estimate!.ci[0], -0.17424406977828484)).toBeGreaterThanOrEqual(14);
    expect(lre(twoSided.estimate!.ci[1], 0.91579787901333884)).toBeGreaterThanOrEqual(14);
    const greater = spearman.compute(design(tuna.data.x_hunter_L, tuna.data.y_panel_score), options({alternative: 'greater'}));
    // mpmath 1.3.0 at 40 digits: tanh(atanh(0.6) - z_.95 √((1 + 0.6²/2)/6))
    expect(lre(greater.estimate!.ci[0], -0.03628202672931308)).toBeGreaterThanOrEqual(14);
    expect(greater.estimate!.ci[1]).toBe(1);
    expect(greater.effect).toEqual({name: 'rho', value: 0.6, ci: greater.estimate!.ci});
  });
});

describe('Spearman’s rank correlation, t approximation (n > 10)', () => {
  it('matches scipy spearmanr on USJudgeRatings (n = 43, ties) for every alternative', () => {
    const result = spearman.compute(design(judges.data.CONT, judges.data.INTG), options());
    // scipy 1.17.1: stats.spearmanr(CONT, INTG).statistic
    expect(lre(result.estimate!.value, -0.1764772772850537)).toBeGreaterThanOrEqual(14);
    expect(result.statistic.name).toBe('t');
    expect(result.df).toBe(41);
    expect(result.variant).toBe('t approximation');
    // scipy 1.17.1: stats.spearmanr(CONT, INTG, alternative=alt).pvalue
    expectP(judges.data.CONT, judges.data.INTG, {'two-sided': 0.25761290457272207, greater: 0.871193547713639, less: 0.12880645228636103}, pDigits);
    // mpmath 1.3.0 at 40 digits: Bonett–Wright interval at rho = -0.1764772772850537, n = 43
    expect(lre(result.estimate!.ci[0], -0.45472856884553912)).toBeGreaterThanOrEqual(13);
    expect(lre(result.estimate!.ci[1], 0.13316115133281485)).toBeGreaterThanOrEqual(13);
  });

  it('keeps a p-value of 1e-79 on NIST StRD Filip (n = 82, ties in y)', () => {
    const {design: filip} = nistRegression('Filip');
    const x = filip.x[0]!.values;
    const y = filip.y.values;
    // scipy 1.17.1: stats.spearmanr(x, y).statistic on Filip.dat
    expect(lre(spearman.compute(design(x, y), options()).estimate!.value, 0.9942642577863591)).toBeGreaterThanOrEqual(14);
    // scipy 1.17.1: stats.spearmanr(x, y, alternative=alt).pvalue. At t ≈ 84 the tail's
    // condition number t·f(t)/F(t) ≈ t² amplifies rho's last-digit rounding 7000-fold.
    expectP(x, y, {'two-sided': 1.9336062448837253e-79, greater: 9.668031224418626e-80, less: 1}, 11);
  });
});

describe('Spearman’s rank correlation: errors and properties', () => {
  it('refuses fewer than 4 pairs and a constant variable', () => {
    expect(() => spearman.compute(design([1, 2, 3], [3, 1, 2]), options())).toThrow(MethodError);
    expect(() => spearman.compute(design([4, 4, 4, 4], [3, 1, 2, 5]), options())).toThrow(/x is constant/);
  });

  // Small integers make ties common; n spans the exact and approximate ranges.
  const pairs = fc
    .integer({min: 4, max: 16})
    .chain((n) => fc.tuple(fc.array(fc.integer({min: 0, max: 6}), {minLength: n, maxLength: n}), fc.array(fc.integer({min: 0, max: 6}), {minLength: n, maxLength: n})))
    .filter(([x, y]) => new Set(x).size > 1 && new Set(y).size > 1);

  it('p in [0, 1]; rho and p invariant under shuffling rows and swapping x and y; two-sided p = 2 min(one-sided)', () => {
    fc.assert(
      fc.property(pairs, fc.infiniteStream(fc.nat()), ([x, y], seeds) => {
        const base = spearman.compute(design(x, y), options());
        const order = x.map((_, i) => ({i, key: seeds.next().value as number})).sort((a, b) => a.key - b.key);
        const shuffled = spearman.compute(design(order.map((o) => x[o.i]!), order.map((o) => y[o.i]!)), options());
        const swapped = spearman.compute(design(y, x), options());
        for (const other of [shuffled, swapped]) {
          expect(Math.abs(other.estimate!.value - base.estimate!.value)).toBeLessThanOrEqual(1e-14);
          expect(lre(other.p, base.p)).toBeGreaterThanOrEqual(12);
        }
        const greater = spearman.compute(design(x, y), options({alternative: 'greater'})).p;
        const less = spearman.compute(design(x, y), options({alternative: 'less'})).p;
        for (const p of [base.p, greater, less]) {
          expect(p).toBeGreaterThanOrEqual(0);
          expect(p).toBeLessThanOrEqual(1);
        }
        expect(lre(base.p, Math.min(1, 2 * Math.min(greater, less)))).toBeGreaterThanOrEqual(14);
      }),
      {numRuns: 60},
    );
  });
});
