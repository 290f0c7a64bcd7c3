import {describe, expect, it} from 'vitest';
import {mannWhitneyPmf} from '../../../src/methods/shared/mann-whitney-distribution.js';
import {lre} from '../../helpers/lre.js';

/** Counts of U over all C(m+n, n) placements of the second group's ranks, by enumeration. */
function enumeratedCounts(m: number, n: number): number[] {
  const counts = new Array<number>(m * n + 1).fill(0);
  const total = m + n;
  const visit = (start: number, left: number, rankSum: number): void => {
    if (left === 0) {
      counts[rankSum - (n * (n + 1)) / 2]!++;
      return;
    }
    for (let rank = start; rank <= total - left + 1; rank++) visit(rank + 1, left - 1, rankSum + rank);
  };
  visit(1, n, 0);
  return counts;
}

function binomial(n: number, k: number): number {
  let c = 1;
  for (let i = 1; i <= k; i++) c = (c * (n - k + i)) / i;
  return c;
}

describe('mannWhitneyPmf', () => {
  it.each([
    [5, 10],
    [10, 5],
    [7, 7],
    [1, 9],
    [3, 12],
  ])('matches enumeration of all placements for m = %i, n = %i', (m, n) => {
    const pmf = mannWhitneyPmf(m, n);
    const counts = enumeratedCounts(m, n);
    const total = binomial(m + n, n);
    expect(pmf.length).toBe(m * n + 1);
    // Counts below 2^53 and one division: the reference is correctly rounded.
    for (let u = 0; u <= m * n; u++) expect(lre(pmf[u]!, counts[u]! / total)).toBeGreaterThanOrEqual(14);
  });

  it('keeps the far tail at m = n = 50', () => {
    const pmf = mannWhitneyPmf(50, 50);
    // mpmath 1.3.0 at 40 digits: 1 / binomial(100, 50)
    expect(lre(pmf[0]!, 9.91165302141834e-30)).toBeGreaterThanOrEqual(13);
    expect(lre(pmf[2500]!, 9.91165302141834e-30)).toBeGreaterThanOrEqual(13);
    // P(U = 1) = 1 / C(100, 50) as well: one arrangement swaps the middle pair.
    expect(lre(pmf[1]!, 9.91165302141834e-30)).toBeGreaterThanOrEqual(13);
    const sum = pmf.reduce((s, p) => s + p, 0);
    expect(Math.abs(sum - 1)).toBeLessThan(1e-13);
    for (let u = 0; u <= 1250; u++) expect(lre(pmf[u]!, pmf[2500 - u]!)).toBeGreaterThanOrEqual(13);
  });

  it('handles an empty group and rejects nonsense sizes', () => {
    expect(Array.from(mannWhitneyPmf(0, 4))).toEqual([1]);
    expect(() => mannWhitneyPmf(2.5, 3)).toThrow(/non-negative integers/);
  });

  it('computes m = n = 100, the largest exact case, in bounded time', () => {
    const start = performance.now();
    const pmf = mannWhitneyPmf(100, 100);
    const elapsed = performance.now() - start;
    expect(pmf.length).toBe(10_001);
    // About 2.5e7 multiply-adds: 30 ms on an idle machine; the bound only
    // catches an accidental change of complexity on a loaded CI runner.
    expect(elapsed).toBeLessThan(10_000);
  });
});
