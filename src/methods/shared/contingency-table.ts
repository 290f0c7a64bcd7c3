import type {MethodNote} from '../types.js';
import {MethodError} from '../method-error.js';
import type {ContingencyDesign} from '../types.js';

/**
 * The margins of a y × by table and the counts expected under independence,
 * E_ij = r_i c_j / N, after the checks every table method shares: at least
 * two levels each way and no level without observations (its expected
 * counts would be 0 and the statistic undefined).
 */
export interface TableMargins {
  readonly rowTotals: readonly number[];
  readonly columnTotals: readonly number[];
  readonly total: number;
  readonly expected: readonly (readonly number[])[];
}

export function tableMargins(design: ContingencyDesign, title: string): TableMargins {
  const {rows, columns, counts} = design;
  if (counts.length !== rows.length || counts.some((row) => row.length !== columns.length)) {
    throw new Error(`${title}: the table is not ${rows.length} × ${columns.length}`);
  }
  if (rows.length < 2 || columns.length < 2) {
    throw new MethodError(
      `${title} needs at least two levels of the outcome and of the grouping column; the table is ${rows.length} × ${columns.length}.`,
      'Check the where filter and the declared levels.',
    );
  }
  const rowTotals = counts.map((row) => row.reduce((a, b) => a + b, 0));
  const columnTotals = columns.map((_, j) => counts.reduce((sum, row) => sum + row[j]!, 0));
  const total = rowTotals.reduce((a, b) => a + b, 0);
  const emptyRow = rowTotals.findIndex((t) => t === 0);
  const emptyColumn = columnTotals.findIndex((t) => t === 0);
  if (emptyRow >= 0 || emptyColumn >= 0) {
    const level = emptyRow >= 0 ? rows[emptyRow] : columns[emptyColumn];
    throw new MethodError(
      `Level “${level}” has no observations, so ${title} cannot use it (its expected counts would be 0).`,
      'Drop the empty level (with `levels:` for the grouping column, or `where`) or check the data.',
    );
  }
  const expected = rowTotals.map((r) => columnTotals.map((c) => (r * c) / total));
  return {rowTotals, columnTotals, total, expected};
}

/** The author-facing warning when an expected count is below 5 (Cochran 1954, Biometrics 10:417), or undefined. */
export function smallExpectedWarning(expected: readonly (readonly number[])[], alternative: string | undefined): MethodNote | undefined {
  const cells = expected.flat();
  const small = cells.filter((e) => e < 5);
  if (small.length === 0) return undefined;
  const smallest = Math.min(...small);
  return {kind: 'small-expected', below: small.length, cells: cells.length, smallest, ...(alternative ? {alternative} : {})};
}
