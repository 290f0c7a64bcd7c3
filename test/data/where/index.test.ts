import {describe, expect, it} from 'vitest';
import * as where from '../../../src/data/where/index.js';
import {UserError} from '../../../src/user-error.js';
import {makeDataset} from '../make-dataset.js';

describe('where public API', () => {
  it('exports exactly the parse, check and evaluate entry points and the error class', () => {
    expect(Object.keys(where).sort()).toEqual(['WhereError', 'evaluateWhere', 'parseWhere', 'whereColumns']);
  });

  it('runs end to end: parse once, list the columns, evaluate', async () => {
    const expression = where.parseWhere('age == 28 and site != "east"');
    expect(where.whereColumns(expression)).toEqual(['age', 'site']);
    const dataset = await makeDataset('site,age\neast,28\nwest,28\nwest,30\n');
    expect([...where.evaluateWhere(expression, dataset)]).toEqual([0, 1, 0]);
  });

  it('raises WhereErrors that are UserErrors carrying offset and length', () => {
    try {
      where.parseWhere('x >> 1');
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(UserError);
      expect(error).toBeInstanceOf(where.WhereError);
      const {offset, length, place, name} = error as where.WhereError;
      expect({offset, length, place, name}).toEqual({offset: 3, length: 1, place: {line: 1, column: 4}, name: 'WhereError'});
    }
  });
});
