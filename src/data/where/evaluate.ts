import type {Column, Dataset} from '../column.js';
import {parseDecimal} from '../parse-decimal.js';
import type {ComparisonOperator, InNode, LiteralOperand, Operand, Span, WhereExpression, WhereNode} from './ast.js';
import {unknownColumnHint, whyText, writtenName} from './column-hint.js';
import {WhereError} from './where-error.js';

/** Truth values per row, SQL style: a comparison that reads a missing cell is unknown. */
const FALSE = 0;
const TRUE = 1;
const UNKNOWN = 2;

/**
 * The rows of `dataset` that pass `expression`: 1 where the row is kept.
 *
 * Missing never satisfies a comparison: a comparison that reads a missing
 * cell is *unknown* (SQL's three-valued logic), and only rows whose whole
 * expression is true pass. So neither `x > 3` nor `x != 3` nor `not (x > 3)`
 * keeps a row where `x` is missing, while `x > 3 or site == "a"` keeps it
 * when `site` is "a" (Kleene logic: true or unknown is true).
 *
 * Type rules: numbers compare with numbers, text with text (ordering of text
 * is by UTF-16 code units, so ISO dates order correctly, but not by locale);
 * `true`/`false` equal 1/0 in numeric columns and the cell texts
 * true/false (any case) in text columns, and cannot be ordered. Anything
 * else, and any unknown column, is a `WhereError` placed in the expression.
 */
export function evaluateWhere(expression: WhereExpression, dataset: Dataset): Uint8Array {
  const evaluator = new Evaluator(expression.source, dataset);
  const truth = evaluator.node(expression.root);
  const mask = new Uint8Array(dataset.rowCount);
  for (let i = 0; i < mask.length; i++) mask[i] = truth[i] === TRUE ? 1 : 0;
  return mask;
}

type Kind = 'number' | 'string' | 'boolean';

/** One side of a comparison: its type and its value in a row (undefined when missing). */
interface Side {
  readonly kind: Kind;
  readonly operand: Operand;
  readonly column: Column | undefined;
  at(row: number): number | string | boolean | undefined;
}

class Evaluator {
  private readonly rows: number;

  constructor(
    private readonly source: string,
    private readonly dataset: Dataset,
  ) {
    this.rows = dataset.rowCount;
  }

  node(node: WhereNode): Uint8Array {
    switch (node.kind) {
      case 'compare':
        return this.compare(this.side(node.left), node.operator, this.side(node.right), node.operatorSpan);
      case 'in':
        return this.in(node);
      case 'not': {
        const inner = this.node(node.operand);
        return inner.map((t) => (t === TRUE ? FALSE : t === FALSE ? TRUE : UNKNOWN));
      }
      case 'and':
      case 'or': {
        const left = this.node(node.left);
        const right = this.node(node.right);
        const [dominant, other] = node.kind === 'and' ? [FALSE, TRUE] : [TRUE, FALSE];
        return left.map((l, i) => {
          const r = right[i];
          if (l === dominant || r === dominant) return dominant;
          return l === other && r === other ? other : UNKNOWN;
        });
      }
    }
  }

  private in(node: InNode): Uint8Array {
    const subject = this.side(node.subject);
    const result = new Uint8Array(this.rows).fill(FALSE);
    for (const item of node.items) {
      const hit = this.compare(subject, '==', this.side(item), item);
      for (let i = 0; i < this.rows; i++) {
        if (hit[i] === TRUE) result[i] = TRUE;
        else if (hit[i] === UNKNOWN && result[i] !== TRUE) result[i] = UNKNOWN;
      }
    }
    if (node.negated) return result.map((t) => (t === TRUE ? FALSE : t === FALSE ? TRUE : UNKNOWN));
    return result;
  }

  private side(operand: Operand): Side {
    if (operand.kind === 'literal') {
      const value = operand.value;
      return {kind: typeof value as Kind, operand, column: undefined, at: () => value};
    }
    const column = this.dataset.columns.get(operand.name);
    if (column === undefined) {
      throw this.error(`unknown column ${writtenName(operand.name)}`, operand, 'unknown-column', unknownColumnHint(operand.name, this.dataset));
    }
    if (column.kind === 'number') {
      const {values, missing} = column;
      return {kind: 'number', operand, column, at: (row) => (missing[row] === 1 ? undefined : values[row])};
    }
    const {values} = column;
    return {kind: 'string', operand, column, at: (row) => values[row] ?? undefined};
  }

  private compare(left: Side, operator: ComparisonOperator, right: Side, operatorSpan: Span): Uint8Array {
    const [a, b] = this.comparable(left, operator, right, operatorSpan);
    const test = TESTS[operator];
    const result = new Uint8Array(this.rows);
    for (let i = 0; i < this.rows; i++) {
      const x = a(i);
      const y = b(i);
      result[i] = x === undefined || y === undefined ? UNKNOWN : test(x, y) ? TRUE : FALSE;
    }
    return result;
  }

  /** Row accessors of the two sides in a common type, or the type error. */
  private comparable(left: Side, operator: ComparisonOperator, right: Side, operatorSpan: Span): [Access, Access] {
    if (left.kind === right.kind && (left.kind !== 'boolean' || isEquality(operator))) {
      return [left.at, right.at] as [Access, Access];
    }
    const boolean = left.kind === 'boolean' ? left : right.kind === 'boolean' ? right : undefined;
    const other = boolean === left ? right : left;
    if (boolean !== undefined) {
      if (!isEquality(operator)) {
        throw this.error(`true and false cannot be compared with ${operator}`, operatorSpan, 'where-type', 'use == or != with true and false');
      }
      if (other.column !== undefined) {
        const asNumber = (side: Side): Access => (row) => toTruth(side.at(row));
        return [asNumber(left), asNumber(right)];
      }
    }
    throw this.mismatch(left, operator, right, operatorSpan);
  }

  private mismatch(left: Side, operator: ComparisonOperator, right: Side, operatorSpan: Span): WhereError {
    const literal = left.column === undefined ? left : right.column === undefined ? right : undefined;
    const column = literal === left ? right : left;
    const text = (side: Side): string => this.source.slice(side.operand.offset, side.operand.offset + side.operand.length);
    if (literal === undefined || column.column === undefined) {
      const describe = (side: Side): string => `${side.column === undefined ? '' : 'column '}${text(side)} (${side.kind === 'string' ? 'text' : side.kind})`;
      return this.error(`cannot compare ${describe(left)} with ${describe(right)}`, operatorSpan, 'where-type',
        'compare numbers with numbers and text with text');
    }
    const name = writtenName(column.column.name);
    if (column.column.kind === 'number') {
      const value = (literal.operand as LiteralOperand).value;
      const numeric = typeof value === 'string' && parseDecimal(value.trim(), '.') !== undefined;
      return this.error(`column ${name} holds numbers but ${text(literal)} is ${literal.kind === 'string' ? 'text' : 'a ' + literal.kind}`, literal.operand, 'where-type',
        numeric ? `remove the quotes: ${value.trim()}` : `compare ${name} with a number, e.g. ${name} > 0`);
    }
    const why = whyText(column.column);
    const message = `column ${name} holds text but ${text(literal)} is a number`;
    if (isEquality(operator)) {
      const quote = `quote the value, e.g. ${name} == "${text(literal)}"`;
      return this.error(message, literal.operand, 'where-type', why === undefined ? quote : `${quote}; ${why}`);
    }
    return this.error(message, literal.operand, 'where-type', why === undefined
      ? `compare ${name} with text, e.g. ${name} == ${JSON.stringify(column.column.values.find((v) => v !== null) ?? 'a')}`
      : `${why}; ordering needs a numeric column: correct that cell, or add it to the dataset's missing markers`);
  }

  private error(message: string, span: Span, ruleId: string, hint?: string): WhereError {
    return new WhereError(message, this.source, span.offset, span.length, ruleId, hint);
  }
}

type Access = (row: number) => number | string | undefined;

function isEquality(operator: ComparisonOperator): boolean {
  return operator === '==' || operator === '!=';
}

/** Booleans, 1/0 and the texts true/false (any case) as 1/0; other text as -1 (equal to neither). */
function toTruth(value: number | string | boolean | undefined): number | undefined {
  if (value === undefined || typeof value === 'number') return value;
  if (typeof value === 'boolean') return value ? 1 : 0;
  const lower = value.toLowerCase();
  return lower === 'true' ? 1 : lower === 'false' ? 0 : -1;
}

const TESTS: Readonly<Record<ComparisonOperator, (x: number | string, y: number | string) => boolean>> = {
  '==': (x, y) => x === y,
  '!=': (x, y) => x !== y,
  '<': (x, y) => x < y,
  '<=': (x, y) => x <= y,
  '>': (x, y) => x > y,
  '>=': (x, y) => x >= y,
};
