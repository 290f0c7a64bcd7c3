import {describe, expect, it} from 'vitest';
import {decodeText} from '../../src/data/decode-text.js';
import {UserError} from '../../src/user-error.js';

describe('decodeText', () => {
  it('decodes UTF-8 and removes a byte order mark', () => {
    expect(decodeText(Buffer.from('\uFEFFa,b\nä,1\n', 'utf8'), 'x.csv')).toBe('a,b\nä,1\n');
    expect(decodeText(Buffer.from('a,b\n', 'utf8'), 'x.csv')).toBe('a,b\n');
  });

  it('decodes UTF-16 with a byte order mark (spreadsheet "Unicode text")', () => {
    const le = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from('a\tb\né\t1\n', 'utf16le')]);
    expect(decodeText(le, 'x.txt')).toBe('a\tb\né\t1\n');
    const be = Buffer.from(le.subarray(2)).swap16();
    expect(decodeText(Buffer.concat([Buffer.from([0xfe, 0xff]), be]), 'x.txt')).toBe('a\tb\né\t1\n');
  });

  it('refuses bytes that are not UTF-8, at the first bad byte', () => {
    const latin1 = Buffer.from('name,city\nx,Z\xfcrich\n', 'latin1');
    try {
      decodeText(latin1, 'data/x.csv');
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(UserError);
      const e = error as UserError;
      expect([e.ruleId, e.file, e.place]).toEqual(['data-encoding', 'data/x.csv', {line: 2, column: 4}]);
    }
  });
});
