import {describe, expect, it} from 'vitest';
import {
  decimalsForWidth,
  formatDf,
  formatFixed,
  formatP,
  recordedDecimals,
} from '../../src/interpret/format-number.js';

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
