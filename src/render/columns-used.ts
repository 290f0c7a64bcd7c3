import {parseWhere, whereColumns} from '../data/where/index.js';
import type {BlockSpec} from '../spec/block-spec.js';

/** Columns a block reads: outcome, grouping, predictors and those its `where` names. */
export function columnsUsed(spec: BlockSpec): string[] {
  const names = [...(typeof spec.y === 'string' ? [spec.y] : spec.y), ...(spec.by === undefined ? [] : [spec.by]), ...(spec.x ?? [])];
  // The block computed, so its `where` parses.
  if (spec.where) names.push(...whereColumns(parseWhere(spec.where.source)));
  return names;
}
