import {describe, expect, it} from 'vitest';
import {benjaminiHochberg} from '../../../src/methods/adjust/benjamini-hochberg.js';
import {lre} from '../../helpers/lre.js';
import {halfUnitDecimals} from './printed-precision.js';
import {multtest, neuhaus} from './reference-values.js';

describe('benjaminiHochberg', () => {
  it('reproduces the Benjamini & Hochberg (1995) worked example', () => {
    const adjusted = benjaminiHochberg(neuhaus.p);
    adjusted.forEach((value, i) => {
      // `scipy.bh_adjusted_scipy_docs` in shared/reference/examples/p_adjust_bh_bonferroni_holm--benjamini-hochberg-1995.json
      // (statsmodels computes p/(j/m), we compute (m/j)·p: a rounding or two apart; measured LRE 15.7).
      expect(lre(value, neuhaus.bhScipy[i]!)).toBeGreaterThanOrEqual(15);
      // `published.bh_adjusted_scipy_docs` in the same file: the file says 8 significant
      // digits, but the numbers are numpy's 8 decimal places (0.06385714 for 0.0638571428…)
      const published = neuhaus.bhPublished[i]!;
      expect(Math.abs(value - published)).toBeLessThanOrEqual(halfUnitDecimals(published, 8));
    });
    // `published.bh_rejections_at_0.05` in the same file: the paper's 4 rejections
    expect(adjusted.filter((value) => value <= 0.05)).toHaveLength(neuhaus.bhRejectionsPublished);
  });

  it('keeps the input order (example reversed)', () => {
    const adjusted = benjaminiHochberg([...neuhaus.p].reverse()).reverse();
    // `scipy.bh_adjusted_scipy_docs` in shared/reference/examples/p_adjust_bh_bonferroni_holm--benjamini-hochberg-1995.json
    adjusted.forEach((value, i) => expect(lre(value, neuhaus.bhScipy[i]!)).toBeGreaterThanOrEqual(15));
  });

  it('matches R multtest mt.rawp2adjp for every stored table, with the input reversed', () => {
    for (const table of Object.values(multtest)) {
      const adjusted = benjaminiHochberg([...table.raw].reverse()).reverse();
      // R multtest via statsmodels test_multi.py, column BH (see reference-values.ts); measured LRE ≥ 15.4.
      adjusted.forEach((value, i) => expect(lre(value, table.bh[i]!)).toBeGreaterThanOrEqual(15));
    }
  });

  it('gives tied p-values one value', () => {
    // hand computation from Benjamini & Hochberg (1995): from the top (4/4)·0.03, then
    // min(·, (4/3)·0.03), min(·, (4/2)·0.03), min(·, 4·0.01) → 0.03 throughout
    const adjusted = benjaminiHochberg([0.03, 0.01, 0.03, 0.03]);
    adjusted.forEach((value) => expect(lre(value, 0.03)).toBeGreaterThanOrEqual(15));
  });
});
