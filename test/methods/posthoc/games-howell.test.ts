import {describe, expect, it} from 'vitest';
import {MethodError} from '../../../src/methods/method-error.js';
import {gamesHowell} from '../../../src/methods/posthoc/games-howell.js';
import type {PosthocComparison, Sample} from '../../../src/methods/types.js';
import {lre} from '../../helpers/lre.js';
import {example} from '../../helpers/reference.js';
import {intervalDigits, sample} from '../helpers.js';

function samplesOf(file: string): Sample[] {
  const data = example<{data: Record<string, number[]>}>(file).data;
  return Object.entries(data).map(([label, values]) => sample(label, values));
}

type Row = readonly [a: string, b: string, lower: number, upper: number, p: number];

/**
 * References: the Games–Howell formula evaluated in Python on this machine
 * (numpy means and variances, Welch–Satterthwaite df, q = √2|d|/se,
 * p = scipy 1.17.1 stats.studentized_range.sf(q, k, df), interval
 * d ± stats.studentized_range.ppf(0.95, k, df)·se/√2). scipy's range
 * distribution carries ~1e-11 absolute error, hence the floors; measured
 * agreement is 11-15 digits.
 */
function expectFormula(result: readonly PosthocComparison[], rows: readonly Row[]): void {
  expect(result.map((c) => [c.a, c.b])).toEqual(rows.map(([a, b]) => [a, b]));
  rows.forEach(([a, b, lower, upper, p], i) => {
    const c = result[i]!;
    expect(intervalDigits(c.ci!, [lower, upper], lre), `${a}-${b} ci`).toBeGreaterThanOrEqual(10);
    expect(lre(c.p_adjusted, p), `${a}-${b} p`).toBeGreaterThanOrEqual(Math.min(10, Math.log10(p / 1e-11)));
  });
}

describe('gamesHowell: all pairs with Welch standard errors', () => {
  it('matches the formula on the headache data (3 groups of 5)', () => {
    // Python formula with scipy 1.17.1 studentized_range (see above)
    expectFormula(gamesHowell(samplesOf('tukey_hsd--scipy-doc-headache-sas.json'), 0.95), [
      ['brand_1', 'brand_2', 0.25645831946608766, 8.943541680533915, 0.0390580481290953],
      ['brand_1', 'brand_3', -3.649152261787755, 4.169152261787758, 0.978816392332366],
      ['brand_2', 'brand_3', -8.023849916121428, -0.6561500838785714, 0.02470244928926757],
    ]);
  });

  it('matches the formula with unequal n and variances (McDonald’s mussel data)', () => {
    // Python formula with scipy 1.17.1 studentized_range; df from 8.2 to 15.9
    expectFormula(gamesHowell(samplesOf('anova_oneway--scipy-doc-mcdonald-mussel.json'), 0.95), [
      ['tillamook', 'newport', -0.020282383719920825, 0.00948238371992082, 0.7976040619165731],
      ['tillamook', 'petersburg', -0.0002644748747244706, 0.04675018916043877, 0.0530006849278013],
      ['tillamook', 'magadan', -0.020594702024932104, 0.016219702024932114, 0.9956173869483718],
      ['tillamook', 'tvarminne', -0.005920131970986918, 0.036920131970986945, 0.1972835740568284],
      ['newport', 'petersburg', 0.005565574183112897, 0.051720140102601404, 0.015649355250654362],
      ['newport', 'magadan', -0.0142605700808267, 0.020685570080826714, 0.9748910896875432],
      ['newport', 'tvarminne', -5.371742126202006e-5, 0.04185371742126205, 0.05061230250152249],
      ['petersburg', 'magadan', -0.0499764141440386, -0.0008843001416756931, 0.04122412872936809],
      ['petersburg', 'tvarminne', -0.0339373412455516, 0.018451626959837333, 0.8686901062664402],
      ['magadan', 'tvarminne', -0.004968823985758455, 0.040343823985758476, 0.15394401584183381],
    ]);
  });

  it('reduces to Welch’s t test for two groups', () => {
    // scipy 1.10 ttest_ind(equal_var=False) in t_test_welch--r-ttest-mtcars-mpg-by-am.json;
    // R prints the same interval, [-11.280194, -3.209684] for am0 - am1 (here am1 - am0)
    const [c] = gamesHowell(samplesOf('t_test_welch--r-ttest-mtcars-mpg-by-am.json'), 0.95);
    expect(lre(c!.p_adjusted, 0.0013736383330710345)).toBeGreaterThanOrEqual(12);
    expect(lre(c!.statistic, Math.SQRT2 * 3.767123145144923)).toBeGreaterThanOrEqual(13);
    // 9.5: the example's t quantile carries ~10.6 digits (test/methods/helpers.ts)
    expect(intervalDigits(c!.ci!, [3.2096841874700823, 11.280194355040031], lre)).toBeGreaterThanOrEqual(9.5);
  });

  it('keeps a constant group when the other varies, refuses two constant groups', () => {
    // One constant group: se and df come from the other (df = n - 1 = 2).
    const [c] = gamesHowell([sample('A', [5, 5, 5]), sample('B', [1, 2, 3])], 0.95);
    expect(lre(c!.statistic, Math.SQRT2 * 3 / Math.sqrt(1 / 3))).toBeGreaterThanOrEqual(14);
    expect(() => gamesHowell([sample('A', [5, 5]), sample('B', [1, 1]), sample('C', [1, 2])], 0.95)).toThrow(
      /groups A and B are both constant/,
    );
    expect(() => gamesHowell([sample('A', [5]), sample('B', [1, 2])], 0.95)).toThrow(MethodError);
  });
});
