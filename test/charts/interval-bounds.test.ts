import {describe, expect, it} from 'vitest';
import {clampInterval, extentOf} from '../../src/charts/interval-bounds.js';

describe('clampInterval', () => {
  it('keeps a finite interval and cuts an infinite bound at the data, flagged', () => {
    expect(clampInterval([1, 2], [0, 5])).toEqual({lower: 1, upper: 2});
    expect(clampInterval([1, Infinity], [0, 5])).toEqual({lower: 1, upper: 5, open: 'upper'});
    expect(clampInterval([-Infinity, 2], [0, 5])).toEqual({lower: 0, upper: 2, open: 'lower'});
    // A finite bound beyond the data: the cut never inverts the interval.
    expect(clampInterval([7, Infinity], [0, 5])).toEqual({lower: 7, upper: 7, open: 'upper'});
    expect(() => clampInterval([-Infinity, Infinity], [0, 5])).toThrow(/cannot draw/);
  });
});

describe('extentOf', () => {
  it('spans the finite values, and [0, 1] when there are none', () => {
    expect(extentOf([3, NaN, -1, Infinity, 2])).toEqual([-1, 3]);
    expect(extentOf([])).toEqual([0, 1]);
  });
});
