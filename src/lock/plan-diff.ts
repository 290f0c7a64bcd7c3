import type {BlockSpec} from '../spec/block-spec.js';
import type {AdjustMethod} from '../spec/parse-settings.js';
import {canonicalJson, planFields, planHash, type PlanFields} from '../spec/spec-fingerprint.js';
import {isPlanned, type LockFile} from './lock-file.js';

/**
 * Differences between a lock and the report's current blocks, one line
 * each, field by field: `supplier: alpha 0.05 → 0.1`.
 */
export function planDifferences(lock: LockFile, specs: readonly BlockSpec[], adjust: AdjustMethod): string[] {
  const lines: string[] = [];
  const current = new Map(specs.filter(isPlanned).map((spec) => [spec.id, spec]));
  for (const [id, spec] of current) {
    const locked = lock.blocks[id];
    if (!locked) {
      lines.push(`${id}: not in the lock (added since)`);
      continue;
    }
    if (locked.hash === planHash(spec, adjust)) continue;
    lines.push(...fieldChanges(locked.plan, planFields(spec, adjust)).map((change) => `${id}: ${change}`));
  }
  for (const id of Object.keys(lock.blocks).sort()) {
    if (!current.has(id)) lines.push(`${id}: in the lock but no longer in the report`);
  }
  return lines;
}

function fieldChanges(before: PlanFields, after: PlanFields): string[] {
  const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort();
  return keys
    .filter((key) => canonicalJson(before[key]) !== canonicalJson(after[key]))
    .map((key) => `${key} ${show(before[key])} → ${show(after[key])}`);
}

/** A field's value as an author wrote it. */
export function show(value: unknown): string {
  if (value === undefined) return '(none)';
  if (Array.isArray(value)) return `[${value.map(show).join(', ')}]`;
  if (value && typeof value === 'object') return `{${Object.entries(value).map(([k, v]) => `${k}: ${show(v)}`).join(', ')}}`;
  return String(value);
}
