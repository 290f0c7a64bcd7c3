import {referencePattern} from '../render/resolve-references.js';

/** The fields of a block a reader sees in its sentence and tables. */
const shownFields: readonly (readonly string[])[] = [
  ['decision'],
  ['p'],
  ['p_adjusted'],
  ['statistic', 'value'],
  ['estimate', 'value'],
  ['estimate', 'ci'],
  ['effect', 'value'],
  ['effect', 'ci'],
];

export interface ChangedValue {
  readonly block: string;
  /** Dotted path in the block's record, e.g. `estimate.ci`. */
  readonly field: string;
  readonly before: unknown;
  readonly after: unknown;
}

export interface ResultsDocument {
  readonly blocks?: Readonly<Record<string, Record<string, unknown>>>;
}

/**
 * Values that differ between two builds' `NAME.results.json`, limited to
 * what a reader sees: the shown fields of each block and every field the
 * prose names with `{{id.path}}`. Blocks added or removed are not values
 * and are left to the caller.
 */
export function changedValues(before: ResultsDocument, after: ResultsDocument, prose: string): ChangedValue[] {
  const fields = new Map<string, Set<string>>();
  const add = (block: string, path: readonly string[]) => {
    if (!fields.has(block)) fields.set(block, new Set());
    fields.get(block)!.add(path.join('.'));
  };
  for (const block of Object.keys(after.blocks ?? {})) for (const path of shownFields) add(block, path);
  for (const match of prose.matchAll(referencePattern)) {
    const [, id, dotted] = match;
    if (id && dotted) add(id, dotted.slice(1).split('.'));
  }
  const changes: ChangedValue[] = [];
  for (const [block, paths] of fields) {
    const old = before.blocks?.[block];
    const now = after.blocks?.[block];
    if (!old || !now) continue;
    for (const field of paths) {
      const [a, b] = [lookup(old, field), lookup(now, field)];
      if (!sameValue(a, b)) changes.push({block, field, before: a, after: b});
    }
  }
  return changes;
}

function lookup(record: unknown, dotted: string): unknown {
  let value = record;
  for (const key of dotted.split('.')) {
    if (value === null || typeof value !== 'object' || !Object.hasOwn(value, key)) return undefined;
    value = (value as Record<string, unknown>)[key];
  }
  return value;
}

function sameValue(a: unknown, b: unknown): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}
