/**
 * The k-th smallest entry of an implicit matrix whose entries never
 * decrease along a row or down a column, without materializing it: the
 * m·n pairwise differences of two samples, or the n(n+1)/2 Walsh averages
 * of one, would need gigabytes for samples of a few ten thousands.
 *
 * Bisection on the value with counting by a staircase walk, O(rows +
 * columns) per count (the counting step of Johnson & Mizoguchi 1978,
 * "Selecting the Kth element in X + Y and X1 + X2 + … + Xm", SIAM J.
 * Comput. 7:147–153, and of Monahan 1984, ACM TOMS Algorithm 616 for the
 * Hodges–Lehmann estimator), until at most `enumerationLimit` entries
 * remain between the brackets; those are listed and sorted. Small
 * matrices are listed at once. Entries are the computed doubles, and
 * rounding is monotone, so the counts are exact for them.
 */
export interface SortedMatrix {
  readonly rows: number;
  readonly columns: number;
  /** Defined on the whole grid, non-decreasing in `row` and in `column`. */
  entry(row: number, column: number): number;
  /** Columns before this one are not members of the row (a triangle). */
  firstColumn(row: number): number;
}

export function matrixSize(matrix: SortedMatrix): number {
  let size = 0;
  for (let r = 0; r < matrix.rows; r++) size += Math.max(0, matrix.columns - matrix.firstColumn(r));
  return size;
}

/** The k-th smallest member, k = 1..size. */
export function selectKth(matrix: SortedMatrix, k: number, enumerationLimit = 65_536): number {
  const size = matrixSize(matrix);
  if (!(Number.isInteger(k) && k >= 1 && k <= size)) throw new Error(`selectKth: k = ${k} outside 1..${size}`);
  let lo = Infinity;
  let hi = -Infinity;
  for (let r = 0; r < matrix.rows; r++) {
    if (matrix.firstColumn(r) >= matrix.columns) continue;
    lo = Math.min(lo, matrix.entry(r, matrix.firstColumn(r)));
    hi = Math.max(hi, matrix.entry(r, matrix.columns - 1));
  }
  let below = countAtMost(matrix, lo); // members ≤ lo
  if (below >= k) return lo;
  let within = size; // members ≤ hi
  for (;;) {
    if (within - below <= enumerationLimit) {
      const candidates = membersBetween(matrix, lo, hi).sort((a, b) => a - b);
      return candidates[k - below - 1]!;
    }
    const mid = lo + (hi - lo) / 2;
    // No double strictly between the brackets: the k-th member is hi.
    if (!(mid > lo && mid < hi)) return hi;
    const count = countAtMost(matrix, mid);
    if (count >= k) [hi, within] = [mid, count];
    else [lo, below] = [mid, count];
  }
}

/** Number of members ≤ t: a staircase walk from the top-right corner. */
export function countAtMost(matrix: SortedMatrix, t: number): number {
  let total = 0;
  let column = matrix.columns;
  for (let r = 0; r < matrix.rows; r++) {
    while (column > 0 && matrix.entry(r, column - 1) > t) column--;
    total += Math.max(0, column - matrix.firstColumn(r));
  }
  return total;
}

/** Members in (lo, hi]. */
function membersBetween(matrix: SortedMatrix, lo: number, hi: number): number[] {
  const members: number[] = [];
  let columnLo = matrix.columns;
  let columnHi = matrix.columns;
  for (let r = 0; r < matrix.rows; r++) {
    while (columnLo > 0 && matrix.entry(r, columnLo - 1) > lo) columnLo--;
    while (columnHi > 0 && matrix.entry(r, columnHi - 1) > hi) columnHi--;
    for (let c = Math.max(columnLo, matrix.firstColumn(r)); c < columnHi; c++) members.push(matrix.entry(r, c));
  }
  return members;
}
