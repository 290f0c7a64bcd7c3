import {describe, expect, it} from 'vitest';
import {benjaminiYekutieli} from '../../../src/methods/adjust/benjamini-yekutieli.js';
import {lre} from '../../helpers/lre.js';
import {multtest} from './reference-values.js';

describe('benjaminiYekutieli', () => {
  it('matches R multtest mt.rawp2adjp for every stored table, with the input reversed', () => {
    for (const table of Object.values(multtest)) {
      const adjusted = benjaminiYekutieli([...table.raw].reverse()).reverse();
      // R multtest via statsmodels test_multi.py, column BY (see reference-values.ts). c(m) is a
      // sum of m reciprocals summed in a different order there: measured LRE ≥ 15.2, so 14.5.
      adjusted.forEach((value, i) => expect(lre(value, table.by[i]!)).toBeGreaterThanOrEqual(14.5));
    }
  });

  it('is Benjamini–Hochberg scaled by c(m) = Σ 1/i when no value reaches the cap', () => {
    // R multtest via statsmodels test_multi.py `res_multtest2`: BH 0.012 throughout, BY 0.0294 = 0.012·c(6), c(6) = 2.45
    const table = multtest['multtest2']!;
    benjaminiYekutieli(table.raw).forEach((value) => expect(lre(value, 0.0294)).toBeGreaterThanOrEqual(15));
  });

  it('gives tied p-values one value', () => {
    // hand computation from Benjamini & Yekutieli (2001), Theorem 1.3: the BH values (0.03
    // throughout, see benjamini-hochberg.test.ts) times c(4) = 25/12 → 0.0625
    const adjusted = benjaminiYekutieli([0.03, 0.01, 0.03, 0.03]);
    adjusted.forEach((value) => expect(lre(value, 0.0625)).toBeGreaterThanOrEqual(15));
  });
});
