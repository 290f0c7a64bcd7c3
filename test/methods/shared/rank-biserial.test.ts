import {describe, expect, it} from 'vitest';
import {rankBiserial} from '../../../src/methods/shared/rank-biserial.js';
import {lre} from '../../helpers/lre.js';

const twoGroupSd = (m: number, n: number) => Math.sqrt((m + n + 1) / (3 * m * n));

describe('rankBiserial', () => {
  it('puts a Fisher-z interval with the null spread around r', () => {
    // Shier 2004 data (SciPy docs): U = 17 of 4·5 = 20 pairs, r = 2·17/20 - 1.
    const effect = rankBiserial({r: 0.7, sd: twoGroupSd(4, 5), halfStep: 1 / 20, alternative: 'two-sided', confidence: 0.95});
    expect(effect.name).toBe('rank-biserial');
    // numpy 2.4.6 / scipy 1.17.1: tanh(arctanh(0.7) ∓ norm.ppf(0.975)·sqrt(10/60)), the
    // formula of R effectsize::rank_biserial
    expect(lre(effect.ci![0], 0.06704784052834334)).toBeGreaterThanOrEqual(13);
    expect(lre(effect.ci![1], 0.9312140719776925)).toBeGreaterThanOrEqual(13);
  });

  it('gives one-sided intervals with a bound at ±1', () => {
    // Hollander & Wolfe p. 69 data: U = 35 of 50, r = 0.4.
    const greater = rankBiserial({r: 0.4, sd: twoGroupSd(5, 10), halfStep: 1 / 50, alternative: 'greater', confidence: 0.95});
    // numpy 2.4.6: tanh(arctanh(0.4) - norm.ppf(0.95)·sqrt(16/150))
    expect(lre(greater.ci![0], -0.11307239338132373)).toBeGreaterThanOrEqual(13);
    expect(greater.ci![1]).toBe(1);
    const less = rankBiserial({r: 0.4, sd: twoGroupSd(5, 10), halfStep: 1 / 50, alternative: 'less', confidence: 0.95});
    expect(less.ci![0]).toBe(-1);
  });

  it('moves r half a step inwards at complete separation', () => {
    const effect = rankBiserial({r: 1, sd: twoGroupSd(5, 5), halfStep: 1 / 25, alternative: 'two-sided', confidence: 0.95});
    // numpy 2.4.6: tanh(arctanh(1 - 1/25) - norm.ppf(0.975)·sqrt(11/75))
    expect(lre(effect.ci![0], 0.8322157194137294)).toBeGreaterThanOrEqual(13);
    expect(effect.ci![1]).toBe(1);
    expect(effect.value).toBe(1);
    const below = rankBiserial({r: -1, sd: twoGroupSd(5, 5), halfStep: 1 / 25, alternative: 'two-sided', confidence: 0.95});
    expect(below.ci![0]).toBe(-1);
    expect(lre(below.ci![1], -0.8322157194137294)).toBeGreaterThanOrEqual(13);
  });
});
