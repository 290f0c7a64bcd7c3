import type {ComparisonOperator, LiteralOperand, Operand, WhereExpression, WhereNode} from './ast.js';
import {tokenize, type Token, type TokenKind} from './tokenize.js';
import {WhereError} from './where-error.js';

/**
 * Parse a `where` row filter into a syntax tree, by recursive descent over
 * this grammar (loosest binding first):
 *
 *   expression := and ( ("or" | "||") and )*
 *   and        := not ( ("and" | "&&") not )*
 *   not        := ("not" | "!") not | primary
 *   primary    := "(" expression ")" | operand comparison
 *   comparison := ("==" | "!=" | "<" | "<=" | ">" | ">=") operand
 *               | "not"? "in" "[" literal ("," literal)* "]"
 *   operand    := column | literal
 *   literal    := number | "string" | 'string' | true | false
 *   column     := [a-zA-Z_][a-zA-Z0-9_.]* | `any text`
 *
 * So `not a == 1 or b == 2 and c == 3` is `(not (a == 1)) or ((b == 2) and (c == 3))`.
 * Nothing here executes code; the tree is interpreted by `evaluateWhere`.
 * Errors are `WhereError`s placed within `source`.
 */
export function parseWhere(source: string): WhereExpression {
  const parser = new Parser(source, tokenize(source));
  if (parser.peek().kind === 'end') {
    parser.fail(parser.peek(), 'the where expression is empty', 'write a condition, e.g. site == "east"');
  }
  const root = parser.expression();
  const extra = parser.peek();
  if (extra.kind !== 'end') parser.unexpected(extra, 'expected "and", "or" or the end of the expression');
  return {source, root};
}

const COMPARISONS: ReadonlySet<TokenKind> = new Set(['==', '!=', '<', '<=', '>', '>=']);

class Parser {
  private index = 0;

  constructor(
    private readonly source: string,
    private readonly tokens: readonly Token[],
  ) {}

  peek(ahead = 0): Token {
    // tokenize always ends with an `end` token; never read past it.
    return this.tokens[Math.min(this.index + ahead, this.tokens.length - 1)] as Token;
  }

  private next(): Token {
    const token = this.peek();
    if (token.kind !== 'end') this.index += 1;
    return token;
  }

  expression(): WhereNode {
    let left = this.and();
    while (this.peek().kind === 'or') {
      this.next();
      left = {kind: 'or', left, right: this.and()};
    }
    return left;
  }

  private and(): WhereNode {
    let left = this.not();
    while (this.peek().kind === 'and') {
      this.next();
      left = {kind: 'and', left, right: this.not()};
    }
    return left;
  }

  private not(): WhereNode {
    if (this.peek().kind === 'not') {
      this.next();
      return {kind: 'not', operand: this.not()};
    }
    return this.primary();
  }

  private primary(): WhereNode {
    const open = this.peek();
    if (open.kind === '(') {
      this.next();
      const inner = this.expression();
      const close = this.peek();
      if (close.kind !== ')') {
        this.unexpected(close, `expected ) to close the ( at column ${open.offset + 1}`);
      }
      this.next();
      return inner;
    }
    return this.comparison(this.operand());
  }

  private comparison(left: Operand): WhereNode {
    const token = this.peek();
    let node: WhereNode;
    if (COMPARISONS.has(token.kind)) {
      this.next();
      node = {kind: 'compare', operator: token.kind as ComparisonOperator, operatorSpan: span(token), left, right: this.operand()};
    } else if (token.kind === 'in' || (token.kind === 'not' && this.peek(1).kind === 'in')) {
      const negated = token.kind === 'not';
      this.next();
      if (negated) this.next();
      node = {kind: 'in', negated, subject: left, items: this.list()};
    } else {
      return this.missingComparison(left, token);
    }
    const after = this.peek();
    if (COMPARISONS.has(after.kind)) {
      this.fail(after, 'comparisons cannot be chained', 'join them with and, e.g. 1 < x and x < 5');
    }
    return node;
  }

  private operand(): Operand {
    const token = this.peek();
    if (token.kind === 'identifier') {
      this.next();
      return {kind: 'column', name: String(token.value), ...span(token)};
    }
    const literal = this.literalOrUndefined();
    if (literal !== undefined) return literal;
    return this.unexpected(token, 'expected a column name or a value');
  }

  private literalOrUndefined(): LiteralOperand | undefined {
    const token = this.peek();
    const value =
      token.kind === 'number' || token.kind === 'string' ? token.value
      : token.kind === 'true' ? true
      : token.kind === 'false' ? false
      : undefined;
    if (value === undefined) return undefined;
    this.next();
    return {kind: 'literal', value, ...span(token)};
  }

  private list(): LiteralOperand[] {
    const open = this.peek();
    if (open.kind !== '[') this.unexpected(open, 'expected [ to start the list after in', 'e.g. site in ["east", "west"]');
    this.next();
    const items: LiteralOperand[] = [];
    for (;;) {
      const token = this.peek();
      if (token.kind === ']' && items.length === 0) this.fail(token, 'the list is empty', 'list at least one value');
      const item = this.literalOrUndefined();
      if (item === undefined) {
        const hint = token.kind === 'identifier' ? `lists hold values only; quote text: ["${String(token.value)}"]` : undefined;
        this.unexpected(token, 'expected a value in the list', hint);
      }
      items.push(item as LiteralOperand);
      const separator = this.next();
      if (separator.kind === ']') return items;
      if (separator.kind !== ',') this.unexpected(separator, 'expected , or ] in the list');
    }
  }

  private missingComparison(left: Operand, token: Token): never {
    const name = left.kind === 'column' ? left.name : this.source.slice(left.offset, left.offset + left.length);
    const hint =
      keywordCaseHint(this.source.slice(token.offset, token.offset + token.length)) ??
      (left.kind === 'column' && token.kind === 'identifier'
        ? `a name with spaces goes in backticks: \`${this.source.slice(left.offset, token.offset + token.length)}\``
        : `compare it, e.g. ${name} == 1, ${name} != "a" or ${name} in [1, 2]`);
    return this.unexpected(token, `expected a comparison after ${name}`, hint);
  }

  unexpected(token: Token, expected: string, hint?: string): never {
    const text = this.source.slice(token.offset, token.offset + token.length);
    const found = token.kind === 'end' ? 'the end of the expression' : JSON.stringify(text);
    return this.fail(token, `${expected}, found ${found}`, hint ?? keywordCaseHint(text));
  }

  fail(token: Token, message: string, hint?: string): never {
    throw new WhereError(message, this.source, token.offset, token.length, 'where-syntax', hint);
  }
}

function span(token: Token): {offset: number; length: number} {
  return {offset: token.offset, length: token.length};
}

/** `AND`, `Or`, … are column names to the tokenizer; say what was probably meant. */
function keywordCaseHint(text: string): string | undefined {
  const lower = text.toLowerCase();
  return text !== lower && ['and', 'or', 'not', 'in', 'true', 'false'].includes(lower)
    ? `keywords are lowercase: ${lower}`
    : undefined;
}
