import {isNumericColumn, type Column, type Dataset, type NumericColumn} from '../../data/column.js';
import {placeOfKey, type BlockSpec} from '../../spec/block-spec.js';
import {didYouMean} from '../../spec/suggest.js';
import {UserError} from '../../user-error.js';

/** A column named by one of the block's keys, or a positioned error. */
export function column(spec: BlockSpec, key: string, name: string, dataset: Dataset): Column {
  const found = dataset.columns.get(name);
  if (found) return found;
  throw new UserError(`column \`${name}\` not found in dataset \`${dataset.name}\``, {
    ruleId: 'unknown-column',
    place: placeOfKey(spec, key),
    hint: didYouMean(name, dataset.columns.keys(), `Columns are: ${[...dataset.columns.keys()].join(', ')}.`),
  });
}

export function numericColumn(spec: BlockSpec, key: string, name: string, dataset: Dataset): NumericColumn {
  const found = column(spec, key, name, dataset);
  if (isNumericColumn(found)) return found;
  const row = found.values.findIndex((value) => value !== null && !Number.isFinite(Number(value)));
  const example = row >= 0 ? ` (row ${row + 1} has "${found.values[row]}")` : '';
  throw new UserError(`column \`${name}\` must be numeric for \`${spec.method}\` but holds text${example}`, {
    ruleId: 'column-not-numeric',
    place: placeOfKey(spec, key),
    hint: 'Fix the cell, add its marker to the dataset\'s `missing`, or check `decimal`.',
  });
}

/** The cell of a categorical reading as text (numbers as written), or null when missing. */
export function labelReader(column: Column): (row: number) => string | null {
  if (column.kind === 'string') return (row) => column.values[row] ?? null;
  return (row) => (column.missing[row] ? null : String(column.values[row]));
}

/** Levels sorted naturally (`2` before `10`), so reference levels do not depend on row order. */
export function sortLevels(levels: Iterable<string>): string[] {
  return [...levels].sort((a, b) => a.localeCompare(b, 'en', {numeric: true}));
}

export function countExcluded(keep: Uint8Array): number {
  return keep.reduce((count, pass) => count + (pass ? 0 : 1), 0);
}
