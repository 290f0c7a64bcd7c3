import {describe, expect, it} from 'vitest';
import {normalCriticalCount, normalTails, tieSum} from '../../../src/methods/shared/normal-tails.js';
import {lre} from '../../helpers/lre.js';

describe('normal tails', () => {
  it('applies the continuity correction towards the centre', () => {
    // airquality May vs August (R ?wilcox.test): U_August = 548.5, mean 338,
    // sd from the tie-corrected variance; scipy 1.17.1:
    // stats.mannwhitneyu(aug, may, alternative='greater', method='asymptotic')
    // numpy 2.4.6 recomputation of sqrt(mn/12·((N+1) - Σ(t³-t)/(N(N-1)))) on those data
    const sd = 54.62375766972448;
    const tails = normalTails(548.5, 338, sd);
    expect(lre(tails.greater, 6.040391538438717e-5)).toBeGreaterThanOrEqual(12);
    expect(lre(tails.z, (548.5 - 338 - 0.5) / sd)).toBeGreaterThanOrEqual(15);
  });

  it('rounds the large-sample order statistic to the nearest integer', () => {
    // 10·10 pairs, untied sd √(100·21/12): 50 - 1.959964·13.2288 = 24.07 → 24
    expect(normalCriticalCount(100, Math.sqrt(2100 / 12), 0.025)).toBe(24);
    expect(normalCriticalCount(4, 10, 0.025)).toBe(0);
  });
});

describe('tieSum', () => {
  it('adds t³ - t over tie groups', () => {
    expect(tieSum([2, 2])).toBe(12);
    expect(tieSum([4])).toBe(60);
    expect(tieSum([])).toBe(0);
  });
});
