import {describe, expect, it} from 'vitest';
import {bonferroni} from '../../../src/methods/adjust/bonferroni.js';
import {lre} from '../../helpers/lre.js';
import {airqualityPairwiseP} from './airquality-pairwise.js';
import {halfUnitDecimals} from './printed-precision.js';
import {airquality, multtest, neuhaus} from './reference-values.js';

describe('bonferroni', () => {
  it('reproduces the Benjamini & Hochberg (1995) example', () => {
    const adjusted = bonferroni(neuhaus.p);
    adjusted.forEach((value, i) => {
      // statsmodels 0.13.5 recomputation, `scipy.bonferroni_adjusted` in
      // shared/reference/examples/p_adjust_bh_bonferroni_holm--benjamini-hochberg-1995.json;
      // p·m is one float64 product in both, so agreement is to the last bit or two.
      expect(lre(value, neuhaus.bonferroniScipy[i]!)).toBeGreaterThanOrEqual(15);
      // `published.bonferroni_times_m_scipy_docs` in the same file (numpy's 8 decimals), capped at 1 here
      const published = Math.min(1, neuhaus.bonferroniTimesMPublished[i]!);
      expect(Math.abs(value - published)).toBeLessThanOrEqual(halfUnitDecimals(published, 8));
    });
    // `published.bonferroni_rejections_at_0.05` in the same file
    expect(adjusted.filter((value) => value <= 0.05)).toHaveLength(neuhaus.bonferroniRejectionsPublished);
  });

  it('reproduces R pairwise.t.test(Ozone, Month, p.adjust.method = "bonf") on airquality', () => {
    const adjusted = bonferroni(airqualityPairwiseP('pooled'));
    adjusted.forEach((value, i) => {
      // `scipy.bonferroni_pooled_sd` in shared/reference/examples/p_adjust_holm_bonferroni--r-pairwise-t-airquality.json;
      // composite with the t tail (@stdlib vs scipy), measured LRE 15.0, so 13 leaves two digits of room.
      expect(lre(value, airquality.bonferroniPooledScipy[i]!)).toBeGreaterThanOrEqual(13);
      // `published.bonferroni_pooled_sd` in the same file, printed by R to 5 decimals
      const published = airquality.bonferroniPooledPublished[i]!;
      expect(Math.abs(value - published)).toBeLessThanOrEqual(halfUnitDecimals(published, 5));
    });
  });

  it('matches R multtest mt.rawp2adjp for every stored table, with the input reversed', () => {
    for (const table of Object.values(multtest)) {
      const adjusted = bonferroni([...table.raw].reverse()).reverse();
      // R multtest via statsmodels test_multi.py (see reference-values.ts); one product each.
      adjusted.forEach((value, i) => expect(lre(value, table.bonferroni[i]!)).toBeGreaterThanOrEqual(15));
    }
  });

  it('multiplies by m, caps at 1 and keeps the input order', () => {
    // hand computation from the definition min(1, m·p), m = 4
    const adjusted = bonferroni([0.2, 0.01, 0.3, 0.0125]);
    [0.8, 0.04, 1, 0.05].forEach((expected, i) => expect(lre(adjusted[i]!, expected)).toBeGreaterThanOrEqual(15));
  });
});
