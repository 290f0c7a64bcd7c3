import {describe, expect, it} from 'vitest';
import {studentT} from '../../src/methods/student-t.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {intervalDigits, intervalFloor, options, pDigits, sample} from './helpers.js';

interface Wikipedia {
  data: {A1: number[]; A2: number[]};
  scipy: {t: number; df: number; p_value: number; conf_int: [number, number]};
}

interface AtmWtAg {
  data: {instrument_1: number[]; instrument_2: number[]};
  published: {anova_F: number};
  scipy: {t: number; p_value: number};
}

interface Movies {
  data: {movie_1: number[]; movie_2: number[]};
  scipy: {independent: {t: number; p_value: number; cohens_d_s: number; hedges_g_s: number; d_s_95CI_noncentral_t: [number, number]}};
  published: {independent: {hedges_g_s: number; d_s_95CI_single_secondary_source: [number, number]}};
}

describe("Student's t test", () => {
  it("matches the scipy recomputation of Wikipedia's pooled example (via HypothesisTests.jl)", () => {
    const reference = example<Wikipedia>('t_test_student_two_sample--wikipedia-2012.json');
    const result = studentT.compute({kind: 'two-group', first: sample('A2', reference.data.A2), second: sample('A1', reference.data.A1)}, options());
    expect(lre(result.statistic.value, reference.scipy.t)).toBeGreaterThanOrEqual(13);
    expect(result.df).toBe(10);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(intervalDigits(result.estimate!.ci, reference.scipy.conf_int, lre)).toBeGreaterThanOrEqual(intervalFloor);
  });

  it('reproduces the NIST StRD AtmWtAg certified F as t² (1 between, 46 within df)', () => {
    const reference = example<AtmWtAg>('t_test_student_two_sample--nist-strd-atmwtag.json');
    const result = studentT.compute(
      {kind: 'two-group', first: sample('2', reference.data.instrument_2), second: sample('1', reference.data.instrument_1)},
      options(),
    );
    // Seven constant leading digits: float64 input limits t² to about 8.5
    // digits (the example file measured scipy at 8.5); we reach at least 9.
    expect(lre(result.statistic.value ** 2, reference.published.anova_F)).toBeGreaterThanOrEqual(9);
    expect(result.df).toBe(46);
    // p inherits the ~8.5 digits that float64 input leaves in t here.
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(7.5);
  });

  it("gives Hedges' g_s and its noncentral-t interval of Lakens 2013 (Front. Psychol. 4:863, Table 1)", () => {
    const reference = example<Movies>('effect_size_cohens_d_hedges_g--lakens2013-movies.json');
    const result = studentT.compute(
      {kind: 'two-group', first: sample('movie 2', reference.data.movie_2), second: sample('movie 1', reference.data.movie_1)},
      options(),
    );
    const {independent} = reference.scipy;
    const j = 1 - 3 / (4 * 18 - 1); // the J of the source: 1 − 3/(4(n1+n2) − 9)
    expect(lre(result.effect!.value, independent.hedges_g_s)).toBeGreaterThanOrEqual(13);
    expect(lre(result.statistic.value, independent.t)).toBeGreaterThanOrEqual(13);
    // The source's interval is for d_s (scipy nct + brentq); stet's is J × that.
    expect(lre(result.effect!.ci![0] / j, independent.d_s_95CI_noncentral_t[0])).toBeGreaterThanOrEqual(9);
    expect(lre(result.effect!.ci![1] / j, independent.d_s_95CI_noncentral_t[1])).toBeGreaterThanOrEqual(9);
    expect(result.effect!.value.toFixed(2)).toBe(reference.published.independent.hedges_g_s.toFixed(2));
    expect((result.effect!.ci![0] / j).toFixed(2)).toBe(reference.published.independent.d_s_95CI_single_secondary_source[0].toFixed(2));
  });
});
