import {describe, expect, it} from 'vitest';
import {atLeast, atMost, exactCriticalCount, exactTails} from '../../../src/methods/shared/exact-tails.js';
import {signedRankPmf} from '../../../src/methods/shared/signed-rank-distribution.js';

describe('exact tails', () => {
  const pmf = signedRankPmf(4); // counts 1 1 1 2 2 2 2 2 1 1 1 over 16

  it('sums each tail from its own end', () => {
    expect(atMost(pmf, 3)).toBe(5 / 16);
    expect(atLeast(pmf, 7)).toBe(5 / 16);
    expect(atMost(pmf, -1)).toBe(0);
    expect(atLeast(pmf, 11)).toBe(0);
    expect(atMost(pmf, 10)).toBe(1);
    expect(exactTails(pmf, 8)).toEqual({greater: 3 / 16, less: 14 / 16});
  });

  it('picks the order statistic whose tail stays within the level', () => {
    // P(T ≤ 0) = 1/16, P(T ≤ 1) = 2/16, P(T ≤ 2) = 3/16
    expect(exactCriticalCount(pmf, 0.05)).toBe(0);
    expect(exactCriticalCount(pmf, 1 / 16)).toBe(1); // attained exactly: k - 1 = 0
    expect(exactCriticalCount(pmf, 0.15)).toBe(2);
  });
});
