import {isMissing, type Dataset} from '../data/column.js';
import {selectRows} from '../resolve/select-rows.js';
import type {BlockSpec} from '../spec/block-spec.js';

/**
 * Missing cells per analysed column (outcome, grouping, predictors) among
 * the rows the block's `where` kept; columns with none are left out. It says
 * which column caused `rows.excluded_missing` (a row missing in two columns
 * counts once there and once in each column here).
 */
export function missingCells(spec: BlockSpec, dataset: Dataset): Record<string, number> {
  const keep = selectRows(spec, dataset);
  const names = [...(typeof spec.y === 'string' ? [spec.y] : spec.y), ...(spec.by === undefined ? [] : [spec.by]), ...(spec.x ?? [])];
  const counts: Record<string, number> = {};
  for (const name of new Set(names)) {
    const column = dataset.columns.get(name);
    if (!column) continue;
    let missing = 0;
    for (let row = 0; row < keep.length; row++) if (keep[row] && isMissing(column, row)) missing++;
    if (missing > 0) counts[name] = missing;
  }
  return counts;
}
