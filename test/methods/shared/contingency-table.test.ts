import {describe, expect, it} from 'vitest';
import {MethodError} from '../../../src/methods/method-error.js';
import {smallExpectedWarning, tableMargins} from '../../../src/methods/shared/contingency-table.js';
import type {ContingencyDesign} from '../../../src/methods/types.js';

const design = (counts: number[][], rows = ['a', 'b'], columns = ['x', 'y']): ContingencyDesign => ({kind: 'contingency', rows, columns, counts, success: undefined});

describe('tableMargins', () => {
  it('computes margins and the counts expected under independence', () => {
    const margins = tableMargins(design([[12, 7], [5, 7]]), 'test');
    expect(margins.rowTotals).toEqual([19, 12]);
    expect(margins.columnTotals).toEqual([17, 14]);
    expect(margins.total).toBe(31);
    expect(margins.expected).toEqual([[(19 * 17) / 31, (19 * 14) / 31], [(12 * 17) / 31, (12 * 14) / 31]]);
  });

  it('names an empty level and refuses one-level tables', () => {
    expect(() => tableMargins(design([[0, 0], [5, 7]]), 'test')).toThrow(/Level “a” has no observations/);
    expect(() => tableMargins(design([[1], [2]], ['a', 'b'], ['x']), 'test')).toThrow(MethodError);
    expect(() => tableMargins(design([[1, 2, 3], [4, 5]]), 'test')).toThrow(/not 2 × 2/);
  });
});

describe('smallExpectedWarning', () => {
  it('counts expected cells below 5 and gives the smallest (Cochran 1954)', () => {
    expect(smallExpectedWarning([[5, 6], [7, 8]], 'fisher-exact')).toBeUndefined();
    expect(smallExpectedWarning([[4.999, 6], [1.23456, 8]], 'fisher-exact')).toEqual(
      {kind: 'small-expected', below: 2, cells: 4, smallest: 1.23456, alternative: 'fisher-exact'},
    );
    expect(smallExpectedWarning([[4.999, 6], [1.23456, 8]], undefined)).not.toHaveProperty('alternative');
  });
});
