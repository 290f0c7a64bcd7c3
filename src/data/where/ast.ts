/**
 * The syntax tree of a `where` expression. Every node keeps its span in the
 * source text (0-based `offset`, `length`) so that errors found later, when the
 * dataset is known (unknown column, type mismatch), point at the exact text.
 */
export interface Span {
  readonly offset: number;
  readonly length: number;
}

export type LiteralValue = number | string | boolean;

export interface ColumnOperand extends Span {
  readonly kind: 'column';
  readonly name: string;
}

export interface LiteralOperand extends Span {
  readonly kind: 'literal';
  readonly value: LiteralValue;
}

export type Operand = ColumnOperand | LiteralOperand;

export type ComparisonOperator = '==' | '!=' | '<' | '<=' | '>' | '>=';

export interface ComparisonNode {
  readonly kind: 'compare';
  readonly operator: ComparisonOperator;
  /** Span of the operator token. */
  readonly operatorSpan: Span;
  readonly left: Operand;
  readonly right: Operand;
}

export interface InNode {
  readonly kind: 'in';
  /** `not in` */
  readonly negated: boolean;
  readonly subject: Operand;
  readonly items: readonly LiteralOperand[];
}

export interface NotNode {
  readonly kind: 'not';
  readonly operand: WhereNode;
}

export interface LogicalNode {
  readonly kind: 'and' | 'or';
  readonly left: WhereNode;
  readonly right: WhereNode;
}

export type WhereNode = ComparisonNode | InNode | NotNode | LogicalNode;

/** A parsed expression with the text it came from (needed to place later errors). */
export interface WhereExpression {
  readonly source: string;
  readonly root: WhereNode;
}
