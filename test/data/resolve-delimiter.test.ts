import {describe, expect, it} from 'vitest';
import {resolveDelimiter} from '../../src/data/resolve-delimiter.js';
import {isUserError} from '../../src/user-error.js';

describe('resolveDelimiter', () => {
  it('uses a declared delimiter and its YAML-friendly spellings', () => {
    expect(resolveDelimiter('x.csv', 'a;b', ';', '.')).toEqual({delimiter: ';', source: 'declared'});
    expect(resolveDelimiter('x.txt', 'a\tb', '\\t', '.')).toEqual({delimiter: '\t', source: 'declared'});
    expect(resolveDelimiter('x.txt', 'a\tb', 'tab', '.')).toEqual({delimiter: '\t', source: 'declared'});
  });

  it('refuses a declared delimiter that is not one character, or a comma with decimal comma', () => {
    for (const [declared, decimal] of [[';;', '.'], ['"', '.'], [',', ',']] as const) {
      try {
        resolveDelimiter('x.csv', '', declared, decimal);
        expect.unreachable();
      } catch (error) {
        expect(isUserError(error) && error.ruleId).toBe('invalid-delimiter');
      }
    }
  });

  it('takes the delimiter from the extension', () => {
    expect(resolveDelimiter('d/x.tsv', 'a,b\n1,2', undefined, '.')).toEqual({delimiter: '\t', source: 'extension'});
    expect(resolveDelimiter('d/x.CSV', 'a,b\n1,2', undefined, '.')).toEqual({delimiter: ',', source: 'extension'});
  });

  it('sniffs a .csv whose decimal mark is a comma', () => {
    expect(resolveDelimiter('x.csv', 'x;y\n1,5;2\n', undefined, ',')).toEqual({delimiter: ';', source: 'sniffed'});
  });

  it('sniffs a .csv written with semicolons, but keeps the comma when the evidence is ragged', () => {
    expect(resolveDelimiter('x.csv', 'x;y\n1.5;2\n', undefined, '.')).toEqual({delimiter: ';', source: 'sniffed'});
    expect(resolveDelimiter('x.csv', 'x;y;z\n1;2\n', undefined, '.')).toEqual({delimiter: ',', source: 'extension'});
  });

  it('sniffs other extensions', () => {
    expect(resolveDelimiter('x.txt', 'a|b\n1|2\n', undefined, '.')).toEqual({delimiter: '|', source: 'sniffed'});
  });
});
