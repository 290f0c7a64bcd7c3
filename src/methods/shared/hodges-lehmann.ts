import type {Alternative} from '../types.js';
import {matrixSize, selectKth, type SortedMatrix} from './select-kth.js';

/**
 * Hodges–Lehmann estimates and their distribution-free intervals (Hodges &
 * Lehmann 1963, "Estimates of location based on rank tests", Ann. Math.
 * Statist. 34:598–611; Hollander, Wolfe & Chicken 2014, "Nonparametric
 * Statistical Methods", 3rd ed.): the shift between two samples is the
 * median of the m·n differences `second_j - first_i` (§4.2), its interval
 * runs between order statistics of those differences (Moses, §4.3); the
 * centre of the paired differences is the median of their n(n+1)/2 Walsh
 * averages (d_i + d_j)/2, i ≤ j (§3.2), its interval between order
 * statistics of the Walsh averages (Tukey, §3.3).
 */

/** All `second_j - first_i`, as a sorted implicit matrix. */
export function pairwiseDifferences(first: Float64Array, second: Float64Array): SortedMatrix {
  const a = Float64Array.from(first).sort().reverse(); // columns: b - a grows as a falls
  const b = Float64Array.from(second).sort();
  return {rows: b.length, columns: a.length, entry: (r, c) => b[r]! - a[c]!, firstColumn: () => 0};
}

/** All (d_i + d_j)/2 with i ≤ j, as a sorted implicit matrix (upper triangle). */
export function walshAverages(values: Float64Array): SortedMatrix {
  const d = Float64Array.from(values).sort();
  return {rows: d.length, columns: d.length, entry: (r, c) => (d[r]! + d[c]!) / 2, firstColumn: (r) => r};
}

/** The median of the matrix's members. */
export function medianOf(matrix: SortedMatrix): number {
  const size = matrixSize(matrix);
  if (size % 2 === 1) return selectKth(matrix, (size + 1) / 2);
  return (selectKth(matrix, size / 2) + selectKth(matrix, size / 2 + 1)) / 2;
}

/**
 * The interval [X_(k), X_(N+1-k)] between order statistics of N values, or
 * its one-sided half for a one-sided alternative. k comes from the null
 * distribution of the test statistic (`exactCriticalCount`,
 * `normalCriticalCount`); k = 0 means no finite bound reaches the level, and
 * the bound is infinite (every shift is compatible with the data).
 */
export function orderStatisticInterval(
  kth: (k: number) => number,
  size: number,
  k: number,
  alternative: Alternative,
): readonly [number, number] {
  const attainable = k >= 1 && k <= size;
  const lower = alternative === 'less' || !attainable ? -Infinity : kth(k);
  const upper = alternative === 'greater' || !attainable ? Infinity : kth(size + 1 - k);
  return [lower, upper];
}
