import {isNumericColumn, type Column, type Dataset, type NumericColumn} from '../data/column.js';
import type {Design, DesignKind, Sample} from '../methods/types.js';
import {placeOfKey, type BlockSpec} from '../spec/block-spec.js';
import {didYouMean} from '../spec/suggest.js';
import {UserError} from '../user-error.js';
import type {RowAccount} from './block-result.js';
import {groupLevels} from './group-levels.js';

/**
 * Turn a block and its (filtered) dataset into the shape its method reads:
 * pick columns, drop rows with missing values, split by group, and account
 * for every row left out.
 */
export interface PreparedDesign {
  readonly design: Design;
  readonly rows: RowAccount;
}

/** @param keep Rows that passed `where` (1) or not (0). */
export function prepareDesign(spec: BlockSpec, kind: DesignKind, dataset: Dataset, keep: Uint8Array): PreparedDesign {
  const excludedFilter = keep.reduce((count, pass) => count + (pass ? 0 : 1), 0);
  if (kind === 'paired') {
    const [a, b] = spec.y as readonly [string, string];
    return preparePaired(spec, numericColumn(spec, 'y', a, dataset), numericColumn(spec, 'y', b, dataset), keep, excludedFilter);
  }
  const y = numericColumn(spec, 'y', spec.y as string, dataset);
  const by = spec.by === undefined ? undefined : column(spec, 'by', spec.by, dataset);
  const {samples, rows} = splitByGroup(spec, y, by, keep, excludedFilter);
  if (kind === 'two-group') {
    if (samples.length !== 2) {
      const found = samples.map((s) => `"${s.label}"`).join(', ');
      throw new UserError(`\`${spec.method}\` compares two groups but \`${spec.by}\` has ${samples.length} level(s): ${found}`, {
        ruleId: 'wrong-level-count',
        place: placeOfKey(spec, spec.levels ? 'levels' : 'by'),
        hint: samples.length > 2 ? 'Pick two with `levels: [a, b]`, or use a k-group test.' : 'Check `where` and the grouping column.',
      });
    }
    requireSize(spec, samples, 2);
    return {design: {kind, first: samples[0]!, second: samples[1]!}, rows};
  }
  if (kind === 'one-sample') {
    requireSize(spec, samples, 2);
    return {design: {kind, sample: samples[0]!}, rows};
  }
  requireSize(spec, samples, 1);
  return {design: {kind: 'none', samples}, rows};
}

function preparePaired(spec: BlockSpec, a: NumericColumn, b: NumericColumn, keep: Uint8Array, excludedFilter: number): PreparedDesign {
  const first: number[] = [];
  const second: number[] = [];
  let missing = 0;
  for (let row = 0; row < keep.length; row++) {
    if (!keep[row]) continue;
    if (a.missing[row] || b.missing[row]) missing++;
    else {
      first.push(a.values[row]!);
      second.push(b.values[row]!);
    }
  }
  const samples = [
    {label: a.name, values: Float64Array.from(first)},
    {label: b.name, values: Float64Array.from(second)},
  ];
  requireSize(spec, samples, 2);
  return {
    design: {kind: 'paired', first: samples[0]!, second: samples[1]!},
    rows: {used: first.length, excluded_missing: missing, excluded_filter: excludedFilter, excluded_levels: 0},
  };
}

function splitByGroup(spec: BlockSpec, y: NumericColumn, by: Column | undefined, keep: Uint8Array, excludedFilter: number) {
  const {levels, labelOf} = groupLevels(spec, by, keep);
  const buckets = new Map<string, number[]>(levels.map((level) => [level, []]));
  let missing = 0;
  let outside = 0;
  for (let row = 0; row < keep.length; row++) {
    if (!keep[row]) continue;
    const label = labelOf(row);
    if (y.missing[row] || label === null) missing++;
    else if (!buckets.has(label)) outside++;
    else buckets.get(label)!.push(y.values[row]!);
  }
  const samples: Sample[] = levels.map((level) => ({label: level, values: Float64Array.from(buckets.get(level)!)}));
  const used = samples.reduce((total, s) => total + s.values.length, 0);
  return {samples, rows: {used, excluded_missing: missing, excluded_filter: excludedFilter, excluded_levels: outside}};
}

function requireSize(spec: BlockSpec, samples: readonly Sample[], minimum: number): void {
  for (const sample of samples) {
    if (sample.values.length >= minimum) continue;
    const which = samples.length > 1 || sample.label !== 'all' ? ` in "${sample.label}"` : '';
    throw new UserError(
      `\`${spec.id}\` has ${sample.values.length} usable observation(s)${which}; ${spec.method} needs at least ${minimum}`,
      {ruleId: 'too-few-observations', place: spec.place, hint: 'Check `where`, the levels and missing values in the data.'},
    );
  }
}

export function column(spec: BlockSpec, key: string, name: string, dataset: Dataset): Column {
  const found = dataset.columns.get(name);
  if (found) return found;
  throw new UserError(`column \`${name}\` not found in dataset \`${dataset.name}\``, {
    ruleId: 'unknown-column',
    place: placeOfKey(spec, key),
    hint: didYouMean(name, dataset.columns.keys(), `Columns are: ${[...dataset.columns.keys()].join(', ')}.`),
  });
}

function numericColumn(spec: BlockSpec, key: string, name: string, dataset: Dataset): NumericColumn {
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
