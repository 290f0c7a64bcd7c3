import type {Dataset} from '../data/column.js';
import {evaluateWhere, parseWhere} from '../data/where/index.js';
import type {BlockSpec} from '../spec/block-spec.js';
import {UserError} from '../user-error.js';

/**
 * Rows a block keeps: all of them, or those passing its `where`. Errors in
 * the expression are moved from the expression's own columns onto the
 * report's line and column.
 */
export function selectRows(spec: BlockSpec, dataset: Dataset): Uint8Array {
  if (!spec.where) return new Uint8Array(dataset.rowCount).fill(1);
  const {source, place} = spec.where;
  try {
    return evaluateWhere(parseWhere(source), dataset);
  } catch (error) {
    if (!(error instanceof UserError)) throw error;
    // Exact for one-line expressions; a multi-line YAML value keeps the line.
    const inner = error.place ?? {line: 1, column: 1};
    const at = inner.line === 1 ? {line: place.line, column: place.column + inner.column - 1} : {line: place.line + inner.line - 1, column: inner.column};
    throw new UserError(`in \`where\`: ${error.message}`, {
      ruleId: error.ruleId,
      place: at,
      hint: error.hint ?? 'Write comparisons such as `age_days == 28 and site != "east"`; put text values in quotes.',
    });
  }
}
