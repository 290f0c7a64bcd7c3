import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {pairwiseDifferences, walshAverages} from '../../../src/methods/shared/hodges-lehmann.js';
import {countAtMost, matrixSize, selectKth} from '../../../src/methods/shared/select-kth.js';

const sortAscending = (values: number[]) => values.sort((a, b) => a - b);

function allDifferences(a: number[], b: number[]): number[] {
  return sortAscending(b.flatMap((y) => a.map((x) => y - x)));
}

function allWalsh(d: number[]): number[] {
  const out: number[] = [];
  for (let i = 0; i < d.length; i++) for (let j = i; j < d.length; j++) out.push((d[i]! + d[j]!) / 2);
  return sortAscending(out);
}

// Values on a coarse grid force many ties; doubles exercise rounding.
const value = fc.oneof(
  fc.integer({min: -6, max: 6}),
  fc.double({min: -1e3, max: 1e3, noNaN: true, noDefaultInfinity: true}),
);
const sampleOf = (max: number) => fc.array(value, {minLength: 1, maxLength: max});

describe('selectKth', () => {
  it('finds every order statistic of the pairwise differences, by bisection and by listing', () => {
    fc.assert(
      fc.property(sampleOf(12), sampleOf(12), fc.integer({min: 1, max: 8}), (a, b, limit) => {
        const matrix = pairwiseDifferences(Float64Array.from(a), Float64Array.from(b));
        const reference = allDifferences(a, b);
        expect(matrixSize(matrix)).toBe(reference.length);
        for (let k = 1; k <= reference.length; k++) {
          // + 0 folds -0 into 0: sorting does not order them.
          expect(selectKth(matrix, k, limit) + 0).toBe(reference[k - 1]! + 0);
          expect(selectKth(matrix, k) + 0).toBe(reference[k - 1]! + 0);
        }
      }),
      {numRuns: 200},
    );
  });

  it('finds every order statistic of the Walsh averages', () => {
    fc.assert(
      fc.property(sampleOf(16), fc.integer({min: 1, max: 8}), (d, limit) => {
        const matrix = walshAverages(Float64Array.from(d));
        const reference = allWalsh(d);
        expect(matrixSize(matrix)).toBe(reference.length);
        for (let k = 1; k <= reference.length; k++) expect(selectKth(matrix, k, limit) + 0).toBe(reference[k - 1]! + 0);
      }),
      {numRuns: 200},
    );
  });

  it('counts the members at or below a value', () => {
    fc.assert(
      fc.property(sampleOf(10), sampleOf(10), value, (a, b, t) => {
        const matrix = pairwiseDifferences(Float64Array.from(a), Float64Array.from(b));
        expect(countAtMost(matrix, t)).toBe(allDifferences(a, b).filter((x) => x <= t).length);
      }),
    );
  });

  it('selects the median of 4·10⁸ differences without listing them', () => {
    const n = 20_000;
    // A deterministic, untied pattern (multiplier coprime to the modulus).
    const a = Float64Array.from({length: n}, (_, i) => ((i * 7919) % 20_011) / 7);
    const b = Float64Array.from({length: n}, (_, i) => ((i * 104_729) % 20_021) / 7 + 3.5);
    const matrix = pairwiseDifferences(a, b);
    const k = (n * n) / 2;
    const start = performance.now();
    const median = selectKth(matrix, k);
    const elapsed = performance.now() - start;
    // The selected value has exactly k - 1 members strictly below it... or ties.
    expect(countAtMost(matrix, median)).toBeGreaterThanOrEqual(k);
    expect(countAtMost(matrix, median - 1e-9)).toBeLessThan(k);
    expect(elapsed).toBeLessThan(20_000); // about 60 walks of 4e4 steps
  });

  it('rejects an index outside the set (a programming error)', () => {
    const matrix = walshAverages(Float64Array.of(1, 2));
    expect(() => selectKth(matrix, 0)).toThrow(/outside 1..3/);
    expect(() => selectKth(matrix, 4)).toThrow(/outside 1..3/);
  });
});
