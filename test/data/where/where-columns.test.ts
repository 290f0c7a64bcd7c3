import {describe, expect, it} from 'vitest';
import {parseWhere} from '../../../src/data/where/parse.js';
import {whereColumns} from '../../../src/data/where/where-columns.js';

describe('whereColumns', () => {
  it('lists the referenced columns once, in order of appearance', () => {
    const expression = parseWhere('not (b > 1 or `a x` in [1]) and b < 3 and 4 == c and "k" != d');
    expect(whereColumns(expression)).toEqual(['b', 'a x', 'c', 'd']);
  });

  it('lists none for comparisons of values only', () => {
    expect(whereColumns(parseWhere('1 == 1'))).toEqual([]);
  });
});
