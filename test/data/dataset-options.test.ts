import {describe, expect, it} from 'vitest';
import {defaultDatasetOptions, normalizeDelimiter} from '../../src/data/dataset-options.js';

describe('defaultDatasetOptions', () => {
  it('fills the contract defaults (§2) with fresh objects each time', () => {
    const a = defaultDatasetOptions('data/x.csv');
    expect(a).toEqual({file: 'data/x.csv', decimal: '.', missing: ['', 'NA'], types: {}, units: {}, labels: {}});
    a.missing.push('n/a');
    expect(defaultDatasetOptions('y.csv').missing).toEqual(['', 'NA']);
  });
});

describe('normalizeDelimiter', () => {
  it('maps names and the escaped tab, keeps single characters, refuses the rest', () => {
    expect(normalizeDelimiter('\\t')).toBe('\t');
    expect(normalizeDelimiter('Tab')).toBe('\t');
    expect(normalizeDelimiter('semicolon')).toBe(';');
    expect(normalizeDelimiter('|')).toBe('|');
    expect(normalizeDelimiter('')).toBeUndefined();
    expect(normalizeDelimiter(',,')).toBeUndefined();
    expect(normalizeDelimiter('"')).toBeUndefined();
    expect(normalizeDelimiter('\n')).toBeUndefined();
  });
});
