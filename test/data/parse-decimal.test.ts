import {describe, expect, it} from 'vitest';
import {parseDecimal} from '../../src/data/parse-decimal.js';

describe('parseDecimal', () => {
  it('accepts plain decimal notation with a dot', () => {
    // Expected values are the same literals read by the JavaScript parser (common practice, no source).
    const cases: Array<[string, number]> = [
      ['0', 0], ['-1.5', -1.5], ['1e3', 1000], ['+2', 2], ['.5', 0.5], ['1.', 1], ['-2.5E-3', -0.0025], ['007', 7],
    ];
    for (const [text, value] of cases) expect(parseDecimal(text, '.')).toBe(value);
  });

  it('accepts a decimal comma only under decimal ","', () => {
    expect(parseDecimal('1,5', ',')).toBe(1.5);
    expect(parseDecimal('-,25', ',')).toBe(-0.25);
    expect(parseDecimal('1,5', '.')).toBeUndefined();
    expect(parseDecimal('1.5', ',')).toBeUndefined();
  });

  it('rejects thousands separators, hex, infinities, NaN, text, blanks and overflow', () => {
    for (const text of ['1,000', '1,000.5', '1 000', '0x10', 'Infinity', '-Infinity', 'NaN', 'abc', '', ' ', ' 1', '1e', '.', '-', '1e400', '12,1O', '1_000', '٣']) {
      expect(parseDecimal(text, '.')).toBeUndefined();
    }
    expect(parseDecimal('1.000,5', ',')).toBeUndefined();
  });

  it('rounds long literals to the nearest double as the JavaScript parser does', () => {
    // 0.1 + 2^-56-ish digits; Number() is the reference (common practice, no source).
    expect(parseDecimal('0.10000000000000000555111512312578270211815834045410156250001', '.')).toBe(0.1);
  });
});
