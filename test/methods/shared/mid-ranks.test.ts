import {describe, expect, it} from 'vitest';
import {midRanks} from '../../../src/methods/shared/mid-ranks.js';

describe('midRanks', () => {
  it('averages the ranks of tied values and lists the tie groups', () => {
    // Hand computation from the definition (Kendall & Gibbons 1990): 1 < 2 = 2 < 5 = 5 = 5 < 9
    const {ranks, ties} = midRanks(Float64Array.of(5, 2, 9, 5, 1, 2, 5));
    expect(Array.from(ranks)).toEqual([5, 2.5, 7, 5, 1, 2.5, 5]);
    expect(ties).toEqual([2, 3]);
  });

  it('gives 1…n without ties and handles an empty sample', () => {
    expect(Array.from(midRanks(Float64Array.of(0.3, -1, 7)).ranks)).toEqual([2, 1, 3]);
    expect(midRanks(new Float64Array(0))).toEqual({ranks: new Float64Array(0), ties: []});
  });
});
