import {blockNumbers} from '../interpret/block-numbers.js';
import {formatDf, formatPercent, type NumberFormat} from '../interpret/format-number.js';
import type {InterpretedBlock} from '../interpret/result-record.js';

/**
 * Text of `{{id.path}}`: one field of the block's result record (contract
 * §6), formatted as it would be in the sentence. p-values render with their
 * relation (`p = .010`, `p < .001`) so prose never reads `p = < .001`.
 * Statistic symbols come marked (`symbol-marks.ts`); the caller renders them.
 * Returns undefined when the path names no field.
 */
export function formatField(block: InterpretedBlock, path: readonly string[]): string | undefined {
  const {result, computed} = block;
  const numbers = blockNumbers(computed, result.p_adjusted ?? result.p);
  const {format} = numbers;
  const level = `${Math.round(computed.spec.confidence * 1000) / 10}%`;
  const [head, ...rest] = path;
  const value = lookup(result, path);
  if (value === undefined) return undefined;
  switch (head) {
    case 'p':
      return format.pClause(result.p!, result.p_adjusted == null ? result.alpha : undefined);
    case 'p_adjusted':
      return result.p_adjusted == null ? 'not adjusted' : format.pClause(result.p_adjusted, result.alpha, 'adjusted p');
    case 'alpha':
      return numbers.alpha;
    case 'decision':
      return result.decision === 'reject' ? 'reject the null hypothesis' : 'fail to reject the null hypothesis';
    case 'df':
      return Array.isArray(value) ? value.map((d: number) => formatDf(d, format)).join(', ') : formatDf(value as number, format);
    case 'statistic':
      if (rest.length === 0) return numbers.statistic;
      return typeof value === 'number' ? format.fixed(value, 2) : String(value);
    case 'estimate':
      if (rest.length === 0) return `${numbers.estimateText(result.estimate!.value)}, ${numbers.estimateCi}`;
      return formatLeaf(value, rest, numbers.estimateDecimals, format);
    case 'effect':
      if (rest.length === 0) return numbers.effect;
      return formatLeaf(value, rest, 2, format);
    case 'sensitivity':
      if (rest[0] === 'power_at_smallest_effect') return value === null ? 'not computed (no smallest-effect declared)' : formatPercent(value as number);
      if (rest[0] === 'min_detectable_effect_80') return numbers.withUnits(value as number);
      return undefined;
    case 'groups':
      return formatLeaf(value, rest, rest.at(-1) === 'n' ? 0 : numbers.summaryDecimals, format);
    case 'ci':
      return undefined;
    default:
      if (typeof value === 'number') return Number.isInteger(value) ? String(value) : format.fixed(value, numbers.summaryDecimals);
      if (typeof value === 'string') return value;
      if (head === 'level') return level;
      return undefined;
  }
}

function formatLeaf(value: unknown, path: readonly string[], decimals: number, format: NumberFormat): string | undefined {
  if (typeof value === 'number') return path.at(-1) === 'n' ? String(value) : format.fixed(value, decimals);
  if (typeof value === 'string') return value;
  if (Array.isArray(value) && value.length === 2 && value.every((v) => typeof v === 'number')) {
    return format.interval(value as [number, number], decimals);
  }
  return undefined;
}

function lookup(root: unknown, path: readonly string[]): unknown {
  let current: unknown = root;
  for (const key of path) {
    if (current === null || typeof current !== 'object' || !Object.hasOwn(current, key)) return undefined;
    current = (current as Record<string, unknown>)[key];
  }
  return current;
}
