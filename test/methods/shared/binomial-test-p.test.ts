import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {binomialPmf} from '../../../src/distributions/binomial.js';
import {binomialTestP} from '../../../src/methods/shared/binomial-test-p.js';
import {lre} from '../../helpers/lre.js';

/** R's rule written the slow way: every outcome with pmf ≤ (1 + 1e-7) × the observed one. */
function bruteForce(x: number, n: number, p: number): number {
  const bound = binomialPmf(x, n, p) * (1 + 1e-7);
  let sum = 0;
  for (let i = 0; i <= n; i++) {
    const d = binomialPmf(i, n, p);
    if (d <= bound) sum += d;
  }
  return Math.min(1, sum);
}

describe('binomialTestP', () => {
  it('matches the exact "no more probable" sum (mpmath 1.3.0 at 40 digits, exact binomial terms)', () => {
    expect(lre(binomialTestP(4800, 10000, 0.49, 'two-sided'), 0.045462324627351614)).toBeGreaterThanOrEqual(12);
    expect(lre(binomialTestP(30, 1000, 0.01, 'two-sided'), 2.0599888509719576e-7)).toBeGreaterThanOrEqual(12);
    expect(lre(binomialTestP(3, 40, 0.3, 'two-sided'), 0.0008725348736635172)).toBeGreaterThanOrEqual(13);
  });

  it('is 1 when x is the mean, and gives the one-sided tails', () => {
    expect(binomialTestP(5, 10, 0.5, 'two-sided')).toBe(1);
    expect(lre(binomialTestP(0, 10, 0.5, 'less'), 2 ** -10)).toBeGreaterThanOrEqual(15);
    expect(lre(binomialTestP(10, 10, 0.5, 'greater'), 2 ** -10)).toBeGreaterThanOrEqual(15);
  });

  it('agrees with the scan of every outcome (fast-check)', () => {
    const cases = fc.integer({min: 1, max: 300}).chain((n) => fc.tuple(fc.integer({min: 0, max: n}), fc.constant(n)));
    fc.assert(
      fc.property(cases, fc.double({min: 0.001, max: 0.999, noNaN: true}), ([x, n], p) => {
        expect(lre(binomialTestP(x, n, p, 'two-sided'), bruteForce(x, n, p))).toBeGreaterThanOrEqual(12);
      }),
      {numRuns: 300},
    );
  });
});
