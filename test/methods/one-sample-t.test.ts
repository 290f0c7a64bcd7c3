import {describe, expect, it} from 'vitest';
import {oneSampleT} from '../../src/methods/one-sample-t.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {intervalDigits, intervalFloor, options, pDigits, sample} from './helpers.js';

interface Sleep {
  data: {extra: number[]};
  scipy: {t: number; df: number; p_value: number; conf_int: [number, number]; mean: number};
  published: {t: number; p_value: number; conf_int: [number, number]};
}

describe('one-sample t test', () => {
  const reference = example<Sleep>('t_test_one_sample--r-ttest-sleep-extra.json');
  const result = oneSampleT.compute({kind: 'one-sample', sample: sample('extra', reference.data.extra)}, options());

  it('matches the scipy recomputation of R ?t.test (sleep, Student 1908)', () => {
    const {scipy} = reference;
    expect(lre(result.statistic.value, scipy.t)).toBeGreaterThanOrEqual(13);
    expect(result.df).toBe(scipy.df);
    expect(lre(result.p, scipy.p_value)).toBeGreaterThanOrEqual(12);
    expect(intervalDigits(result.estimate!.ci, scipy.conf_int, lre)).toBeGreaterThanOrEqual(intervalFloor);
    expect(lre(result.estimate!.value, scipy.mean)).toBeGreaterThanOrEqual(14);
  });

  it("agrees with R's printed output at its precision (R stats-Ex.Rout.save, ?t.test)", () => {
    expect(result.statistic.value.toFixed(3)).toBe(reference.published.t.toFixed(3));
    expect(Number(result.p.toPrecision(4))).toBe(reference.published.p_value);
    expect(Number(result.estimate!.ci[0].toPrecision(7))).toBe(reference.published.conf_int[0]);
  });

  it('gives one-sided p-values that halve the two-sided one on the side of the estimate', () => {
    const data = {kind: 'one-sample', sample: sample('extra', reference.data.extra)} as const;
    const greater = oneSampleT.compute(data, options({alternative: 'greater'}));
    const less = oneSampleT.compute(data, options({alternative: 'less'}));
    // Symmetry of the t distribution: common practice, no source.
    expect(lre(greater.p, reference.scipy.p_value / 2)).toBeGreaterThanOrEqual(12);
    expect(lre(less.p, 1 - reference.scipy.p_value / 2)).toBeGreaterThanOrEqual(12);
    expect(greater.estimate!.ci[1]).toBe(Infinity);
    expect(less.estimate!.ci[0]).toBe(-Infinity);
  });

  it('tests against mu', () => {
    const shifted = oneSampleT.compute({kind: 'one-sample', sample: sample('extra', reference.data.extra)}, options({mu: 1.54}));
    expect(Math.abs(shifted.statistic.value)).toBeLessThan(1e-12);
  });
});
