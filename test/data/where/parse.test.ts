import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import type {Operand, WhereNode} from '../../../src/data/where/ast.js';
import {parseWhere} from '../../../src/data/where/parse.js';
import {WhereError} from '../../../src/data/where/where-error.js';
import {UserError} from '../../../src/user-error.js';

/** A compact, fully parenthesized rendering of the tree, to check structure and precedence. */
function show(node: WhereNode): string {
  const operand = (o: Operand): string => (o.kind === 'column' ? o.name : JSON.stringify(o.value));
  switch (node.kind) {
    case 'compare':
      return `(${operand(node.left)} ${node.operator} ${operand(node.right)})`;
    case 'in':
      return `(${operand(node.subject)} ${node.negated ? 'not in' : 'in'} [${node.items.map(operand).join(', ')}])`;
    case 'not':
      return `(not ${show(node.operand)})`;
    default:
      return `(${show(node.left)} ${node.kind} ${show(node.right)})`;
  }
}

const parsed = (source: string): string => show(parseWhere(source).root);

function parseError(source: string): WhereError {
  try {
    parseWhere(source);
  } catch (error) {
    expect(error).toBeInstanceOf(WhereError);
    return error as WhereError;
  }
  return expect.unreachable(`expected a WhereError for ${source}`);
}

describe('parseWhere', () => {
  it('binds not tighter than and, and tighter than or', () => {
    expect(parsed('not a == 1 or b == 2 and c == 3')).toBe('((not (a == 1)) or ((b == 2) and (c == 3)))');
    expect(parsed('a == 1 and b == 2 or c == 3')).toBe('(((a == 1) and (b == 2)) or (c == 3))');
    expect(parsed('!a == 1 || b == 2 && c == 3')).toBe('((not (a == 1)) or ((b == 2) and (c == 3)))');
  });

  it('associates and/or to the left and respects parentheses', () => {
    expect(parsed('a == 1 or b == 2 or c == 3')).toBe('(((a == 1) or (b == 2)) or (c == 3))');
    expect(parsed('not (a == 1 or b == 2) and c == 3')).toBe('((not ((a == 1) or (b == 2))) and (c == 3))');
    expect(parsed('((a < 1))')).toBe('(a < 1)');
    expect(parsed('not not a >= 1')).toBe('(not (not (a >= 1)))');
  });

  it('reads every comparison and literal kind', () => {
    expect(parsed('age == 28 and site != "east"')).toBe('((age == 28) and (site != "east"))');
    expect(parsed(`x <= -1.5 and 30 < y and z > .5 and w >= 1e3 and ok == true and k != 'a'`)).toBe(
      '((((((x <= -1.5) and (30 < y)) and (z > 0.5)) and (w >= 1000)) and (ok == true)) and (k != "a"))',
    );
    expect(parsed('`compressive strength` > 30')).toBe('(compressive strength > 30)');
  });

  it('reads in and not in lists', () => {
    expect(parsed('site in ["east", \'west\']')).toBe('(site in ["east", "west"])');
    expect(parsed('dose not in [1, 2.5, false]')).toBe('(dose not in [1, 2.5, false])');
    expect(parsed('not dose in [1]')).toBe('(not (dose in [1]))');
  });

  it('records spans of operands and operators', () => {
    const root = parseWhere('  strength  >=  30').root;
    expect(root.kind === 'compare' && [root.left, root.operatorSpan, root.right]).toEqual([
      {kind: 'column', name: 'strength', offset: 2, length: 8},
      {offset: 12, length: 2},
      {kind: 'literal', value: 30, offset: 16, length: 2},
    ]);
  });

  it('places syntax errors at the offending token, with hints', () => {
    const cases: Array<[string, number, RegExp, RegExp | undefined]> = [
      ['', 0, /empty/, /site == "east"/],
      ['   ', 3, /empty/, undefined],
      ['x >', 3, /expected a column name or a value, found the end/, undefined],
      ['x > 1 y', 6, /expected "and", "or" or the end of the expression, found "y"/, undefined],
      ['x == 1 AND y == 2', 7, /found "AND"/, /keywords are lowercase: and/],
      ['x IN [1]', 2, /expected a comparison after x/, /keywords are lowercase: in/],
      ['compressive strength > 30', 12, /expected a comparison after compressive/, /`compressive strength`/],
      ['site', 4, /expected a comparison after site/, /site == 1/],
      ['(x > 1', 6, /expected \) to close the \( at column 1/, undefined],
      ['x > 1)', 5, /found "\)"/, undefined],
      ['x < y < 3', 6, /cannot be chained/, /and/],
      ['site in east', 8, /expected \[/, /site in \["east", "west"\]/],
      ['site in []', 9, /the list is empty/, undefined],
      ['site in [east]', 9, /expected a value in the list/, /\["east"\]/],
      ['site in ["a" "b"]', 13, /expected , or \]/, undefined],
      ['site in ["a",', 13, /expected a value in the list, found the end/, undefined],
      ['and x == 1', 0, /expected a column name or a value, found "and"/, undefined],
      ['x == 1 and', 10, /found the end/, undefined],
    ];
    for (const [source, offset, message, hint] of cases) {
      const error = parseError(source);
      expect([source, error.offset, error.place]).toEqual([source, offset, {line: 1, column: offset + 1}]);
      expect(error.message).toMatch(message);
      if (hint !== undefined) expect(error.hint).toMatch(hint);
    }
  });

  it('counts lines in multi-line expressions (YAML block scalars)', () => {
    const error = parseError('x > 1 and\n  y >');
    expect([error.offset, error.place]).toEqual([15, {line: 2, column: 6}]);
  });

  it('never throws anything but a UserError on arbitrary token soup', () => {
    const piece = fc.constantFrom('x', 'y', '`a b`', '1', '-2.5', '"s"', "'t'", 'true', 'false', 'and', 'or', 'not', 'in',
      '==', '!=', '<', '<=', '>', '>=', '(', ')', '[', ']', ',', '&&', '||', '!', '=', '"', ' ');
    fc.assert(
      fc.property(fc.array(piece, {maxLength: 14}), (pieces) => {
        try {
          parseWhere(pieces.join(' '));
        } catch (error) {
          expect(error).toBeInstanceOf(UserError);
        }
      }),
      {numRuns: 3000},
    );
  });
});
