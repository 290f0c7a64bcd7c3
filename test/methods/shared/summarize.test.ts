import {describe, expect, it} from 'vitest';
import type {NumericColumn} from '../../../src/data/column.js';
import {summarize} from '../../../src/methods/shared/summarize.js';
import {makeDataset} from '../../data/make-dataset.js';
import {lre} from '../../helpers/lre.js';
import {nistUnivariate} from '../../helpers/reference.js';

const univariate = ['PiDigits', 'Lottery', 'Lew', 'Mavro', 'Michelso', 'NumAcc1', 'NumAcc2', 'NumAcc3', 'NumAcc4'];

/** The file's data lines as the text cells of a one-column CSV, read by the data stage. */
async function column(name: string): Promise<NumericColumn> {
  const dataset = await makeDataset(`y\n${nistUnivariate(name).texts.join('\n')}\n`);
  return dataset.columns.get('y') as NumericColumn;
}

// NIST StRD univariate summary statistics, certified mean and SD (n - 1).
describe('summarize against NIST StRD, data read exactly by the data stage', () => {
  // Measured: mean and SD at least 15.2 digits on every file (PiDigits … NumAcc4).
  for (const name of univariate) {
    it(`${name}: mean and sd to at least 14 digits (NIST StRD, ${name}, certified ybar and s)`, async () => {
      const reference = nistUnivariate(name);
      const y = await column(name);
      const summary = summarize(y.values, y.centred);
      expect(summary.n).toBe(reference.texts.length);
      expect(lre(summary.mean, reference.mean)).toBeGreaterThanOrEqual(14);
      expect(lre(summary.sd, reference.sd)).toBeGreaterThanOrEqual(14);
    });
  }
});

describe('summarize of doubles alone (no exact centring: paired differences, computed samples)', () => {
  // The values are rounded to doubles before any arithmetic: 10000000.2 has
  // an ulp of 1.9e-9 against an SD of 0.1, so NumAcc3 and NumAcc4 cannot reach
  // 13 digits of SD this way, whatever the algorithm. Measured: mean 15.9 on
  // all files; SD at least 15.6 up to NumAcc2, then 9.5 (NumAcc3), 8.3 (NumAcc4).
  for (const [name, meanDigits, sdDigits] of [
    ...['PiDigits', 'Lottery', 'Lew', 'Mavro', 'Michelso', 'NumAcc1'].map((n) => [n, 13, 13] as const),
    ['NumAcc2', 14, 12],
    ['NumAcc3', 14, 9],
    ['NumAcc4', 14, 8],
  ] as const) {
    it(`${name}: mean ≥ ${meanDigits} and sd ≥ ${sdDigits} digits (NIST StRD, ${name}, certified ybar and s)`, () => {
      const reference = nistUnivariate(name);
      const summary = summarize(reference.values);
      expect(lre(summary.mean, reference.mean)).toBeGreaterThanOrEqual(meanDigits);
      expect(lre(summary.sd, reference.sd)).toBeGreaterThanOrEqual(sdDigits);
    });
  }
});

describe('summarize', () => {
  it('gives median, min and max of an even-sized sample', () => {
    const summary = summarize(Float64Array.from([4, 1, 3, 2]));
    expect([summary.median, summary.min, summary.max]).toEqual([2.5, 1, 4]); // common practice, no source
  });

  it('takes median, min and max from the values and the mean from offset plus centred mean', () => {
    // 1e12 + {0.3, 0.4, 0.5} (NIST StRD SmLs07 values), centred exactly on 1000000000000.4.
    const values = Float64Array.from([1000000000000.4, 1000000000000.3, 1000000000000.5]);
    const summary = summarize(values, Float64Array.from([0, -0.1, 0.1]));
    expect(summary.sd).toBe(0.1); // sqrt((0.01 + 0.01) / 2), exact decimal arithmetic
    expect(summary.mean).toBe(1000000000000.4);
    expect([summary.median, summary.min, summary.max]).toEqual([1000000000000.4, 1000000000000.3, 1000000000000.5]);
    expect(summarize(values).sd).not.toBe(0.1); // the doubles alone: 0.10000610…
    expect(() => summarize(values, Float64Array.from([0]))).toThrow(/centred/);
  });

  it('has no sd for a single value and nothing for an empty sample', () => {
    expect(Number.isNaN(summarize(Float64Array.from([5])).sd)).toBe(true);
    expect(Number.isNaN(summarize(Float64Array.from([5]), Float64Array.from([0])).sd)).toBe(true);
    expect(summarize(new Float64Array()).n).toBe(0);
  });
});
