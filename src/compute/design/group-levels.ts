import type {Column} from '../../data/column.js';
import {placeOfKey, type BlockSpec} from '../../spec/block-spec.js';
import {UserError} from '../../user-error.js';
import {labelReader, sortLevels} from './columns.js';

/**
 * The groups of a block: the declared `levels` in their order, or every
 * level present in the kept rows, sorted (numbers numerically), so the
 * reference group does not depend on row order. No `by`: one group, `all`.
 */
export function groupLevels(spec: BlockSpec, by: Column | undefined, keep: Uint8Array) {
  if (by === undefined) return {levels: ['all'], labelOf: (_row: number): string | null => 'all'};
  const labelOf = labelReader(by);
  const present = new Set<string>();
  for (let row = 0; row < keep.length; row++) {
    const label = keep[row] ? labelOf(row) : null;
    if (label !== null) present.add(label);
  }
  if (!spec.levels) {
    return {levels: sortLevels(present), labelOf};
  }
  for (const level of spec.levels) {
    if (present.has(level)) continue;
    throw new UserError(`level "${level}" of \`${spec.by}\` has no rows`, {
      ruleId: 'unknown-level',
      place: placeOfKey(spec, 'levels'),
      hint: `Levels present after \`where\`: ${[...present].map((l) => `"${l}"`).join(', ') || 'none'}.`,
    });
  }
  return {levels: [...spec.levels], labelOf};
}
