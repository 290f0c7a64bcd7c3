import {describe, expect, it} from 'vitest';
import type {NumericColumn} from '../../../src/data/column.js';
import {lag1Autocorrelation} from '../../../src/methods/shared/lag1-autocorrelation.js';
import {makeDataset} from '../../data/make-dataset.js';
import {lre} from '../../helpers/lre.js';
import {nistUnivariate} from '../../helpers/reference.js';

const univariate = ['PiDigits', 'Lottery', 'Lew', 'Mavro', 'Michelso', 'NumAcc1', 'NumAcc2', 'NumAcc3', 'NumAcc4'];

describe('lag-1 autocorrelation against NIST StRD', () => {
  for (const name of univariate) {
    it(`${name}: r(1) to at least 13 digits on the exactly centred data (NIST StRD, ${name}, certified r(1))`, async () => {
      const reference = nistUnivariate(name);
      const dataset = await makeDataset(`y\n${reference.texts.join('\n')}\n`);
      const column = dataset.columns.get('y') as NumericColumn;
      expect(lre(lag1Autocorrelation(column.centred), reference.lag1)).toBeGreaterThanOrEqual(13);
    });
  }

  it('is undefined below two values', () => {
    expect(Number.isNaN(lag1Autocorrelation(Float64Array.from([1])))).toBe(true);
  });
});
