import {describe, expect, it} from 'vitest';
import {hochberg} from '../../../src/methods/adjust/hochberg.js';
import {lre} from '../../helpers/lre.js';
import {multtest} from './reference-values.js';

describe('hochberg', () => {
  it('matches R multtest mt.rawp2adjp for every stored table, with the input reversed', () => {
    for (const table of Object.values(multtest)) {
      const adjusted = hochberg([...table.raw].reverse()).reverse();
      // R multtest via statsmodels test_multi.py, column Hochberg (see reference-values.ts);
      // integer-factor products, measured LRE ≥ 15.7.
      adjusted.forEach((value, i) => expect(lre(value, table.hochberg[i]!)).toBeGreaterThanOrEqual(15));
    }
  });

  it('steps up with a running minimum and gives tied p-values one value', () => {
    // hand computation from Hochberg (1988): sorted 0.01, 0.03, 0.03, 0.03; from the top
    // 1·0.03, min(·, 2·0.03), min(·, 3·0.03), min(·, 4·0.01) → 0.03 throughout
    const adjusted = hochberg([0.03, 0.01, 0.03, 0.03]);
    [0.03, 0.03, 0.03, 0.03].forEach((expected, i) => expect(lre(adjusted[i]!, expected)).toBeGreaterThanOrEqual(15));
    // hand computation: 1·0.04, min(0.04, 2·0.03), min(0.04, 3·0.01) in input order
    const stepped = hochberg([0.01, 0.04, 0.03]);
    [0.03, 0.04, 0.04].forEach((expected, i) => expect(lre(stepped[i]!, expected)).toBeGreaterThanOrEqual(15));
  });
});
