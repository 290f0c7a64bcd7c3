import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {MethodError} from '../../src/methods/method-error.js';
import {pearson} from '../../src/methods/pearson.js';
import type {Alternative, BivariateDesign} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, pDigits, sample} from './helpers.js';

function design(x: readonly number[], y: readonly number[], labels = ['x', 'y']): BivariateDesign {
  return {kind: 'bivariate', x: [sample(labels[0]!, x)], y: sample(labels[1]!, y)};
}

// Fisher-z limits are tanh of normal quantiles: both sides are accurate to
// about 15 digits, and 13 leaves room for the rounding of atanh and tanh.
const ciDigits = 13;

describe('Pearson’s correlation', () => {
  it('matches R ?cor.test on the Hollander & Wolfe tuna data (one-sided, greater)', () => {
    const reference = example<{
      data: {x_hunter_L: number[]; y_panel_score: number[]};
      scipy: {r: number; t: number; p_value: number; conf_int_one_sided: [number, number]};
      published: {t: number; df: number; p_value: number; r: number; conf_int_one_sided: [number, number]};
    }>('pearson_correlation--r-cortest-hollander-wolfe-1973-p187.json');
    const result = pearson.compute(design(reference.data.x_hunter_L, reference.data.y_panel_score), options({alternative: 'greater'}));
    // scipy 1.10 recomputation in shared/reference/examples/pearson_correlation--r-cortest-hollander-wolfe-1973-p187.json
    expect(lre(result.estimate!.value, reference.scipy.r)).toBeGreaterThanOrEqual(14);
    expect(lre(result.statistic.value, reference.scipy.t)).toBeGreaterThanOrEqual(14);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(lre(result.estimate!.ci[0], reference.scipy.conf_int_one_sided[0])).toBeGreaterThanOrEqual(12);
    expect(result.estimate!.ci[1]).toBe(1);
    // R stats-Ex.Rout.save prints t = 1.8411, df = 7, p-value = 0.05409, CI [-0.02223023, 1], cor 0.5711816.
    expect(result.statistic.value.toFixed(4)).toBe(reference.published.t.toFixed(4));
    expect(result.df).toBe(reference.published.df);
    expect(Number(result.p.toPrecision(4))).toBe(reference.published.p_value);
    expect(Number(result.estimate!.ci[0].toPrecision(7))).toBe(reference.published.conf_int_one_sided[0]);
    expect(Number(result.estimate!.value.toPrecision(7))).toBe(reference.published.r);
  });

  it('matches R ?cor.test on USJudgeRatings (CONT, INTG) for all three alternatives', () => {
    const reference = example<{data: {CONT: number[]; INTG: number[]}; published: {t: number; p_value: number; conf_int: [number, number]}}>(
      'pearson_correlation--r-cortest-usjudgeratings.json',
    );
    // scipy 1.17.1: stats.pearsonr(CONT, INTG, alternative=alt); res.confidence_interval(0.95)
    const expected: Record<Alternative, {p: number; ci: [number, number]}> = {
      'two-sided': {p: 0.3945151927224095, ci: [-0.4168591087800495, 0.17411823364978546]},
      greater: {p: 0.8027424036387955, ci: [-0.37485603605008616, 1]},
      less: {p: 0.19725759636120418, ci: [-1, 0.12542326311809393]},
    };
    for (const [alternative, {p, ci}] of Object.entries(expected) as [Alternative, {p: number; ci: [number, number]}][]) {
      const result = pearson.compute(design(reference.data.CONT, reference.data.INTG), options({alternative}));
      // scipy 1.17.1: r = -0.13319089046318852
      expect(lre(result.estimate!.value, -0.13319089046318852), alternative).toBeGreaterThanOrEqual(14);
      expect(result.df).toBe(41);
      expect(lre(result.p, p), alternative).toBeGreaterThanOrEqual(pDigits);
      expect(lre(result.estimate!.ci[0], ci[0]), alternative).toBeGreaterThanOrEqual(ciDigits);
      expect(lre(result.estimate!.ci[1], ci[1]), alternative).toBeGreaterThanOrEqual(ciDigits);
      expect(result.effect).toEqual({name: 'r', value: result.estimate!.value, ci: result.estimate!.ci});
    }
    // R stats-Ex.Rout.save prints t = -0.8605, p-value = 0.3945, 95% CI [-0.4168591, 0.1741182].
    const printed = pearson.compute(design(reference.data.CONT, reference.data.INTG), options());
    expect(printed.statistic.value.toFixed(4)).toBe(reference.published.t.toFixed(4));
    expect(printed.estimate!.ci.map((v) => Number(v.toPrecision(7)))).toEqual(reference.published.conf_int);
  });

  it('matches the scipy pearsonr documentation example with a 90% interval', () => {
    const reference = example<{data: {x: number[]; y: number[]}; published: {r: number; p_value: number; conf_int_90: [number, number]}}>(
      'pearson_correlation--scipy-doc.json',
    );
    const result = pearson.compute(design(reference.data.x, reference.data.y), options({confidence: 0.9}));
    // SciPy docs, scipy.stats.pearsonr example, printed to full double precision
    expect(lre(result.estimate!.value, reference.published.r)).toBeGreaterThanOrEqual(14);
    expect(lre(result.p, reference.published.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(lre(result.estimate!.ci[0], reference.published.conf_int_90[0])).toBeGreaterThanOrEqual(ciDigits);
    expect(lre(result.estimate!.ci[1], reference.published.conf_int_90[1])).toBeGreaterThanOrEqual(ciDigits);
    expect(result.estimate!.level).toBe(0.9);
  });

  it('keeps a small p-value on Longley (GNP deflator vs employment, n = 16)', async () => {
    const {nistRegression} = await import('./nist-regression.js');
    const {design: longley} = nistRegression('Longley');
    const result = pearson.compute({kind: 'bivariate', x: [longley.x[0]!], y: longley.y}, options());
    // scipy 1.17.1: stats.pearsonr(x1, y) on NIST StRD Longley.dat
    expect(lre(result.estimate!.value, 0.9708985250610558)).toBeGreaterThanOrEqual(14);
    expect(lre(result.p, 4.3890467024468667e-10)).toBeGreaterThanOrEqual(pDigits);
    expect(lre(result.estimate!.ci[0], 0.916087300681023)).toBeGreaterThanOrEqual(ciDigits);
    expect(lre(result.estimate!.ci[1], 0.9900925396072197)).toBeGreaterThanOrEqual(ciDigits);
  });

  it('gives p = 0 and the interval [1, 1] for a perfect straight line', () => {
    // exact: r = 1 when y is an increasing linear function of x (common practice, no source)
    const result = pearson.compute(design([1, 2, 3, 4, 5], [3, 5, 7, 9, 11]), options());
    expect(result.estimate!.value).toBe(1);
    expect(result.statistic.value).toBe(Infinity);
    expect(result.p).toBe(0);
    expect(result.estimate!.ci).toEqual([1, 1]);
  });

  it('refuses fewer than 4 pairs and a constant variable with a MethodError', () => {
    expect(() => pearson.compute(design([1, 2, 3], [2, 1, 3]), options())).toThrow(MethodError);
    expect(() => pearson.compute(design([1, 2, 3, 4], [2, 2, 2, 2]), options())).toThrow(/y is constant/);
  });
});

const pairs = fc
  .integer({min: 4, max: 40})
  .chain((n) =>
    fc.tuple(
      fc.array(fc.double({min: -1e3, max: 1e3, noNaN: true}), {minLength: n, maxLength: n}),
      fc.array(fc.double({min: -1e3, max: 1e3, noNaN: true}), {minLength: n, maxLength: n}),
    ),
  )
  .filter(([x, y]) => new Set(x).size > 1 && new Set(y).size > 1);

describe('Pearson’s correlation: properties', () => {
  it('p lies in [0, 1], r in [-1, 1], and the interval contains r', () => {
    fc.assert(
      fc.property(pairs, fc.constantFrom<Alternative>('two-sided', 'greater', 'less'), ([x, y], alternative) => {
        const result = pearson.compute(design(x, y), options({alternative}));
        expect(result.p).toBeGreaterThanOrEqual(0);
        expect(result.p).toBeLessThanOrEqual(1);
        expect(Math.abs(result.estimate!.value)).toBeLessThanOrEqual(1);
        expect(result.estimate!.ci[0]).toBeLessThanOrEqual(result.estimate!.value);
        expect(result.estimate!.ci[1]).toBeGreaterThanOrEqual(result.estimate!.value);
      }),
    );
  });

  it('is symmetric in x and y, invariant under shuffling rows, and two-sided p = 2 min(one-sided)', () => {
    fc.assert(
      fc.property(pairs, fc.infiniteStream(fc.nat()), ([x, y], seeds) => {
        const base = pearson.compute(design(x, y), options());
        const swapped = pearson.compute(design(y, x), options());
        const order = x.map((_, i) => ({i, key: seeds.next().value as number})).sort((a, b) => a.key - b.key);
        const shuffled = pearson.compute(design(order.map((o) => x[o.i]!), order.map((o) => y[o.i]!)), options());
        // Sums in another order round differently: 12 digits, not bit equality.
        for (const other of [swapped, shuffled]) {
          expect(Math.abs(other.estimate!.value - base.estimate!.value)).toBeLessThanOrEqual(1e-12);
        }
        const greater = pearson.compute(design(x, y), options({alternative: 'greater'})).p;
        const less = pearson.compute(design(x, y), options({alternative: 'less'})).p;
        expect(lre(base.p, Math.min(1, 2 * Math.min(greater, less)))).toBeGreaterThanOrEqual(14);
      }),
    );
  });
});
