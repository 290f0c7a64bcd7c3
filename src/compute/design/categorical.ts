import type {Dataset} from '../../data/column.js';
import {placeOfKey, type BlockSpec} from '../../spec/block-spec.js';
import {UserError} from '../../user-error.js';
import {column, labelReader, sortLevels} from './columns.js';
import {groupLevels} from './group-levels.js';
import type {Prepared} from './numeric.js';

/**
 * Categorical outcomes become counts: a y × by table, a paired 2×2 table,
 * counts per level, or successes out of trials. Levels of `y` are sorted;
 * levels of `by` follow `levels` when declared.
 */
export function prepareContingency(spec: BlockSpec, dataset: Dataset, keep: Uint8Array, excludedFilter: number): Prepared {
  const y = labelReader(column(spec, 'y', spec.y as string, dataset));
  const byColumn = column(spec, 'by', spec.by!, dataset);
  const {levels: columns, labelOf: byOf} = groupLevels(spec, byColumn, keep);
  const cells = new Map<string, number[]>();
  let missing = 0;
  let outside = 0;
  for (let row = 0; row < keep.length; row++) {
    if (!keep[row]) continue;
    const value = y(row);
    const group = byOf(row);
    if (value === null || group === null) missing++;
    else if (!columns.includes(group)) outside++;
    else {
      const counts = cells.get(value) ?? columns.map(() => 0);
      counts[columns.indexOf(group)]!++;
      cells.set(value, counts);
    }
  }
  const rows = sortLevels(cells.keys());
  requireSuccess(spec, rows);
  const counts = rows.map((level) => cells.get(level)!);
  const used = counts.flat().reduce((a, b) => a + b, 0);
  if (rows.length < 2) {
    throw new UserError(`\`${spec.y}\` has ${rows.length} level(s) in the rows used; \`${spec.method}\` needs at least two`, {
      ruleId: 'wrong-level-count',
      place: placeOfKey(spec, 'y'),
      hint: 'Check `where` and the outcome column.',
    });
  }
  return {
    design: {kind: 'contingency', rows, columns, counts, success: spec.success},
    rows: {used, excluded_missing: missing, excluded_filter: excludedFilter, excluded_levels: outside},
  };
}

export function preparePairedCategorical(spec: BlockSpec, dataset: Dataset, keep: Uint8Array, excludedFilter: number): Prepared {
  const [nameA, nameB] = spec.y as readonly [string, string];
  const a = labelReader(column(spec, 'y', nameA, dataset));
  const b = labelReader(column(spec, 'y', nameB, dataset));
  const pairs: [string, string][] = [];
  let missing = 0;
  for (let row = 0; row < keep.length; row++) {
    if (!keep[row]) continue;
    const first = a(row);
    const second = b(row);
    if (first === null || second === null) missing++;
    else pairs.push([first, second]);
  }
  const levels = sortLevels(new Set(pairs.flat()));
  if (levels.length !== 2) {
    throw new UserError(`\`${spec.method}\` needs both columns to share exactly two levels; found ${levels.length}: ${levels.map((l) => `"${l}"`).join(', ')}`, {
      ruleId: 'wrong-level-count',
      place: placeOfKey(spec, 'y'),
      hint: 'McNemar’s test compares two yes/no measurements of the same subjects.',
    });
  }
  const index = (level: string) => levels.indexOf(level);
  const table: [[number, number], [number, number]] = [[0, 0], [0, 0]];
  for (const [first, second] of pairs) table[index(first)]![index(second)]!++;
  return {
    design: {kind: 'paired-categorical', first: nameA, second: nameB, levels: [levels[0]!, levels[1]!], table},
    rows: {used: pairs.length, excluded_missing: missing, excluded_filter: excludedFilter, excluded_levels: 0},
  };
}

export function prepareCounts(spec: BlockSpec, dataset: Dataset, keep: Uint8Array, excludedFilter: number): Prepared {
  const y = labelReader(column(spec, 'y', spec.y as string, dataset));
  const tally = new Map<string, number>();
  let missing = 0;
  for (let row = 0; row < keep.length; row++) {
    if (!keep[row]) continue;
    const value = y(row);
    if (value === null) missing++;
    else tally.set(value, (tally.get(value) ?? 0) + 1);
  }
  const declared = spec.expected;
  if (declared) {
    const unknown = [...tally.keys()].filter((level) => !Object.hasOwn(declared, level));
    if (unknown.length > 0) {
      throw new UserError(`\`expected\` gives no proportion for level(s) ${unknown.map((l) => `"${l}"`).join(', ')} of \`${spec.y}\``, {
        ruleId: 'invalid-value',
        place: placeOfKey(spec, 'expected'),
        hint: 'List every level of y with its expected proportion.',
      });
    }
  }
  const levels = declared ? Object.keys(declared) : sortLevels(tally.keys());
  const counts = levels.map((level) => tally.get(level) ?? 0);
  const used = counts.reduce((a, b) => a + b, 0);
  return {
    design: {kind: 'counts', levels, counts, expected: declared ? levels.map((level) => declared[level]!) : undefined},
    rows: {used, excluded_missing: missing, excluded_filter: excludedFilter, excluded_levels: 0},
  };
}

export function prepareProportion(spec: BlockSpec, dataset: Dataset, keep: Uint8Array, excludedFilter: number): Prepared {
  const y = labelReader(column(spec, 'y', spec.y as string, dataset));
  const seen = new Set<string>();
  let successes = 0;
  let trials = 0;
  let missing = 0;
  for (let row = 0; row < keep.length; row++) {
    if (!keep[row]) continue;
    const value = y(row);
    if (value === null) missing++;
    else {
      seen.add(value);
      trials++;
      if (value === spec.success) successes++;
    }
  }
  requireSuccess(spec, sortLevels(seen));
  return {
    design: {kind: 'proportion', successes, trials, success: spec.success!},
    rows: {used: trials, excluded_missing: missing, excluded_filter: excludedFilter, excluded_levels: 0},
  };
}

function requireSuccess(spec: BlockSpec, levels: readonly string[]): void {
  if (spec.success === undefined || levels.includes(spec.success)) return;
  throw new UserError(`\`success: ${spec.success}\` is not a level of \`${spec.y}\``, {
    ruleId: 'unknown-level',
    place: placeOfKey(spec, 'success'),
    hint: `Levels present: ${levels.map((l) => `"${l}"`).join(', ') || 'none'}.`,
  });
}
