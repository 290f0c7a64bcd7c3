import {describe, expect, it} from 'vitest';
import {welchT} from '../../src/methods/welch-t.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {intervalDigits, intervalFloor, options, pDigits, sample} from './helpers.js';

interface Case {
  t: number;
  df: number;
  p_value: number;
  conf_int: [number, number];
}

describe("Welch's t test", () => {
  it('matches the scipy recomputation of R ?t.test on mtcars (mpg by am)', () => {
    const reference = example<{data: {am0_automatic_mpg: number[]; am1_manual_mpg: number[]}; scipy: Case; published: Case}>(
      't_test_welch--r-ttest-mtcars-mpg-by-am.json',
    );
    // The source reports am0 − am1; stet reports second − first.
    const result = welchT.compute(
      {kind: 'two-group', first: sample('1', reference.data.am1_manual_mpg), second: sample('0', reference.data.am0_automatic_mpg)},
      options(),
    );
    expect(lre(result.statistic.value, reference.scipy.t)).toBeGreaterThanOrEqual(13);
    expect(lre(result.df as number, reference.scipy.df)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(intervalDigits(result.estimate!.ci, reference.scipy.conf_int, lre)).toBeGreaterThanOrEqual(intervalFloor);
    // R stats-Ex.Rout.save prints t = -3.7671, df = 18.332, p-value = 0.001374.
    expect(result.statistic.value.toFixed(4)).toBe(reference.published.t.toFixed(4));
    expect((result.df as number).toFixed(3)).toBe(reference.published.df.toFixed(3));
    expect(Number(result.p.toPrecision(4))).toBe(reference.published.p_value);
  });

  it('matches both R ?t.test cases of 1:10 against 7:20 (with and without the outlier)', () => {
    const reference = example<{data: {x: number[]; y: number[]; y_with_outlier: number[]}; scipy: Record<string, Case>}>(
      't_test_welch--r-ttest-1to10-vs-7to20.json',
    );
    for (const [key, y] of [['x_vs_y', reference.data.y], ['x_vs_y_with_outlier', reference.data.y_with_outlier]] as const) {
      const expected = reference.scipy[key]!;
      const result = welchT.compute({kind: 'two-group', first: sample('y', y), second: sample('x', reference.data.x)}, options());
      expect(lre(result.statistic.value, expected.t), key).toBeGreaterThanOrEqual(13);
      expect(lre(result.df as number, expected.df), key).toBeGreaterThanOrEqual(13);
      expect(lre(result.p, expected.p_value), key).toBeGreaterThanOrEqual(pDigits);
      expect(intervalDigits(result.estimate!.ci, expected.conf_int, lre), key).toBeGreaterThanOrEqual(intervalFloor);
    }
  });

  it('matches the scipy recomputation of the Wikipedia Welch example (via HypothesisTests.jl)', () => {
    const reference = example<{data: {A1: number[]; A2: number[]}; scipy: Case}>('t_test_welch--wikipedia-2012.json');
    const result = welchT.compute({kind: 'two-group', first: sample('A2', reference.data.A2), second: sample('A1', reference.data.A1)}, options());
    expect(lre(result.df as number, reference.scipy.df)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(intervalDigits(result.estimate!.ci, reference.scipy.conf_int, lre)).toBeGreaterThanOrEqual(intervalFloor);
  });

  it('reports the sensitivity at the declared smallest effect and the 80% detectable effect', () => {
    const reference = example<{data: {A1: number[]; A2: number[]}}>('t_test_welch--wikipedia-2012.json');
    const design = {kind: 'two-group', first: sample('A2', reference.data.A2), second: sample('A1', reference.data.A1)} as const;
    const result = welchT.compute(design, options({smallestEffect: 0.1}));
    const power = result.sensitivity!.power_at_smallest_effect!;
    const mde = result.sensitivity!.min_detectable_effect_80;
    expect(power).toBeGreaterThan(0.05);
    expect(power).toBeLessThan(1);
    // Consistency, not a reference value: power at the 80% effect is 80%.
    const atMde = welchT.compute(design, options({smallestEffect: mde})).sensitivity!.power_at_smallest_effect!;
    expect(lre(atMde, 0.8)).toBeGreaterThanOrEqual(8);
  });
});
