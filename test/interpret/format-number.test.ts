import {describe, expect, it} from 'vitest';
import {
  decimalsForWidth,
  formatDf,
  formatFixed,
  formatP,
  formatPercent,
  numberFormat,
  recordedDecimals,
} from '../../src/interpret/format-number.js';
import {numberStyles} from '../../src/interpret/number-style.js';
import {plainText, segmentsOf, symbol} from '../../src/interpret/symbol-marks.js';

// The conventions checked here are reporting practice, not statistical
// values: "common practice, no source" throughout.
describe('formatP', () => {
  it('never prints p = .000', () => {
    expect(formatP(0.0004)).toEqual({relation: '<', text: '.001'});
    expect(formatP(1e-300)).toEqual({relation: '<', text: '.001'});
  });

  it('drops the leading zero and keeps three decimals', () => {
    expect(formatP(0.0098)).toEqual({relation: '=', text: '.010'});
    expect(formatP(0.2)).toEqual({relation: '=', text: '.200'});
  });

  it('adds digits when rounding would cross alpha', () => {
    expect(formatP(0.04996, 0.05).text).toBe('.04996');
    expect(formatP(0.0502, 0.05).text).toBe('.0502');
    expect(formatP(0.0502).text).toBe('.050');
  });

  it('caps near one', () => {
    expect(formatP(0.9999)).toEqual({relation: '>', text: '.999'});
  });
});

describe('numbers', () => {
  it('uses a true minus sign and never prints −0', () => {
    expect(formatFixed(-3.14159, 2)).toBe('\u22123.14');
    expect(formatFixed(-0.0001, 2)).toBe('0.00');
  });

  it('groups thousands from 10,000', () => {
    expect(formatFixed(1234.5, 1)).toBe('1234.5');
    expect(formatFixed(12345.5, 1)).toBe('12,345.5');
    expect(formatFixed(-1234567, 0)).toBe('\u22121,234,567');
  });

  it('prints integer df as integers and Welch df to one decimal', () => {
    expect(formatDf(18)).toBe('18');
    expect(formatDf(18.332251638400464)).toBe('18.3');
  });

  it('chooses decimals from an interval width and from recorded data', () => {
    expect(decimalsForWidth(4.6)).toBe(1);
    expect(decimalsForWidth(0.046)).toBe(3);
    expect(decimalsForWidth(460)).toBe(0);
    expect(recordedDecimals([1, 2.5, 3.25])).toBe(2);
    expect(recordedDecimals([10, 20])).toBe(0);
  });
});

describe('number styles', () => {
  const science = numberFormat(numberStyles.science);
  const engineering = numberFormat(numberStyles.engineering);

  it('drops the leading zero of bounded quantities only in the science style', () => {
    // common practice, no source
    expect(science.pClause(0.0123, 0.05)).toBe('\uE000p\uE001 = .012');
    expect(engineering.pClause(0.0123, 0.05)).toBe('\uE000p\uE001 = 0.012');
    expect(science.bounded(-0.456, 2)).toBe('\u2212.46');
    expect(engineering.bounded(-0.456, 2)).toBe('\u22120.46');
    expect(science.p(0.0004)).toEqual({relation: '<', text: '.001'});
    expect(engineering.p(0.0004)).toEqual({relation: '<', text: '0.001'});
  });

  it('prints alpha as declared, without trailing zeros', () => {
    // common practice, no source
    expect(science.alpha(0.05)).toBe('.05');
    expect(science.alpha(0.005)).toBe('.005');
    expect(engineering.alpha(0.1)).toBe('0.1');
  });

  it('separates thousands with a comma or a narrow no-break space', () => {
    // common practice, no source (ISO 80000-1 groups digits with a space)
    expect(science.fixed(12345.678, 1)).toBe('12,345.7');
    expect(engineering.fixed(12345.678, 1)).toBe('12\u202f345.7');
    expect(engineering.fixed(1234.5, 1)).toBe('1234.5');
  });

  it('chooses estimate decimals from the interval width, not the estimate size', () => {
    // common practice, no source: two significant digits of the CI width
    expect(decimalsForWidth(3.3)).toBe(1); // 31.4 MPa, CI width 3.3 → one decimal
    expect(decimalsForWidth(0.033)).toBe(3);
    expect(decimalsForWidth(1234)).toBe(0);
  });

  it('never rounds power to a certain 100%', () => {
    expect(formatPercent(0.996)).toBe('>99%');
    expect(formatPercent(0.914)).toBe('91%');
  });
});

describe('symbol marks', () => {
  it('italicises Latin symbols only, and leaves plain text for JSON', () => {
    const marked = `${symbol('t')}(12) = 2.10, ${symbol('χ²')}(2) = 3.0`;
    expect(plainText(marked)).toBe('t(12) = 2.10, χ²(2) = 3.0');
    expect(segmentsOf(marked)).toEqual([{text: 't', symbol: true}, {text: '(12) = 2.10, χ²(2) = 3.0'}]);
  });
});
