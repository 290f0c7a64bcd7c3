import {isScalar, isSeq, type Node} from 'yaml';
import {UserError} from '../user-error.js';
import type {PlacedYaml} from '../document/yaml-at.js';

/**
 * Typed readers for YAML values in the report, each failing with a
 * positioned error that names the key and what was expected.
 */
export interface ValueContext {
  readonly yaml: PlacedYaml;
  readonly key: string;
  readonly node: Node | null;
}

function fail(context: ValueContext, expected: string, hint?: string): never {
  throw new UserError(`\`${context.key}\` must be ${expected}`, {
    ruleId: 'invalid-value',
    place: context.yaml.placeOf(context.node),
    ...(hint === undefined ? {} : {hint}),
  });
}

export function readString(context: ValueContext): string {
  const {node} = context;
  if (isScalar(node) && (typeof node.value === 'string' || typeof node.value === 'number')) {
    return String(node.value);
  }
  return fail(context, 'a text value');
}

export interface NumberRule {
  readonly min: number;
  readonly max: number;
  /** Exclude the bounds themselves. */
  readonly open?: boolean;
  /** What a sensible value looks like, for the hint. */
  readonly hint: string;
}

export function readNumber(context: ValueContext, rule?: NumberRule): number {
  const {node} = context;
  const value = isScalar(node) ? node.value : undefined;
  if (typeof value !== 'number' || !Number.isFinite(value)) return fail(context, 'a number', rule?.hint ?? 'Write a plain number such as 30 or 0.5.');
  if (rule) {
    const inside = rule.open ? value > rule.min && value < rule.max : value >= rule.min && value <= rule.max;
    const bounds = rule.open ? `between ${rule.min} and ${rule.max} (exclusive)` : `from ${rule.min} to ${rule.max}`;
    if (!inside) return fail(context, `a number ${bounds}, not ${value}`, rule.hint);
  }
  return value;
}

/** Rules shared by the front matter and blocks. */
export const levelRules = {
  alpha: {min: 0, max: 1, open: true, hint: 'The significance level, fixed before the data: usually 0.05 or 0.01.'},
  confidence: {min: 0, max: 1, open: true, hint: 'The level of every confidence interval, e.g. 0.95.'},
} as const satisfies Record<string, NumberRule>;

export function readChoice<T extends string>(context: ValueContext, choices: readonly T[]): T {
  const value = readString(context);
  if ((choices as readonly string[]).includes(value)) return value as T;
  return fail(context, `one of ${choices.join(', ')}`, `Got "${value}".`);
}

export function readBoolean(context: ValueContext): boolean {
  const {node} = context;
  if (isScalar(node) && typeof node.value === 'boolean') return node.value;
  return fail(context, 'true or false');
}

/** A list of text values; a single value is accepted as a list of one. */
export function readStringList(context: ValueContext): string[] {
  const {node} = context;
  if (isSeq(node)) {
    return node.items.map((item) => readString({...context, node: item as Node}));
  }
  return [readString(context)];
}
