import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {chiSquare} from '../../src/methods/chi-square.js';
import {MethodError} from '../../src/methods/method-error.js';
import type {ContingencyDesign, MethodOptions} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, pDigits} from './helpers.js';

const opts = (overrides: Partial<MethodOptions> = {}): MethodOptions =>
  options({correction: 'none', intercept: true, posthoc: undefined, ...overrides});

function table(counts: number[][], rows = counts.map((_, i) => `r${i}`), columns = counts[0]!.map((_, j) => `c${j}`)): ContingencyDesign {
  return {kind: 'contingency', rows, columns, counts, success: undefined};
}

interface Agresti {
  data: {rows_gender: string[]; cols_party: string[]; counts: number[][]};
  published: {X_squared: number; p_value: number};
  scipy: {X_squared: number; p_value: number; expected: number[][]; pearson_residuals: number[][]; standardized_residuals: number[][]; cramers_v_derived: number};
}

describe('chi-square test of independence', () => {
  const agresti = example<Agresti>('chisq_independence--r-chisq-agresti2007-p39.json');
  const design = table(agresti.data.counts, agresti.data.rows_gender, agresti.data.cols_party);

  it('matches R ?chisq.test on Agresti (2007, p. 39) and its scipy recomputation', () => {
    const result = chiSquare.compute(design, opts());
    // scipy 1.10 chi2_contingency(correction=False) in the reference file (scipy 1.17.1 gives the same digits)
    expect(lre(result.statistic.value, agresti.scipy.X_squared)).toBeGreaterThanOrEqual(13);
    expect(result.df).toBe(2);
    expect(lre(result.p, agresti.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    // R stats-Ex.Rout.save prints X-squared = 30.07, p-value = 2.954e-07
    expect(result.statistic.value.toFixed(2)).toBe(agresti.published.X_squared.toFixed(2));
    expect(Number(result.p.toPrecision(4))).toBe(agresti.published.p_value);
    const details = result.details as {expected: number[][]; pearson_residuals: number[][]; standardized_residuals: number[][]; observed: number[][]};
    expect(details.observed).toEqual(agresti.data.counts);
    for (const [key, digits] of [['expected', 13], ['pearson_residuals', 13], ['standardized_residuals', 13]] as const) {
      agresti.scipy[key].forEach((row, i) => row.forEach((value, j) => expect(lre(details[key][i]![j]!, value), `${key}[${i}][${j}]`).toBeGreaterThanOrEqual(digits)));
    }
    expect(result.warnings).toBeUndefined();
  });

  it('reports Cramér’s V with the noncentral chi-square interval', () => {
    const result = chiSquare.compute(design, opts());
    expect(result.effect!.name).toBe('cramers-v');
    // derived from scipy 1.10 association(method='cramer') in the reference file
    expect(lre(result.effect!.value, agresti.scipy.cramers_v_derived)).toBeGreaterThanOrEqual(13);
    // mpmath 1.3.0 at 40 digits: bisection of the noncentral chi-square series (λ = 11.6151663535…, 54.2411158588…)
    expect(lre(result.effect!.ci![0], 0.06490741810255518)).toBeGreaterThanOrEqual(13);
    expect(lre(result.effect!.ci![1], 0.1402639046656863)).toBeGreaterThanOrEqual(13);
  });

  it('matches the scipy documentation example of Cramér’s V (4 × 2)', () => {
    const reference = example<{data: {table_4x2: number[][]}; published: {cramers_v: number}}>('effect_size_cramers_v--scipy-doc-association.json');
    const result = chiSquare.compute(table(reference.data.table_4x2), opts());
    // SciPy docs, contingency.association(method='cramer'), full double precision
    expect(lre(result.effect!.value, reference.published.cramers_v)).toBeGreaterThanOrEqual(13);
    // mpmath 1.3.0 at 40 digits, as above
    expect(lre(result.effect!.ci![0], 0.1438584681117215)).toBeGreaterThanOrEqual(13);
    expect(lre(result.effect!.ci![1], 0.22395887131204653)).toBeGreaterThanOrEqual(13);
    // scipy 1.17.1 chi2_contingency(correction=False).pvalue
    expect(lre(result.p, 4.137697362586139e-18)).toBeGreaterThanOrEqual(pDigits);
  });

  it('applies Yates’ correction only when asked, as R’s default for 2×2 tables', () => {
    const reference = example<{data: {table_rows: number[][]}; published: {p_value: number}; scipy: {X_squared_yates: number; p_value: number; X_squared_uncorrected: number; p_uncorrected: number}}>(
      'chisq_independence_2x2_yates--r-chisq-example.json',
    );
    const design2 = table(reference.data.table_rows);
    const plain = chiSquare.compute(design2, opts());
    // scipy 1.10 chi2_contingency(correction=False) in the reference file
    expect(lre(plain.statistic.value, reference.scipy.X_squared_uncorrected)).toBeGreaterThanOrEqual(13);
    expect(lre(plain.p, reference.scipy.p_uncorrected)).toBeGreaterThanOrEqual(pDigits);
    expect(plain.variant).toBe('without continuity correction');
    const yates = chiSquare.compute(design2, opts({correction: 'yates'}));
    // scipy 1.10 chi2_contingency(correction=True); R prints p = 0.4233054
    expect(lre(yates.statistic.value, reference.scipy.X_squared_yates)).toBeGreaterThanOrEqual(13);
    expect(lre(yates.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(Number(yates.p.toPrecision(7))).toBe(reference.published.p_value);
    expect(yates.variant).toBe('with Yates’ continuity correction');
    // Cramér's V stays on the uncorrected statistic
    expect(yates.effect!.value).toBe(plain.effect!.value);
    expect((yates.details as {statistic_uncorrected: number}).statistic_uncorrected).toBe(plain.statistic.value);
  });

  it('caps the Yates shift at |O - E| (R and scipy), so a table at independence stays at 0', () => {
    const result = chiSquare.compute(table([[2, 2], [3, 3]]), opts({correction: 'yates'}));
    expect(result.statistic.value).toBe(0);
    expect(result.p).toBe(1);
    expect(result.effect!.ci).toEqual([0, 0]);
  });

  it('warns when an expected count is below 5 and points 2×2 tables to Fisher’s exact test', () => {
    const small = chiSquare.compute(table([[3, 1], [1, 3]]), opts());
    expect(small.warnings).toHaveLength(1);
    expect(small.warnings![0]).toEqual({kind: 'small-expected', below: 4, cells: 4, smallest: expect.closeTo(2, 12), alternative: 'fisher-exact'});
    const wide = chiSquare.compute(table([[3, 1, 9], [1, 3, 9]]), opts());
    expect(wide.warnings![0]).toMatchObject({kind: 'small-expected'});
    expect(wide.warnings![0]).not.toHaveProperty('alternative');
  });

  it('refuses what it cannot compute with a MethodError', () => {
    expect(() => chiSquare.compute(table([[1, 2, 3], [4, 5, 6]]), opts({correction: 'yates'}))).toThrow(MethodError);
    expect(() => chiSquare.compute(table([[1, 0], [4, 0]]), opts())).toThrow(/Level “c1” has no observations/);
    expect(() => chiSquare.compute(table([[1, 2], [4, 5]]), opts({alternative: 'greater'}))).toThrow(MethodError);
  });

  it('is invariant under reordering rows and columns, with p in [0, 1] (fast-check)', () => {
    const cell = fc.integer({min: 0, max: 40});
    const tables = fc
      .tuple(fc.integer({min: 2, max: 4}), fc.integer({min: 2, max: 4}))
      .chain(([r, c]) => fc.array(fc.array(cell, {minLength: c, maxLength: c}), {minLength: r, maxLength: r}));
    fc.assert(
      fc.property(tables, (counts) => {
        const rowSums = counts.map((row) => row.reduce((a, b) => a + b, 0));
        const colSums = counts[0]!.map((_, j) => counts.reduce((s, row) => s + row[j]!, 0));
        fc.pre(rowSums.every((s) => s > 0) && colSums.every((s) => s > 0));
        const result = chiSquare.compute(table(counts), opts());
        const flipped = chiSquare.compute(table([...counts].reverse().map((row) => [...row].reverse())), opts());
        expect(result.p).toBeGreaterThanOrEqual(0);
        expect(result.p).toBeLessThanOrEqual(1);
        // Absolute near zero: a table with X² = 0 in exact arithmetic gives
        // rounding-level values that differ in relative terms between orders.
        const scale = Math.max(1, Math.abs(result.statistic.value));
        expect(Math.abs(flipped.statistic.value - result.statistic.value)).toBeLessThanOrEqual(1e-12 * scale);
        expect(result.effect!.ci![0]).toBeLessThanOrEqual(result.effect!.value + 1e-12);
        expect(result.effect!.ci![1]).toBeGreaterThanOrEqual(result.effect!.value - 1e-12);
      }),
      {numRuns: 60},
    );
  });
});
