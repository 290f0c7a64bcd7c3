import {describe, expect, it} from 'vitest';
import {pairedDifferences} from '../../../src/methods/shared/paired-differences.js';
import {sample} from '../helpers.js';

describe('pairedDifferences', () => {
  it('keeps zeros that the doubles blur', () => {
    const {raw, centred, tolerance} = pairedDifferences(sample('a', [2.2, 1.2, 5]), sample('b', [2.3, 1.3, 5.1]), 0.1);
    expect(Array.from(raw)).toEqual([2.3 - 2.2, 1.3 - 1.2, 5.1 - 5]);
    // Every difference is 0.1 in the data, so every centred value is 0.
    expect(Array.from(centred)).toEqual([0, 0, 0]);
    expect(tolerance).toBeLessThan(1e-14);
  });

  it('keeps ties of magnitude that the doubles blur, with their signs', () => {
    // 2.3 - 2.2 = 0.09999999999999964 and 1.3 - 1.2 = 0.10000000000000009 as doubles.
    const {raw, centred} = pairedDifferences(sample('a', [2.2, 1.2, 0.5, 4]), sample('b', [2.3, 1.3, 0.4, 4.2]), 0);
    expect(raw[0]).not.toBe(raw[1]);
    expect(centred[0]).toBe(centred[1]);
    expect(centred[2]).toBe(-centred[0]!); // 0.4 - 0.5 = -0.1 in the data
    expect(centred[3]).toBe(raw[3]); // 0.2 stays apart
  });

  it('leaves distinct differences distinct', () => {
    const {centred} = pairedDifferences(sample('a', [1, 2, 3]), sample('b', [1.5, 2, 2.9]), 0);
    expect(Array.from(centred)).toEqual([0.5, 0, 2.9 - 3]);
  });

  it('refuses samples of different lengths (a programming error)', () => {
    expect(() => pairedDifferences(sample('a', [1, 2]), sample('b', [1]), 0)).toThrow(/has 2 values but b has 1/);
  });
});
