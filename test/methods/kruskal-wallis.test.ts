import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {kruskalWallis} from '../../src/methods/kruskal-wallis.js';
import {mannWhitney} from '../../src/methods/mann-whitney.js';
import {MethodError} from '../../src/methods/method-error.js';
import type {MethodOptions, Sample} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options as baseOptions, pDigits, sample} from './helpers.js';

const options = (overrides: Partial<MethodOptions> = {}): MethodOptions =>
  baseOptions({posthoc: undefined, correction: 'none', intercept: true, ...overrides});

const run = (samples: Sample[], overrides: Partial<MethodOptions> = {}) =>
  kruskalWallis.compute({kind: 'k-group', samples}, options(overrides));

type Groups = Record<string, number[]>;
const groupsOf = (data: Groups): Sample[] => Object.entries(data).map(([label, values]) => sample(label, values));

interface KwReference {
  data: Groups;
  published: {H: number; df: number; p_value: number};
  scipy: {H: number; p_value: number};
}


describe('Kruskal–Wallis test', () => {
  it('matches R ?kruskal.test on Hollander & Wolfe (1973, p. 116), no ties', () => {
    const reference = example<KwReference>('kruskal_wallis--r-kruskal-hollander-wolfe-1973-p116.json');
    const result = run(groupsOf(reference.data));
    // scipy 1.10 stats.kruskal in the reference file; R prints H = 0.77143, df = 2, p-value = 0.68
    expect(lre(result.statistic.value, reference.scipy.H)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(result.statistic.value.toFixed(5)).toBe(reference.published.H.toFixed(5));
    expect(result.df).toBe(2);
    expect(result.variant).toBe('chi-square approximation');
    // Groups of 4 and 5 cannot support a simultaneous 95% interval for the shift.
    expect(result.estimate!.ci).toEqual([-Infinity, Infinity]);
    expect(result.warnings).toEqual([
      {kind: 'small-groups', groups: ['obstructive_airway_disease']},
      {kind: 'unattainable-interval', confidence: 0.95, estimate: 'simultaneous shift'},
    ]);
  });

  it('matches R on airquality Ozone by Month, many ties', () => {
    const reference = example<KwReference>('kruskal_wallis--r-kruskal-airquality-ozone-by-month.json');
    const result = run(groupsOf(reference.data));
    // scipy 1.10 stats.kruskal in the reference file; R prints H = 29.267, df = 4, p-value = 6.901e-06
    expect(lre(result.statistic.value, reference.scipy.H)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(result.statistic.value.toFixed(3)).toBe(reference.published.H.toFixed(3));
    expect(Number(result.p.toPrecision(4))).toBe(reference.published.p_value);
    expect(result.variant).toBe('chi-square approximation with tie correction');
    // numpy brute force: median of all month_7 - month_5 differences, and order statistics
    // C = 185 and 702 - 185 + 1 of them (C = ⌊351 - z(.0025)·√(702·53/12) + ½⌋)
    expect(result.estimate!.name).toBe('Hodges–Lehmann shift (month_7 - month_5)');
    expect(result.estimate!.value).toBe(37);
    expect(result.estimate!.ci).toEqual([14, 58]);
    // numpy: H / (N - 1), N = 116
    expect(lre(result.effect!.value, 0.25449196787927775)).toBeGreaterThanOrEqual(13);
  });

  it('matches R on PlantGrowth, one tie, with the Hodges–Lehmann shift of the extreme groups', () => {
    const reference = example<KwReference>('kruskal_wallis--r-plantgrowth.json');
    const result = run(groupsOf(reference.data));
    // scipy 1.10 stats.kruskal in the reference file; R prints H = 7.9882, p-value = 0.01842
    expect(lre(result.statistic.value, reference.scipy.H)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(Number(result.p.toPrecision(4))).toBe(reference.published.p_value);
    // numpy brute force over the 100 differences trt2 - trt1
    expect(result.estimate!.name).toBe('Hodges–Lehmann shift (trt2 - trt1)');
    expect(lre(result.estimate!.value, 0.9449999999999998)).toBeGreaterThanOrEqual(15);
    expect(lre(result.estimate!.ci[0], 0.11000000000000032)).toBeGreaterThanOrEqual(15);
    expect(lre(result.estimate!.ci[1], 1.67)).toBeGreaterThanOrEqual(15);
    // numpy: mean ranks from scipy.stats.rankdata, ε² = H / 29
    expect((result.details as {mean_ranks: Record<string, number>}).mean_ranks).toEqual({ctrl: 14.75, trt1: 10.35, trt2: 21.4});
    expect(lre(result.effect!.value, 0.27545616377392124)).toBeGreaterThanOrEqual(13);
    expect(result.effect!.ci).toBeNull();
    expect(result.effect!.name).toBe('epsilon-squared');
  });

  it('with two groups, gives the Mann–Whitney normal-approximation estimate and interval', () => {
    const reference = example<KwReference>('kruskal_wallis--r-plantgrowth.json');
    const [ctrl, trt1] = groupsOf(reference.data) as [Sample, Sample];
    const kw = run([trt1, ctrl]);
    // The tie (4.17 in both) sends Mann–Whitney to its normal branch too.
    const mw = mannWhitney.compute({kind: 'two-group', first: trt1, second: ctrl}, options());
    expect(kw.estimate!.value).toBe(mw.estimate!.value);
    expect(kw.estimate!.ci).toEqual(mw.estimate!.ci);
  });

  it('rejects data that cannot be ranked, with a MethodError', () => {
    expect(() => run([sample('a', [1, 1]), sample('b', [1, 1, 1])])).toThrow(/same value/);
    expect(() => run([sample('a', [1, 2])])).toThrow(MethodError);
    expect(() => run([sample('a', [1, 2]), sample('b', [])])).toThrow(/b has no observations/);
    expect(() => run([sample('a', [1, 2]), sample('b', [3, 4])], {alternative: 'greater'})).toThrow(/no direction/);
  });

  describe('properties', () => {
    const groupsArb = fc.array(fc.array(fc.integer({min: -20, max: 20}), {minLength: 1, maxLength: 8}), {minLength: 2, maxLength: 5});
    const varied = (groups: number[][]) => new Set(groups.flat()).size > 1;

    it('keeps p in [0, 1] and is unchanged by shuffling rows and reordering or relabelling groups', () => {
      fc.assert(
        fc.property(groupsArb, (groups) => {
          fc.pre(varied(groups));
          const base = run(groups.map((g, i) => sample(`g${i}`, g)));
          expect(base.p).toBeGreaterThanOrEqual(0);
          expect(base.p).toBeLessThanOrEqual(1);
          const moved = run(groups.map((g, i) => sample(`other ${i}`, [...g].reverse())).reverse());
          expect(lre(moved.statistic.value, base.statistic.value)).toBeGreaterThanOrEqual(13);
          expect(lre(moved.p, base.p)).toBeGreaterThanOrEqual(12);
        }),
        {numRuns: 200},
      );
    });

    it('is invariant under a monotone transformation of the outcome', () => {
      fc.assert(
        fc.property(groupsArb, (groups) => {
          fc.pre(varied(groups));
          const base = run(groups.map((g, i) => sample(`g${i}`, g)));
          const moved = run(groups.map((g, i) => sample(`g${i}`, g.map((v) => Math.exp(v / 4)))));
          expect(lre(moved.statistic.value, base.statistic.value)).toBeGreaterThanOrEqual(13);
        }),
        {numRuns: 100},
      );
    });
  });
});
