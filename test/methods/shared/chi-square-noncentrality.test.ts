import {describe, expect, it} from 'vitest';
import {noncentralityInterval} from '../../../src/methods/shared/chi-square-noncentrality.js';
import {lre} from '../../helpers/lre.js';

describe('noncentralityInterval', () => {
  it('inverts both tails (Agresti 2007 p. 39 table: X² = 30.0701 on 2 df)', () => {
    const [lower, upper] = noncentralityInterval(30.070149095754672, 2, 0.95);
    // mpmath 1.3.0 at 40 digits, bisection of the noncentral chi-square series
    expect(lre(lower, 11.615166353507927)).toBeGreaterThanOrEqual(13);
    expect(lre(upper, 54.24111585884247)).toBeGreaterThanOrEqual(13);
  });

  it('puts the lower bound at 0 when p ≥ α/2, and both at 0 when X² = 0', () => {
    const [lower, upper] = noncentralityInterval(2.5, 2, 0.95);
    expect(lower).toBe(0);
    // mpmath 1.3.0 at 40 digits
    expect(lre(upper, 11.01938813366975)).toBeGreaterThanOrEqual(13);
    expect(noncentralityInterval(0, 3, 0.95)).toEqual([0, 0]);
    expect(() => noncentralityInterval(2, 1, 1.2)).toThrow(/invalid confidence/);
  });
});
