import type {Dataset, NumericColumn} from '../../data/column.js';
import type {Design, Sample} from '../../methods/types.js';
import {placeOfKey, type BlockSpec} from '../../spec/block-spec.js';
import {UserError} from '../../user-error.js';
import type {RowAccount} from '../block-result.js';
import {column, numericColumn} from './columns.js';
import {groupLevels} from './group-levels.js';

/**
 * Numeric outcomes: one sample, groups of `by`, or two row-aligned columns.
 * Rows with a missing outcome (or group) are left out and counted.
 */
export interface Prepared {
  readonly design: Design;
  readonly rows: RowAccount;
}

export function prepareGroups(
  spec: BlockSpec,
  kind: 'none' | 'one-sample' | 'two-group' | 'k-group',
  dataset: Dataset,
  keep: Uint8Array,
  excludedFilter: number,
): Prepared {
  const y = numericColumn(spec, 'y', spec.y as string, dataset);
  const by = spec.by === undefined ? undefined : column(spec, 'by', spec.by, dataset);
  const {samples, rows} = splitByGroup(spec, y, by, keep, excludedFilter);
  if (kind === 'two-group' && samples.length !== 2) {
    const found = samples.map((s) => `"${s.label}"`).join(', ');
    throw new UserError(`\`${spec.method}\` compares two groups but \`${spec.by}\` has ${samples.length} level(s): ${found}`, {
      ruleId: 'wrong-level-count',
      place: placeOfKey(spec, spec.levels ? 'levels' : 'by'),
      hint: samples.length > 2 ? 'Pick two with `levels: [a, b]`, or use a k-group test.' : 'Check `where` and the grouping column.',
    });
  }
  if (kind === 'k-group' && samples.length < 2) {
    throw new UserError(`\`${spec.method}\` compares groups but \`${spec.by}\` has ${samples.length} level(s) after \`where\``, {
      ruleId: 'wrong-level-count',
      place: placeOfKey(spec, 'by'),
      hint: 'Check `where` and the grouping column.',
    });
  }
  requireSize(spec, samples, kind === 'none' ? 1 : 2);
  if (kind === 'two-group') return {design: {kind, first: samples[0]!, second: samples[1]!}, rows};
  if (kind === 'one-sample') return {design: {kind, sample: samples[0]!}, rows};
  if (kind === 'k-group') return {design: {kind, samples}, rows};
  return {design: {kind: 'none', samples}, rows};
}

export function preparePaired(spec: BlockSpec, dataset: Dataset, keep: Uint8Array, excludedFilter: number): Prepared {
  const [nameA, nameB] = spec.y as readonly [string, string];
  const a = numericColumn(spec, 'y', nameA, dataset);
  const b = numericColumn(spec, 'y', nameB, dataset);
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

function splitByGroup(spec: BlockSpec, y: NumericColumn, by: ReturnType<typeof column> | undefined, keep: Uint8Array, excludedFilter: number) {
  const {levels, labelOf} = groupLevels(spec, by, keep);
  const buckets = new Map<string, number[]>(levels.map((level) => [level, []]));
  let missing = 0;
  let outside = 0;
  for (let row = 0; row < keep.length; row++) {
    if (!keep[row]) continue;
    const label = labelOf(row);
    if (y.missing[row] || label === null) missing++;
    else if (!buckets.has(label)) outside++;
    else buckets.get(label)!.push(row);
  }
  const samples: Sample[] = levels.map((level) => {
    const rows = buckets.get(level)!;
    return {label: level, values: Float64Array.from(rows, (r) => y.values[r]!), centred: Float64Array.from(rows, (r) => y.centred[r]!)};
  });
  const used = samples.reduce((total, s) => total + s.values.length, 0);
  return {samples, rows: {used, excluded_missing: missing, excluded_filter: excludedFilter, excluded_levels: outside}};
}

export function requireSize(spec: BlockSpec, samples: readonly Sample[], minimum: number): void {
  for (const sample of samples) {
    if (sample.values.length >= minimum) continue;
    const which = samples.length > 1 || sample.label !== 'all' ? ` in "${sample.label}"` : '';
    throw new UserError(
      `\`${spec.id}\` has ${sample.values.length} usable observation(s)${which}; ${spec.method} needs at least ${minimum}`,
      {ruleId: 'too-few-observations', place: spec.place, hint: 'Check `where`, the levels and missing values in the data.'},
    );
  }
}
