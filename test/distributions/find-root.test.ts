import {describe, expect, it} from 'vitest';
import {bracketRoot, findRoot} from '../../src/distributions/find-root.js';
import {lre} from '../helpers/lre.js';

describe('findRoot (Brent)', () => {
  it('solves x² = 2 and cos x = x to the last digits', () => {
    expect(lre(findRoot((x) => x * x - 2, 0, 2), Math.SQRT2)).toBeGreaterThanOrEqual(15);
    // The Dottie number: common practice, no source
    expect(lre(findRoot((x) => Math.cos(x) - x, 0, 1), 0.7390851332151607)).toBeGreaterThanOrEqual(15);
  });

  it('converges on a function that is flat near its root, and counts its calls', () => {
    let calls = 0;
    const root = findRoot(
      (x) => {
        calls++;
        return (x - 1) ** 3;
      },
      -3,
      10,
    );
    expect(Math.abs(root - 1)).toBeLessThan(1e-5); // (x-1)³ resolves x only to ε^(1/3)
    expect(calls).toBeLessThan(200);
  });

  it('respects an absolute tolerance', () => {
    const root = findRoot((x) => Math.exp(x) - 5, 0, 5, {xTol: 1e-6});
    expect(Math.abs(root - Math.log(5))).toBeLessThan(1e-6);
  });

  it('throws when the bracket has no sign change', () => {
    expect(() => findRoot((x) => x * x + 1, -1, 1)).toThrow(/bracket/);
  });
});

describe('bracketRoot', () => {
  it('widens until the sign changes, in either direction', () => {
    const decreasing = (x: number) => 1000 - x;
    const [lo, hi] = bracketRoot(decreasing, 0, 1, true);
    expect(decreasing(lo)).toBeGreaterThan(0);
    expect(decreasing(hi)).toBeLessThan(0);
    const increasing = (x: number) => x + 500;
    const [lo2, hi2] = bracketRoot(increasing, 0, 1, false);
    expect(increasing(lo2)).toBeLessThan(0);
    expect(increasing(hi2)).toBeGreaterThan(0);
  });
});
