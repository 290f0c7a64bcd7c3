import {describe, expect, it} from 'vitest';
import {locateCell} from '../../src/data/locate-cell.js';

describe('locateCell', () => {
  it('gives 1-based line and column of a field start', () => {
    const text = 'id,name,score\n1,ann,3\n22,bob,4\n';
    expect(locateCell(text, ',', 0, 0)).toEqual({line: 1, column: 1});
    expect(locateCell(text, ',', 0, 2)).toEqual({line: 1, column: 9});
    expect(locateCell(text, ',', 2, 1)).toEqual({line: 3, column: 4});
  });

  it('counts lines inside quoted fields (CRLF once) and skips empty lines as csv-parse does', () => {
    const text = 'a,b\r\n"x\r\ny",2\r\n\r\n3,"4"\r\n';
    expect(locateCell(text, ',', 1, 1)).toEqual({line: 3, column: 4});
    expect(locateCell(text, ',', 2, 0)).toEqual({line: 5, column: 1});
    expect(locateCell(text, ',', 2, 1)).toEqual({line: 5, column: 3});
  });

  it('does not split at delimiters or doubled quotes inside quotes', () => {
    const text = 'a;b\n"p;""q"";r";7\n';
    // "p;""q"";r" is 11 characters, then the delimiter: the field starts at 13.
    expect(locateCell(text, ';', 1, 1)).toEqual({line: 2, column: 13});
  });

  it('points after the last character for a field past the end of a short record', () => {
    expect(locateCell('a,b,c\n1,2\n3,4,5\n', ',', 1, 2)).toEqual({line: 2, column: 4});
    expect(locateCell('a,b\n1', ',', 1, 1)).toEqual({line: 2, column: 2});
  });

  it('handles multi-character tabs and lone CR line breaks', () => {
    expect(locateCell('a\tb\r1\t2\r', '\t', 1, 1)).toEqual({line: 2, column: 3});
  });
});
