import {WhereError} from './where-error.js';

export type TokenKind =
  | 'number' | 'string' | 'identifier'
  | 'and' | 'or' | 'not' | 'in' | 'true' | 'false'
  | '==' | '!=' | '<' | '<=' | '>' | '>='
  | '(' | ')' | '[' | ']' | ','
  | 'end';

export interface Token {
  readonly kind: TokenKind;
  /** Number value, string contents, or column name (backticks removed). */
  readonly value?: number | string;
  readonly offset: number;
  readonly length: number;
}

// Maps, not object literals: a column called `toString` must not find Object.prototype.
const KEYWORDS: ReadonlyMap<string, TokenKind> = new Map([
  ['and', 'and'], ['or', 'or'], ['not', 'not'], ['in', 'in'], ['true', 'true'], ['false', 'false'],
]);
const SYMBOLS: ReadonlyArray<readonly [string, TokenKind]> = [
  ['==', '=='], ['!=', '!='], ['<=', '<='], ['>=', '>='], ['&&', 'and'], ['||', 'or'],
  ['<', '<'], ['>', '>'], ['!', 'not'], ['(', '('], [')', ')'], ['[', '['], [']', ']'], [',', ','],
];
const IDENTIFIER = /[a-zA-Z_][a-zA-Z0-9_.]*/y;
/** Decimal literal; a leading `-` belongs to it since the language has no arithmetic. */
const NUMBER = /-?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/y;
const WORD_CHAR = /[\p{L}\p{N}_.]/u;

/**
 * Split a `where` expression into tokens. Every mistake is a `WhereError`
 * at the offending character; nothing else is ever thrown.
 */
export function tokenize(source: string): Token[] {
  const tokens: Token[] = [];
  let i = 0;
  const fail = (message: string, offset: number, length: number, hint?: string): never => {
    throw new WhereError(message, source, offset, length, 'where-syntax', hint);
  };
  while (i < source.length) {
    const ch = source[i] as string;
    if (/\s/.test(ch)) {
      i += 1;
      continue;
    }
    if (ch === '"' || ch === "'") {
      const token = readString(source, i, fail);
      tokens.push(token);
      i += token.length;
      continue;
    }
    if (ch === '`') {
      const token = readQuotedName(source, i, fail);
      tokens.push(token);
      i += token.length;
      continue;
    }
    NUMBER.lastIndex = i;
    const number = NUMBER.exec(source);
    if (number !== null) {
      const end = i + number[0].length;
      if (end < source.length && WORD_CHAR.test(source[end] as string)) {
        const word = /^[\p{L}\p{N}_.]*/u.exec(source.slice(end))?.[0] ?? '';
        fail(`invalid number ${JSON.stringify(number[0] + word)}`, i, end + word.length - i, 'write numbers like 12, -1.5, .5 or 1e3, with a dot as decimal mark');
      }
      const value = Number(number[0]);
      if (!Number.isFinite(value)) fail(`number ${number[0]} is too large`, i, number[0].length);
      tokens.push({kind: 'number', value, offset: i, length: number[0].length});
      i = end;
      continue;
    }
    IDENTIFIER.lastIndex = i;
    const word = IDENTIFIER.exec(source);
    if (word !== null) {
      const end = i + word[0].length;
      if (end < source.length && WORD_CHAR.test(source[end] as string)) {
        const rest = /^[\p{L}\p{N}_.]*/u.exec(source.slice(end))?.[0] ?? '';
        fail(`column names outside backticks use only letters a-z, digits, _ and .`, i, end + rest.length - i, `write it in backticks: \`${word[0]}${rest}\``);
      }
      const keyword = KEYWORDS.get(word[0]);
      tokens.push(keyword === undefined
        ? {kind: 'identifier', value: word[0], offset: i, length: word[0].length}
        : {kind: keyword, offset: i, length: word[0].length});
      i = end;
      continue;
    }
    const symbol = SYMBOLS.find(([text]) => source.startsWith(text, i));
    if (symbol !== undefined) {
      tokens.push({kind: symbol[1], offset: i, length: symbol[0].length});
      i += symbol[0].length;
      continue;
    }
    unexpectedCharacter(source, i, fail);
  }
  tokens.push({kind: 'end', offset: source.length, length: 0});
  return tokens;
}

type Fail = (message: string, offset: number, length: number, hint?: string) => never;

/** A "double" or 'single' quoted string; `\\`, `\"` and `\'` escape, nothing else does. */
function readString(source: string, start: number, fail: Fail): Token {
  const quote = source[start];
  let value = '';
  let i = start + 1;
  while (i < source.length) {
    const ch = source[i] as string;
    if (ch === quote) return {kind: 'string', value, offset: start, length: i + 1 - start};
    if (ch === '\\') {
      const next = source[i + 1];
      if (next !== '\\' && next !== '"' && next !== "'") {
        fail('unknown escape in a string', i, Math.min(2, source.length - i), 'only \\\\, \\" and \\\' are escapes; or quote the string with the other kind of quote');
      }
      value += next;
      i += 2;
      continue;
    }
    value += ch;
    i += 1;
  }
  return fail('unterminated string', start, source.length - start, `close the string with ${quote}`);
}

/** A `quoted column name`; a backtick inside it is written twice, as SQL dialects do. */
function readQuotedName(source: string, start: number, fail: Fail): Token {
  let name = '';
  let i = start + 1;
  while (i < source.length) {
    if (source[i] === '`') {
      if (source[i + 1] !== '`') {
        if (name === '') fail('empty `` column name', start, i + 1 - start, 'write the column name between the backticks');
        return {kind: 'identifier', value: name, offset: start, length: i + 1 - start};
      }
      name += '`';
      i += 2;
      continue;
    }
    name += source[i];
    i += 1;
  }
  return fail('unterminated `quoted` column name', start, source.length - start, 'close the name with a backtick: `compressive strength`');
}

function unexpectedCharacter(source: string, i: number, fail: Fail): never {
  const ch = String.fromCodePoint(source.codePointAt(i) ?? 0);
  const arithmetic = 'the where language has no arithmetic; compare a column with a value';
  const hints = new Map([
    ['=', 'compare with == (a single = is not an operator)'],
    ['&', 'write && or and'],
    ['|', 'write || or or'],
    ['+', arithmetic], ['-', arithmetic], ['*', arithmetic], ['/', arithmetic],
  ]);
  const letter = /\p{L}/u.test(ch);
  const word = letter ? (/^[\p{L}\p{N}_.]*/u.exec(source.slice(i))?.[0] ?? ch) : ch;
  fail(
    letter ? `column names outside backticks use only letters a-z, digits, _ and .` : `unexpected character ${JSON.stringify(ch)}`,
    i,
    word.length,
    letter ? `write it in backticks: \`${word}\`` : hints.get(ch),
  );
}
