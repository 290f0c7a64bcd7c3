import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {fisherExact, fisherP} from '../../src/methods/fisher-exact.js';
import {MethodError} from '../../src/methods/method-error.js';
import type {ContingencyDesign, MethodOptions} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, pDigits} from './helpers.js';

const opts = (overrides: Partial<MethodOptions> = {}): MethodOptions =>
  options({correction: 'none', intercept: true, posthoc: undefined, ...overrides});

function table(counts: number[][], success?: string, rows = ['r0', 'r1'], columns = ['c0', 'c1']): ContingencyDesign {
  return {kind: 'contingency', rows, columns, counts, success};
}

interface Convictions {
  data: {rows: string[]; cols: string[]; counts: number[][]};
  published: {less: {p_value: number}; two_sided: {p_value: number; conf_int_95: number[]}; odds_ratio_conditional_mle: number};
  scipy: {less: {p_value: number}; two_sided: {p_value: number}; sample_odds_ratio: number};
}

describe('Fisher’s exact test', () => {
  const convictions = example<Convictions>('fisher_exact--r-fisher-convictions-fisher1962.json');
  const design = table(convictions.data.counts, undefined, convictions.data.rows, convictions.data.cols);

  it('matches R ?fisher.test on Fisher’s convictions of twins (two-sided, 95% and 99%)', () => {
    const result = fisherExact.compute(design, opts());
    // scipy 1.10 fisher_exact in the reference file (scipy 1.17.1 gives the same value)
    expect(lre(result.p, convictions.scipy.two_sided.p_value)).toBeGreaterThanOrEqual(pDigits);
    // R stats-Ex.Rout.save: p-value = 0.0005367, odds ratio 0.04693661 (uniroot, ~6 digits)
    expect(Number(result.p.toPrecision(4))).toBe(convictions.published.two_sided.p_value);
    expect(lre(result.estimate!.value, convictions.published.odds_ratio_conditional_mle)).toBeGreaterThanOrEqual(5.5);
    // mpmath 1.3.0 at 40 digits: E[a; ψ] = a and the tail equations solved by findroot
    expect(lre(result.estimate!.value, 0.046936639049679964)).toBeGreaterThanOrEqual(13);
    expect(lre(result.estimate!.ci[0], 0.003317163950657363)).toBeGreaterThanOrEqual(13);
    expect(lre(result.estimate!.ci[1], 0.36318960235668046)).toBeGreaterThanOrEqual(13);
    // R's printed bounds are off by up to 1% (uniroot tolerance; see the reference notes)
    expect(lre(result.estimate!.ci[0], convictions.published.two_sided.conf_int_95[0]!)).toBeGreaterThanOrEqual(2);
    expect(result.effect).toEqual({name: 'odds-ratio', value: result.estimate!.value, ci: result.estimate!.ci});
    expect(result.statistic).toEqual({name: 'OR', value: convictions.scipy.sample_odds_ratio});
    const at99 = fisherExact.compute(design, opts({confidence: 0.99}));
    // mpmath 1.3.0 at 40 digits, as above
    expect(lre(at99.estimate!.ci[0], 0.00137185331426153)).toBeGreaterThanOrEqual(12);
    expect(lre(at99.estimate!.ci[1], 0.5788518553495398)).toBeGreaterThanOrEqual(12);
  });

  it('matches the one-sided (less) test and bound', () => {
    const result = fisherExact.compute(design, opts({alternative: 'less'}));
    // scipy 1.10 fisher_exact(alternative='less'); R prints 0.0004652
    expect(lre(result.p, convictions.scipy.less.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(Number(result.p.toPrecision(4))).toBe(convictions.published.less.p_value);
    expect(result.estimate!.ci[0]).toBe(0);
    // scipy 1.17.1 contingency.odds_ratio(kind='conditional').confidence_interval(0.95, 'less')
    expect(lre(result.estimate!.ci[1], 0.28495954561971487)).toBeGreaterThanOrEqual(11);
  });

  it('matches R’s tea-tasting example (greater)', () => {
    const tea = example<{data: {counts: number[][]}; published: {p_value: number}; scipy: {p_value: number}}>('fisher_exact--r-fisher-tea-tasting.json');
    const result = fisherExact.compute(table(tea.data.counts, undefined, ['Milk', 'Tea'], ['Milk', 'Tea']), opts({alternative: 'greater'}));
    // exact: 17/70 (scipy 1.10 fisher_exact(alternative='greater') = 0.24285714285714283); R prints 0.2429
    expect(lre(result.p, 17 / 70)).toBeGreaterThanOrEqual(14);
    expect(lre(result.p, tea.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    // mpmath 1.3.0 at 40 digits; scipy 1.10 gives 6.408319658199662 and 0.3135737675049858
    expect(lre(result.estimate!.value, 6.408319658199674)).toBeGreaterThanOrEqual(13);
    expect(lre(result.estimate!.ci[0], 0.31357376750498533)).toBeGreaterThanOrEqual(12);
    expect(result.estimate!.ci[1]).toBe(Infinity);
    expect(result.estimate!.name).toBe('odds ratio of Tea (Tea / Milk)');
  });

  it('matches the scipy documentation example and the Fagerland et al. (2017) Ritland table', () => {
    const doc = example<{published: {p_value: number; sample_odds_ratio: number}}>('fisher_exact--scipy-doc.json');
    const result = fisherExact.compute(table([[8, 2], [1, 5]]), opts());
    // SciPy docs fisher_exact([[8, 2], [1, 5]]), full double precision
    expect(lre(result.p, doc.published.p_value)).toBeGreaterThanOrEqual(14);
    expect(result.statistic.value).toBe(doc.published.sample_odds_ratio);
    // scipy 1.17.1 contingency.odds_ratio(kind='conditional')
    expect(lre(result.estimate!.value, 15.465819716921013)).toBeGreaterThanOrEqual(11);
    // contingencytables (Fagerland, Lydersen & Laake 2017) test suite: Fisher_exact_test_2x2([[0,16],[15,57]]) prints P = 0.06287
    expect(fisherP([[0, 16], [15, 57]], 'two-sided').toFixed(5)).toBe('0.06287');
  });

  it('follows the declared success level: the odds ratio inverts', () => {
    const second = fisherExact.compute(table([[2, 15], [10, 3]], 'r1'), opts());
    const first = fisherExact.compute(table([[2, 15], [10, 3]], 'r0'), opts());
    expect(lre(first.estimate!.value, 1 / second.estimate!.value)).toBeGreaterThanOrEqual(12);
    expect(lre(first.estimate!.ci[0], 1 / second.estimate!.ci[1])).toBeGreaterThanOrEqual(12);
    expect(lre(first.p, second.p)).toBeGreaterThanOrEqual(14);
  });

  it('handles a zero cell: estimate and bound at 0 or ∞', () => {
    const zero = fisherExact.compute(table([[0, 16], [15, 57]]), opts());
    expect(zero.estimate!.value).toBe(0);
    expect(zero.estimate!.ci[0]).toBe(0);
    expect(zero.estimate!.ci[1]).toBeGreaterThan(0);
    const infinite = fisherExact.compute(table([[16, 0], [57, 15]]), opts());
    expect(infinite.estimate!.value).toBe(Infinity);
    expect(infinite.estimate!.ci[1]).toBe(Infinity);
    expect(lre(infinite.estimate!.ci[0], 1 / zero.estimate!.ci[1])).toBeGreaterThanOrEqual(12);
  });

  it('matches scipy 1.17.1 on a table with a wide interval', () => {
    const result = fisherExact.compute(table([[9, 4], [4, 10]]), opts());
    // scipy 1.17.1 contingency.odds_ratio([[9, 4], [4, 10]], kind='conditional') and its confidence_interval(0.95)
    expect(lre(result.estimate!.value, 5.232646363427111)).toBeGreaterThanOrEqual(11);
    expect(lre(result.estimate!.ci[0], 0.8472152912644728)).toBeGreaterThanOrEqual(10);
    expect(lre(result.estimate!.ci[1], 40.43737378974407)).toBeGreaterThanOrEqual(10);
  });

  it('refuses tables other than 2×2, pointing to the chi-square test', () => {
    const wide: ContingencyDesign = {kind: 'contingency', rows: ['a', 'b'], columns: ['x', 'y', 'z'], counts: [[1, 2, 3], [4, 5, 6]], success: undefined};
    expect(() => fisherExact.compute(wide, opts())).toThrow(MethodError);
    try {
      fisherExact.compute(wide, opts());
    } catch (error) {
      expect((error as MethodError).hint).toContain('chi-square');
    }
    expect(() => fisherExact.compute(table([[0, 0], [3, 4]]), opts())).toThrow(/no observations/);
  });

  it('computes a large table quickly and keeps p in [0, 1]; two-sided ≥ each one-sided p (fast-check)', () => {
    const start = performance.now();
    const big = fisherExact.compute(table([[5000, 4000], [4500, 4600]]), opts());
    expect(performance.now() - start).toBeLessThan(2000);
    expect(big.p).toBeGreaterThan(0);
    const cell = fc.integer({min: 0, max: 30});
    fc.assert(
      fc.property(cell, cell, cell, cell, (a, b, c, d) => {
        fc.pre(a + b > 0 && c + d > 0 && a + c > 0 && b + d > 0);
        const two = fisherP([[a, b], [c, d]], 'two-sided');
        const less = fisherP([[a, b], [c, d]], 'less');
        const greater = fisherP([[a, b], [c, d]], 'greater');
        expect(two).toBeLessThanOrEqual(1);
        expect(two).toBeGreaterThanOrEqual(Math.min(less, greater) * (1 - 1e-12));
        expect(less + greater).toBeGreaterThanOrEqual(1 - 1e-12);
        // Transposing the table leaves the conditional distribution unchanged.
        expect(lre(fisherP([[a, c], [b, d]], 'two-sided'), two)).toBeGreaterThanOrEqual(12);
      }),
      {numRuns: 200},
    );
  });
});
