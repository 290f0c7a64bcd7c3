import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {tokenize} from '../../../src/data/where/tokenize.js';
import {WhereError} from '../../../src/data/where/where-error.js';
import {UserError} from '../../../src/user-error.js';

const kinds = (source: string): string[] => tokenize(source).map((t) => t.kind);

function tokenError(source: string): WhereError {
  try {
    tokenize(source);
  } catch (error) {
    expect(error).toBeInstanceOf(WhereError);
    return error as WhereError;
  }
  return expect.unreachable('expected a WhereError');
}

describe('tokenize', () => {
  it('reads keywords, symbols and their spellings', () => {
    expect(kinds('a and b && c or d || not e ! f')).toEqual([
      'identifier', 'and', 'identifier', 'and', 'identifier', 'or', 'identifier', 'or', 'not', 'identifier', 'not', 'identifier', 'end',
    ]);
    expect(kinds('== != < <= > >= ( ) [ ] , in true false')).toEqual([
      '==', '!=', '<', '<=', '>', '>=', '(', ')', '[', ']', ',', 'in', 'true', 'false', 'end',
    ]);
  });

  it('reads numbers, including a sign, a leading dot and exponents', () => {
    const values = tokenize('1 -1.5 .5 1e3 2.5E-2 -0').map((t) => t.value);
    // Same literals read by the JavaScript parser (common practice, no source).
    expect(values).toEqual([1, -1.5, 0.5, 1000, 0.025, -0, undefined]);
  });

  it('reads both kinds of string with escapes, and backtick column names', () => {
    const tokens = tokenize(`"a \\"b\\"" 'it\\'s' "x'y" \`compressive strength\``);
    expect(tokens.map((t) => [t.kind, t.value])).toEqual([
      ['string', 'a "b"'], ['string', "it's"], ['string', "x'y"], ['identifier', 'compressive strength'], ['end', undefined],
    ]);
  });

  it('reads a doubled backtick inside a quoted name as one backtick', () => {
    expect(tokenize('`a``b` ````').map((t) => [t.kind, t.value, t.length])).toEqual([
      ['identifier', 'a`b', 6], ['identifier', '`', 4], ['end', undefined, 0],
    ]);
  });

  it('keeps offsets and lengths of every token', () => {
    expect(tokenize('x >= "ab"').map((t) => [t.offset, t.length])).toEqual([[0, 1], [2, 2], [5, 4], [9, 0]]);
  });

  it('reads names that are Object.prototype members as plain identifiers', () => {
    expect(tokenize('toString constructor').map((t) => [t.kind, t.value])).toEqual([
      ['identifier', 'toString'], ['identifier', 'constructor'], ['end', undefined],
    ]);
  });

  it('reads dotted identifiers and keywords in backticks as names', () => {
    expect(tokenize('site.name `and`').map((t) => [t.kind, t.value])).toEqual([
      ['identifier', 'site.name'], ['identifier', 'and'], ['end', undefined],
    ]);
  });

  it('places errors at the offending text', () => {
    const cases: Array<[string, number, number, RegExp]> = [
      ['site == "east', 8, 5, /unterminated string/],
      ["x == 'a", 5, 2, /unterminated string/],
      ['`compressive strength > 3', 0, 25, /unterminated/],
      ['`` > 1', 0, 2, /empty/],
      ['x = 1', 2, 1, /unexpected character "="/],
      ['x > 1 & y', 6, 1, /unexpected character "&"/],
      ['x > 3abc', 4, 4, /invalid number "3abc"/],
      ['x > 1e999', 4, 5, /too large/],
      ['x > y + 1', 6, 1, /unexpected character "\+"/],
      ['température > 3', 0, 11, /backticks/],
      ['"a\\n"', 2, 2, /unknown escape/],
    ];
    for (const [source, offset, length, message] of cases) {
      const error = tokenError(source);
      expect([source, error.offset, error.length, error.place]).toEqual([source, offset, length, {line: 1, column: offset + 1}]);
      expect(error.message).toMatch(message);
      expect(error.ruleId).toBe('where-syntax');
    }
  });

  it('hints at the right spelling', () => {
    expect(tokenError('x = 1').hint).toMatch(/==/);
    expect(tokenError('x > 1 | y').hint).toMatch(/\|\|/);
    expect(tokenError('température > 3').hint).toBe('write it in backticks: `température`');
  });

  it('never throws anything but a WhereError, on any text', () => {
    fc.assert(
      fc.property(fc.string({unit: 'binary', maxLength: 60}), (source) => {
        try {
          const tokens = tokenize(source);
          expect(tokens.at(-1)?.kind).toBe('end');
        } catch (error) {
          expect(error).toBeInstanceOf(UserError);
          const {offset, length} = error as WhereError;
          expect(offset >= 0 && offset + length <= source.length).toBe(true);
        }
      }),
      {numRuns: 2000},
    );
  });
});
