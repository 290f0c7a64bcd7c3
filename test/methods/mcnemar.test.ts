import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {mcnemar} from '../../src/methods/mcnemar.js';
import {MethodError} from '../../src/methods/method-error.js';
import type {MethodOptions, PairedCategoricalDesign} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {options, pDigits} from './helpers.js';

const opts = (overrides: Partial<MethodOptions> = {}): MethodOptions =>
  options({correction: 'none', intercept: true, posthoc: undefined, ...overrides});

function paired(a: number, b: number, c: number, d: number, levels: [string, string] = ['no', 'yes']): PairedCategoricalDesign {
  return {kind: 'paired-categorical', first: 'before', second: 'after', levels, table: [[a, b], [c, d]]};
}

describe('McNemar’s test', () => {
  // R ?mcnemar.test: Agresti (1990, p. 350), presidential approval in two surveys of 1600 Americans.
  const approval = paired(794, 150, 86, 570, ['Approve', 'Disapprove']);

  it('uses the continuity-corrected chi-square from 25 discordant pairs (R ?mcnemar.test, Agresti 1990 p. 350)', () => {
    const result = mcnemar.compute(approval, opts());
    // (|150 - 86| - 1)² / 236 exactly; R prints McNemar's chi-squared = 16.818, df = 1, p-value = 4.115e-05
    expect(lre(result.statistic.value, 3969 / 236)).toBeGreaterThanOrEqual(15);
    expect(result.df).toBe(1);
    expect(result.statistic.value.toFixed(3)).toBe('16.818');
    expect(Number(result.p.toPrecision(4))).toBe(4.115e-5);
    // scipy 1.17.1: stats.chi2.sf(3969/236, 1)
    expect(lre(result.p, 4.114562281345944e-5)).toBeGreaterThanOrEqual(pDigits);
    expect(result.variant).toBe('chi-square approximation with continuity correction');
    // Estimate: Disapprove rose from 656/1600 to 720/1600. Newcombe (1998b) method 10, evaluated
    // in mpmath 1.3.0 at 40 digits from the formula (no reference library for it is installed here).
    expect(result.estimate!.name).toBe('difference in proportions of Disapprove (after - before)');
    expect(result.estimate!.value).toBe(0.04);
    expect(lre(result.estimate!.ci[0], 0.021230423982877115)).toBeGreaterThanOrEqual(13);
    expect(lre(result.estimate!.ci[1], 0.0587038728957289)).toBeGreaterThanOrEqual(13);
    // Effect: b/c = 150/86 with the Clopper–Pearson interval of 150/236 mapped to odds (mpmath 1.3.0 at 40 digits)
    expect(result.effect!.value).toBe(150 / 86);
    expect(lre(result.effect!.ci![0], 1.3292282526052637)).toBeGreaterThanOrEqual(12);
    expect(lre(result.effect!.ci![1], 2.300979080421994)).toBeGreaterThanOrEqual(12);
    expect(result.details).toEqual({observed: approval.table, discordant: {'Approve to Disapprove': 150, 'Disapprove to Approve': 86}});
  });

  it('uses the continuity-corrected normal tail for one-sided alternatives', () => {
    const greater = mcnemar.compute(approval, opts({alternative: 'greater'}));
    // z = 63/√236; mpmath 1.3.0: ncdf(-63/√236)
    expect(greater.statistic).toEqual({name: 'z', value: 63 / Math.sqrt(236)});
    expect(lre(greater.p, 2.0572811406729725e-5)).toBeGreaterThanOrEqual(13);
    const less = mcnemar.compute(approval, opts({alternative: 'less'}));
    expect(less.p).toBeGreaterThan(0.99);
    expect(greater.estimate!.ci[1]).toBe(1);
    expect(greater.effect!.ci![1]).toBe(Infinity);
  });

  it('uses the exact binomial test below 25 discordant pairs (Cavo et al. 2012 via Fagerland et al. 2017)', () => {
    // Rows: response before consolidation; columns: after. contingencytables prints the Newcombe
    // square-and-add interval: estimate = -0.0621 (95% CI -0.1186 to -0.0046).
    const result = mcnemar.compute(paired(59, 6, 16, 80), opts());
    expect(result.variant).toBe('exact binomial test (22 discordant pairs, fewer than 25)');
    expect(result.statistic).toEqual({name: 'b', value: 6});
    expect(result.df).toBeNull();
    // scipy 1.17.1: binomtest(6, 22, 0.5).pvalue
    expect(lre(result.p, 0.052478790283203125)).toBeGreaterThanOrEqual(14);
    expect(result.estimate!.value.toFixed(4)).toBe('-0.0621');
    expect(result.estimate!.ci.map((b) => b.toFixed(4))).toEqual(['-0.1186', '-0.0046']);
    // mpmath 1.3.0 at 40 digits, Newcombe's formula
    expect(lre(result.estimate!.ci[0], -0.11862119563870992)).toBeGreaterThanOrEqual(13);
    expect(lre(result.estimate!.ci[1], -0.004625113933050066)).toBeGreaterThanOrEqual(12);
    // mpmath 1.3.0 at 40 digits (scipy 1.17.1's beta quantile gives the upper one to 12.4 digits)
    expect(lre(result.effect!.ci![0], 0.12018366326892031)).toBeGreaterThanOrEqual(12);
    expect(lre(result.effect!.ci![1], 1.008924451069429)).toBeGreaterThanOrEqual(12);
  });

  it('refuses a table without discordant pairs', () => {
    expect(() => mcnemar.compute(paired(10, 0, 0, 5), opts())).toThrow(MethodError);
  });

  it('gives twice the smaller one-sided exact p, and p in [0, 1] (fast-check)', () => {
    const cell = fc.integer({min: 0, max: 40});
    fc.assert(
      fc.property(cell, cell, cell, cell, (a, b, c, d) => {
        fc.pre(b + c > 0);
        const design = paired(a, b, c, d);
        const two = mcnemar.compute(design, opts());
        expect(two.p).toBeGreaterThanOrEqual(0);
        expect(two.p).toBeLessThanOrEqual(1);
        if (b + c < 25) {
          const greater = mcnemar.compute(design, opts({alternative: 'greater'})).p;
          const less = mcnemar.compute(design, opts({alternative: 'less'})).p;
          expect(lre(two.p, Math.min(1, 2 * Math.min(greater, less)))).toBeGreaterThanOrEqual(13);
        }
        // Swapping the measurements mirrors the table: same two-sided p, opposite estimate.
        const swapped = mcnemar.compute(paired(a, c, b, d), opts());
        expect(lre(swapped.p, two.p)).toBeGreaterThanOrEqual(14);
        expect(swapped.estimate!.value + two.estimate!.value).toBe(0);
      }),
      {numRuns: 200},
    );
  });
});
