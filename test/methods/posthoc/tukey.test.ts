import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {MethodError} from '../../../src/methods/method-error.js';
import {tukey} from '../../../src/methods/posthoc/tukey.js';
import type {PosthocComparison, Sample} from '../../../src/methods/types.js';
import {lre} from '../../helpers/lre.js';
import {example} from '../../helpers/reference.js';
import {intervalDigits, sample} from '../helpers.js';

function samplesOf(file: string): Sample[] {
  const data = example<{data: Record<string, number[]>}>(file).data;
  return Object.entries(data).map(([label, values]) => sample(label, values));
}

function find(result: readonly PosthocComparison[], a: string, b: string): PosthocComparison {
  const found = result.find((c) => c.a === a && c.b === b);
  if (!found) throw new Error(`no pair ${a}, ${b}`);
  return found;
}

type Row = readonly [a: string, b: string, lower: number, upper: number, p: number];

/**
 * scipy computes the studentized range by nquad with epsabs 1e-11 on the
 * cdf, so its p-values carry ~1e-11 absolute error (8 digits at p ≈ 0.002)
 * and its critical values ~11 digits; floors follow from that, although
 * the measured agreement is 11.5-15 digits.
 */
function expectScipy(result: readonly PosthocComparison[], rows: readonly Row[]): void {
  for (const [a, b, lower, upper, p] of rows) {
    const c = find(result, a, b);
    expect(intervalDigits(c.ci!, [lower, upper], lre), `${a}-${b} ci`).toBeGreaterThanOrEqual(10);
    expect(lre(c.p_adjusted, p), `${a}-${b} p`).toBeGreaterThanOrEqual(Math.min(10, Math.log10(p / 1e-11)));
  }
}

describe('tukey: Tukey–Kramer all-pairs comparisons', () => {
  const nist = tukey(samplesOf('tukey_hsd--nist-ehandbook-7471.json'), 0.95);

  it('reproduces the NIST e-Handbook 7.4.7.1 simultaneous intervals (2 decimals)', () => {
    // published CIs in tukey_hsd--nist-ehandbook-7471.json; mu1-mu4 is level_4 - level_1 negated
    const published: readonly [string, string, number, number][] = [
      ['level_1', 'level_2', 0.29, 4.47],
      ['level_1', 'level_3', 1.13, 5.31],
      ['level_1', 'level_4', -1.93, 2.25],
      ['level_2', 'level_3', -1.25, 2.93],
      ['level_2', 'level_4', -4.31, -0.13],
      ['level_3', 'level_4', -5.15, -0.97],
    ];
    expect(nist.map((c) => [c.a, c.b])).toEqual(published.map(([a, b]) => [a, b]));
    for (const [a, b, lower, upper] of published) {
      const {ci} = find(nist, a, b);
      expect(ci!.map((x) => x.toFixed(2))).toEqual([lower.toFixed(2), upper.toFixed(2)]);
    }
  });

  it('agrees with scipy stats.tukey_hsd on the NIST data', () => {
    // scipy 1.10.1 in tukey_hsd--nist-ehandbook-7471.json; scipy 1.17.1 gives the same digits
    expectScipy(nist, [
      ['level_1', 'level_2', 0.29263160916572195, 4.467368390834277, 0.022793380009273],
      ['level_1', 'level_3', 1.13263160916572, 5.3073683908342755, 0.002210821923137707],
      ['level_1', 'level_4', -1.9273683908342796, 2.2473683908342763, 0.996121079613238],
      ['level_2', 'level_3', -1.2473683908342799, 2.927368390834276, 0.6644649023627884],
      ['level_2', 'level_4', -4.307368390834279, -0.13263160916572359, 0.0351544790349676],
      ['level_3', 'level_4', -5.147368390834277, -0.9726316091657217, 0.0034505561857393063],
    ]);
    // mpmath 1.3.0 at 22 digits: P(Q > q) by double integration at the exact q of
    // the decimal data (MSE = 5323/4000), and q(0.95; 4, 16)·√(MSE/5) from the
    // mpmath-checked quantile (test/distributions/studentized-range.test.ts)
    expect(lre(find(nist, 'level_1', 'level_3').p_adjusted, 0.0022108219231380346302)).toBeGreaterThanOrEqual(14);
    expect(lre(find(nist, 'level_1', 'level_2').p_adjusted, 0.022793380009273438732)).toBeGreaterThanOrEqual(14);
    const {ci, estimate} = find(nist, 'level_1', 'level_2');
    expect(lre(ci![1] - estimate, 2.08736839083427845)).toBeGreaterThanOrEqual(14);
    // exact: the printed level means are 5.34 and 8.56
    expect(lre(find(nist, 'level_1', 'level_3').estimate, 3.22)).toBeGreaterThanOrEqual(13);
  });

  it('reproduces SAS, MATLAB and the scipy documentation on the headache data', () => {
    const result = tukey(samplesOf('tukey_hsd--scipy-doc-headache-sas.json'), 0.95);
    const c12 = find(result, 'brand_1', 'brand_2');
    const c13 = find(result, 'brand_1', 'brand_3');
    const c23 = find(result, 'brand_2', 'brand_3');
    // MATLAB multcompare (tukey_hsd--scipy-doc-headache-sas.json, 13 digits printed).
    // MATLAB and scipy differ from each other by ~2e-8 absolute (the example's
    // notes), so 7 digits is what MATLAB itself supports.
    expect(intervalDigits(c12.ci!, [0.9508409751403, 8.2491590248597], lre)).toBeGreaterThanOrEqual(7);
    expect(lre(c12.p_adjusted, 0.0144483269098)).toBeGreaterThanOrEqual(7);
    expect(lre(c13.p_adjusted, 0.98031072409)).toBeGreaterThanOrEqual(7);
    expect(lre(c23.p_adjusted, 0.0203311368795)).toBeGreaterThanOrEqual(7);
    // SAS PROC GLM CLDIFF: its bounds differ from MATLAB and scipy by ~4e-5
    // (a different quantile algorithm, per the example's notes): 4 digits.
    expect(intervalDigits(c23.ci!, [-7.989116943, -0.6908830568], lre)).toBeGreaterThanOrEqual(4);
    // scipy documentation, printed to 3 decimals
    expect(c12.ci!.map((x) => x.toFixed(3))).toEqual(['0.951', '8.249']);
    expect(c12.p_adjusted.toFixed(3)).toBe('0.014');
    // scipy 1.10.1 in the example file (same digits from scipy 1.17.1)
    expectScipy(result, [
      ['brand_1', 'brand_2', 0.9508409964187154, 8.249159003581287, 0.01444832673640073],
      ['brand_1', 'brand_3', -3.3891590035812844, 3.9091590035812875, 0.9803107240941081],
      ['brand_2', 'brand_3', -7.989159003581285, -0.6908409964187139, 0.02033113673971476],
    ]);
  });

  it('reproduces R’s TukeyHSD on PlantGrowth (7 digits printed)', () => {
    // R TukeyHSD(aov(weight ~ group, PlantGrowth)) output (from memory; confirmed by
    // scipy 1.17.1 stats.tukey_hsd on the data in anova_oneway--r-datasets-plantgrowth.json)
    const result = tukey(samplesOf('anova_oneway--r-datasets-plantgrowth.json'), 0.95);
    const rows: readonly [string, string, number, number, number][] = [
      ['ctrl', 'trt1', -1.0622161, 0.3202161, 0.3908711],
      ['ctrl', 'trt2', -0.1972161, 1.1852161, 0.197996],
      ['trt1', 'trt2', 0.1737839, 1.5562161, 0.0120064],
    ];
    for (const [a, b, lower, upper, p] of rows) {
      const c = find(result, a, b);
      expect(c.ci!.map((x) => x.toFixed(7))).toEqual([lower.toFixed(7), upper.toFixed(7)]);
      expect(c.p_adjusted.toPrecision(6)).toBe(p.toPrecision(6));
    }
  });

  it('uses Kramer’s standard error for unequal n (McDonald’s mussel data)', () => {
    // scipy 1.17.1: stats.tukey_hsd(*groups) and .confidence_interval(0.95), computed on
    // the data of anova_oneway--scipy-doc-mcdonald-mussel.json (n = 10, 8, 7, 8, 6)
    const result = tukey(samplesOf('anova_oneway--scipy-doc-mcdonald-mussel.json'), 0.95);
    expectScipy(result, [
      ['tillamook', 'newport', -0.022605526938638383, 0.011805526938638379, 0.893466494968413],
      ['tillamook', 'petersburg', 0.005367605699598512, 0.04111810858611578, 0.005654708620824844],
      ['tillamook', 'tvarminne', -0.003231005224610818, 0.034231005224610846, 0.1446986950479603],
      ['newport', 'petersburg', 0.009870088198116148, 0.04741562608759815, 0.0009253358815507484],
      ['newport', 'tvarminne', 0.0013106458397090064, 0.04048935416029102, 0.031735428300010415],
      ['petersburg', 'magadan', -0.044203126087598146, -0.0066575881981161406, 0.003692444336470313],
      ['magadan', 'tvarminne', -0.0019018541602910007, 0.037276854160291015, 0.09288387080937233],
    ]);
  });

  it('reduces to Student’s pooled t test for two groups', () => {
    // scipy 1.10 ttest_ind(equal_var=True) in t_test_student_two_sample--r-oneway-sleep.json
    // (its interval is group1 - group2; here group2 - group1)
    const [c] = tukey(samplesOf('t_test_student_two_sample--r-oneway-sleep.json'), 0.95);
    expect(lre(c!.p_adjusted, 0.07918671421593829)).toBeGreaterThanOrEqual(12);
    expect(lre(c!.statistic, Math.SQRT2 * 1.8608134674868524)).toBeGreaterThanOrEqual(13);
    // 9.5: the example's t quantile carries ~10.6 digits (test/methods/helpers.ts)
    expect(intervalDigits(c!.ci!, [-0.20387403228753254, 3.363874032287532], lre)).toBeGreaterThanOrEqual(9.5);
  });

  it('is unchanged by shuffling rows and flips sign when groups swap (fast-check)', () => {
    const groups = samplesOf('tukey_hsd--scipy-doc-headache-sas.json');
    const base = tukey(groups, 0.95);
    fc.assert(
      fc.property(fc.array(fc.nat(), {minLength: 15, maxLength: 15}), (keys) => {
        const shuffle = (values: Float64Array, offset: number) =>
          [...values]
            .map((v, i) => [v, keys[offset + i]!] as const)
            .sort((x, y) => x[1] - y[1])
            .map(([v]) => v);
        const shuffled = groups.map((g, gi) => sample(g.label, shuffle(g.values, gi * 5)));
        const result = tukey([shuffled[2]!, shuffled[0]!, shuffled[1]!], 0.95);
        for (const c of base) {
          const swapped = result.find((r) => r.a === c.b && r.b === c.a);
          const same = swapped ?? find(result, c.a, c.b);
          const sign = swapped ? -1 : 1;
          expect(lre(sign * same.estimate, c.estimate)).toBeGreaterThanOrEqual(13);
          expect(lre(same.p_adjusted, c.p_adjusted)).toBeGreaterThanOrEqual(12);
          expect(same.p_adjusted).toBeGreaterThanOrEqual(0);
          expect(same.p_adjusted).toBeLessThanOrEqual(1);
          expect(same.ci![0]).toBeLessThan(same.estimate);
          expect(same.ci![1]).toBeGreaterThan(same.estimate);
        }
      }),
      {numRuns: 5},
    );
  });

  it('refuses data it cannot compare', () => {
    expect(() => tukey([sample('A', [1, 2])], 0.95)).toThrow(MethodError);
    expect(() => tukey([sample('A', [1, 1]), sample('B', [2, 2])], 0.95)).toThrow(/variation within groups/);
    expect(() => tukey([sample('A', [1]), sample('B', [2])], 0.95)).toThrow(/error variance/);
    expect(() => tukey([sample('A', []), sample('B', [2, 3])], 0.95)).toThrow(/group A has 0/);
    expect(() => tukey([sample('A', [1, 2]), sample('B', [2, 3])], 1)).toThrow(/confidence/);
  });
});
