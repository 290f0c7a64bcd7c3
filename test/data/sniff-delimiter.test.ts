import {describe, expect, it} from 'vitest';
import {sniffDelimiter} from '../../src/data/sniff-delimiter.js';

describe('sniffDelimiter', () => {
  it('finds each candidate when it splits every line the same way', () => {
    expect(sniffDelimiter('a,b,c\n1,2,3\n', '.').delimiter).toBe(',');
    expect(sniffDelimiter('a\tb\n1\t2\n', '.').delimiter).toBe('\t');
    expect(sniffDelimiter('a;b\n1;2\n', '.').delimiter).toBe(';');
    expect(sniffDelimiter('a|b\n1|2\n', '.').delimiter).toBe('|');
  });

  it('ignores delimiters inside quoted text, including quoted line breaks', () => {
    const text = 'name;note\n"Smith, J.";"a, b, c"\n"Doe";"x,\ny"\n';
    expect(sniffDelimiter(text, '.')).toEqual({delimiter: ';', consistent: true});
  });

  it('prefers the consistent candidate over the one with more occurrences', () => {
    // Commas appear in free text on some rows only; the semicolon splits every row in two.
    const text = 'id;comment\n1;fine, thanks, really\n2;ok\n3;yes, no\n';
    expect(sniffDelimiter(text, '.').delimiter).toBe(';');
  });

  it('never picks the comma when the decimal mark is a comma', () => {
    expect(sniffDelimiter('x;y\n1,5;2,5\n', ',').delimiter).toBe(';');
    // Even a file whose only candidate is the comma: the fallback is then `\t`.
    expect(sniffDelimiter('x,y\n1,2\n', ',').delimiter).not.toBe(',');
  });

  it('prefers more fields among consistent candidates, then the candidate order', () => {
    expect(sniffDelimiter('a;b;c,d\n1;2;3,4\n', '.').delimiter).toBe(';');
    expect(sniffDelimiter('a;b,c\n1;2,3\n', '.').delimiter).toBe(',');
  });

  it('reports inconsistency and still picks the most promising candidate', () => {
    const result = sniffDelimiter('a;b;c\n1;2\n', '.');
    expect(result).toEqual({delimiter: ';', consistent: false});
  });

  it('falls back to the first allowed candidate for one-column and empty input', () => {
    expect(sniffDelimiter('value\n1\n2\n', '.')).toEqual({delimiter: ',', consistent: true});
    expect(sniffDelimiter('', '.')).toEqual({delimiter: ',', consistent: true});
    expect(sniffDelimiter('value\n1,5\n', ',').delimiter).toBe('\t');
  });

  it('skips empty lines and handles CRLF and a last line without a break', () => {
    expect(sniffDelimiter('a|b\r\n\r\n1|2\r\n3|4', '.')).toEqual({delimiter: '|', consistent: true});
  });
});
