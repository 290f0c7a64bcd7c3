import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {medianOf, orderStatisticInterval, pairwiseDifferences, walshAverages} from '../../../src/methods/shared/hodges-lehmann.js';

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 === 1 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

const sampleOf = (max: number) => fc.array(fc.integer({min: -50, max: 50}).map((x) => x / 4), {minLength: 1, maxLength: max});

describe('Hodges–Lehmann estimates', () => {
  it('is the median of all pairwise differences second - first', () => {
    fc.assert(
      fc.property(sampleOf(15), sampleOf(15), (a, b) => {
        const all = b.flatMap((y) => a.map((x) => y - x));
        expect(medianOf(pairwiseDifferences(Float64Array.from(a), Float64Array.from(b)))).toBe(median(all));
      }),
    );
  });

  it('is the median of the Walsh averages for one sample', () => {
    fc.assert(
      fc.property(sampleOf(20), (d) => {
        const all: number[] = [];
        for (let i = 0; i < d.length; i++) for (let j = i; j < d.length; j++) all.push((d[i]! + d[j]!) / 2);
        expect(medianOf(walshAverages(Float64Array.from(d)))).toBe(median(all));
      }),
    );
  });

  it('gives the textbook one-sample example', () => {
    // Walsh averages of (1, 2, 4): 1, 1.5, 2, 2.5, 3, 4; median (2 + 2.5)/2.
    expect(medianOf(walshAverages(Float64Array.of(4, 1, 2)))).toBe(2.25);
  });
});

describe('orderStatisticInterval', () => {
  const sorted = [1, 2, 3, 4, 5, 6, 7];
  const kth = (k: number) => sorted[k - 1]!;

  it('runs from the k-th smallest to the k-th largest', () => {
    expect(orderStatisticInterval(kth, 7, 2, 'two-sided')).toEqual([2, 6]);
    expect(orderStatisticInterval(kth, 7, 2, 'greater')).toEqual([2, Infinity]);
    expect(orderStatisticInterval(kth, 7, 2, 'less')).toEqual([-Infinity, 6]);
  });

  it('is unbounded when no order statistic reaches the level', () => {
    expect(orderStatisticInterval(kth, 7, 0, 'two-sided')).toEqual([-Infinity, Infinity]);
    expect(orderStatisticInterval(kth, 7, 0, 'greater')).toEqual([-Infinity, Infinity]);
  });
});
