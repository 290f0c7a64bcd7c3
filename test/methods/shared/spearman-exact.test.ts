import {describe, expect, it} from 'vitest';
import {spearmanExactTails} from '../../../src/methods/shared/spearman-exact.js';

/** Tails of Σ a_i b_π(i) by recursive enumeration, in plain arithmetic. */
function bruteForce(a: number[], b: number[]): {greater: number; less: number} {
  const observed = a.reduce((s, v, i) => s + v * b[i]!, 0);
  let atLeast = 0;
  let atMost = 0;
  let total = 0;
  const visit = (sum: number, index: number, rest: number[]) => {
    if (rest.length === 0) {
      total++;
      if (sum >= observed - 1e-9) atLeast++;
      if (sum <= observed + 1e-9) atMost++;
      return;
    }
    rest.forEach((v, k) => visit(sum + a[index]! * v, index + 1, [...rest.slice(0, k), ...rest.slice(k + 1)]));
  };
  visit(0, 0, b);
  return {greater: atLeast / total, less: atMost / total};
}

describe('exact permutation tails of Spearman’s rho', () => {
  it('agrees with a plain enumeration, with and without mid-ranks', () => {
    const cases: [number[], number[]][] = [
      [[1, 2, 3, 4, 5, 6], [2, 1, 4, 3, 6, 5]],
      [[1, 2, 3, 4, 5, 6, 7], [7, 5, 6, 1, 3, 2, 4]],
      [[1, 2.5, 2.5, 4, 5], [1.5, 1.5, 3, 4.5, 4.5]],
    ];
    for (const [a, b] of cases) {
      expect(spearmanExactTails(Float64Array.from(a), Float64Array.from(b))).toEqual(bruteForce(a, b));
    }
  });

  it('is exact at the extremes: P(rho ≥ 1) = 1/n! for perfectly ordered ranks', () => {
    // exact: only the identity pairing reaches rho = 1; 10! = 3 628 800
    const ranks = Float64Array.from({length: 10}, (_, i) => i + 1);
    const tails = spearmanExactTails(ranks, ranks);
    expect(tails.greater).toBe(1 / 3628800);
    expect(tails.less).toBe(1);
  });

  it('refuses more than 10 pairs as programmer misuse', () => {
    const ranks = Float64Array.from({length: 11}, (_, i) => i + 1);
    expect(() => spearmanExactTails(ranks, ranks)).toThrow(/at most 10/);
  });
});
