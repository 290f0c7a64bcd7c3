import {describe, expect, it} from 'vitest';
import {pairedT} from '../../src/methods/paired-t.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {intervalDigits, intervalFloor, options, pDigits, sample} from './helpers.js';

interface SleepPaired {
  data: {drug1_extra: number[]; drug2_extra: number[]};
  scipy: {t: number; df: number; p_value: number; conf_int: [number, number]; mean_difference: number};
  published: {t: number; p_value: number; conf_int: [number, number]};
}

interface Movies {
  data: {movie_1: number[]; movie_2: number[]};
  scipy: {paired: {t: number; p_value: number; cohens_d_z: number}};
}

describe('paired t test', () => {
  it('matches the scipy recomputation of R ?t.test paired (sleep, Student 1908)', () => {
    const reference = example<SleepPaired>('t_test_paired--r-ttest-sleep-student1908.json');
    // stet's estimate is second − first; the source reports drug1 − drug2.
    const result = pairedT.compute(
      {kind: 'paired', first: sample('drug2', reference.data.drug2_extra), second: sample('drug1', reference.data.drug1_extra)},
      options(),
    );
    expect(lre(result.statistic.value, reference.scipy.t)).toBeGreaterThanOrEqual(13);
    expect(result.df).toBe(9);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(lre(result.estimate!.value, reference.scipy.mean_difference)).toBeGreaterThanOrEqual(14);
    expect(intervalDigits(result.estimate!.ci, reference.scipy.conf_int, lre)).toBeGreaterThanOrEqual(intervalFloor);
    // R stats-Ex.Rout.save prints t = -4.0621, p-value = 0.002833.
    expect(result.statistic.value.toFixed(4)).toBe(reference.published.t.toFixed(4));
    expect(Number(result.p.toPrecision(4))).toBe(reference.published.p_value);
  });

  it("gives Cohen's d_z of Lakens 2013 (Front. Psychol. 4:863, Table 1) before the small-sample correction", () => {
    const reference = example<Movies>('effect_size_cohens_d_hedges_g--lakens2013-movies.json');
    const result = pairedT.compute(
      {kind: 'paired', first: sample('movie 2', reference.data.movie_2), second: sample('movie 1', reference.data.movie_1)},
      options(),
    );
    const j = 1 - 3 / (4 * 9 - 1); // Hedges & Olkin 1985 correction on n − 1 = 9 df
    expect(lre(result.effect!.value / j, reference.scipy.paired.cohens_d_z)).toBeGreaterThanOrEqual(13);
    expect(lre(result.statistic.value, reference.scipy.paired.t)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.paired.p_value)).toBeGreaterThanOrEqual(pDigits);
  });
});
