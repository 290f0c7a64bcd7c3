import type {ContingencyDesign} from '../types.js';

/**
 * The row of a two-row table whose odds an odds ratio compares: the declared
 * `success` level, else the second level (`yes` after `no`, `1` after `0`),
 * which puts R's a·d / (b·c) orientation on the usual coding.
 */
export function eventRows(design: ContingencyDesign): {readonly event: number; readonly other: number} {
  if (design.rows.length !== 2) throw new Error(`eventRows: expected two rows, got ${design.rows.length}`);
  const declared = design.success === undefined ? -1 : design.rows.indexOf(design.success);
  if (design.success !== undefined && declared < 0) throw new Error(`eventRows: "${design.success}" is not a row level`);
  const event = declared >= 0 ? declared : 1;
  return {event, other: 1 - event};
}
