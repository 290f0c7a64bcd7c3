import {createHash} from 'node:crypto';
import type {BlockSpec} from './block-spec.js';
import type {AdjustMethod} from './parse-settings.js';

/**
 * Fingerprints of a normalized block, at three depths:
 *
 * - `planFields`: what defines the hypothesis (the plan a lock records);
 * - `specificationFields`: the plan plus every choice that changes a p-value
 *   or an interval (one "specification" of the ledger);
 * - `blockSpecHash`: everything, presentation included (what `check` compares).
 *
 * Positions are never part of a fingerprint: moving a block is not changing it.
 */
export type PlanFields = Readonly<Record<string, unknown>>;

export function planFields(spec: BlockSpec, adjust: AdjustMethod): PlanFields {
  return withoutUndefined({
    method: spec.method,
    data: spec.data,
    y: spec.y,
    by: spec.by,
    x: spec.x,
    levels: spec.levels,
    where: spec.where?.source.trim(),
    mu: spec.mu,
    success: spec.success,
    expected: spec.expected,
    alternative: spec.alternative,
    alpha: spec.alpha,
    family: spec.family,
    // The document's adjustment only touches blocks in a family.
    adjust: spec.family === undefined ? undefined : adjust,
    'smallest-effect': spec.smallestEffect,
  });
}

export function specificationFields(spec: BlockSpec, adjust: AdjustMethod): PlanFields {
  return withoutUndefined({
    ...planFields(spec, adjust),
    confidence: spec.confidence,
    posthoc: spec.posthoc,
    correction: spec.correction,
    intercept: spec.intercept,
  });
}

export function planHash(spec: BlockSpec, adjust: AdjustMethod): string {
  return sha256(canonicalJson(planFields(spec, adjust)));
}

export function specificationHash(spec: BlockSpec, adjust: AdjustMethod): string {
  return sha256(canonicalJson(specificationFields(spec, adjust)));
}

export function blockSpecHash(spec: BlockSpec, adjust: AdjustMethod): string {
  const fields = {...specificationFields(spec, adjust), chart: spec.chart, show: [...spec.show].sort(), caption: spec.caption};
  return sha256(canonicalJson(withoutUndefined(fields)));
}

/** JSON with object keys sorted at every depth: equal values, equal text. */
export function canonicalJson(value: unknown, indent?: number): string {
  return JSON.stringify(value, (_key, inner: unknown) =>
    inner && typeof inner === 'object' && !Array.isArray(inner)
      ? Object.fromEntries(Object.entries(inner).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)))
      : inner,
  indent);
}

export function sha256(content: string | Uint8Array): string {
  return createHash('sha256').update(content).digest('hex');
}

function withoutUndefined(record: Record<string, unknown>): Record<string, unknown> {
  return Object.fromEntries(Object.entries(record).filter(([, value]) => value !== undefined));
}
