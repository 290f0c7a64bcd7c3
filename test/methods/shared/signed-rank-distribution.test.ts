import {describe, expect, it} from 'vitest';
import {signedRankPmf} from '../../../src/methods/shared/signed-rank-distribution.js';
import {lre} from '../../helpers/lre.js';

/** Counts of T+ over all 2^n sign vectors, by enumeration. */
function enumeratedCounts(n: number): number[] {
  const counts = new Array<number>((n * (n + 1)) / 2 + 1).fill(0);
  for (let signs = 0; signs < 2 ** n; signs++) {
    let t = 0;
    for (let rank = 1; rank <= n; rank++) if (signs & (1 << (rank - 1))) t += rank;
    counts[t]!++;
  }
  return counts;
}

describe('signedRankPmf', () => {
  it.each([1, 2, 5, 9, 15])('matches enumeration of all sign vectors for n = %i', (n) => {
    const pmf = signedRankPmf(n);
    const counts = enumeratedCounts(n);
    expect(pmf.length).toBe(counts.length);
    // Dyadic probabilities: the recurrence only halves and adds, so it is exact.
    for (let t = 0; t < counts.length; t++) expect(pmf[t]).toBe(counts[t]! / 2 ** n);
  });

  it('keeps the far tail and the total at n = 500', () => {
    const start = performance.now();
    const pmf = signedRankPmf(500);
    const elapsed = performance.now() - start;
    expect(pmf[0]).toBe(2 ** -500); // one sign vector: all negative
    expect(pmf[1]).toBe(2 ** -500);
    expect(pmf[3]).toBe(2 * 2 ** -500); // {3} and {1, 2}
    expect(Math.abs(pmf.reduce((s, p) => s + p, 0) - 1)).toBeLessThan(1e-13);
    const top = pmf.length - 1;
    for (let t = 0; t <= top / 2; t += 97) expect(lre(pmf[t]!, pmf[top - t]!)).toBeGreaterThanOrEqual(13);
    // 2e7 additions; the bound only catches a change of complexity.
    expect(elapsed).toBeLessThan(10_000);
  });
});
