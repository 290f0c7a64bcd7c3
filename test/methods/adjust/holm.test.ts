import {describe, expect, it} from 'vitest';
import {holm} from '../../../src/methods/adjust/holm.js';
import {lre} from '../../helpers/lre.js';
import {airqualityPairwiseP} from './airquality-pairwise.js';
import {halfUnitDecimals} from './printed-precision.js';
import {airquality, fleiss, multtest, neuhaus} from './reference-values.js';

describe('holm', () => {
  it('reproduces the Holm values derived for the Benjamini & Hochberg (1995) example', () => {
    const adjusted = holm(neuhaus.p);
    // `scipy.holm_adjusted_derived` in shared/reference/examples/p_adjust_bh_bonferroni_holm--benjamini-hochberg-1995.json
    // (statsmodels 0.13.5); the same integer-factor products, so to the last bit or two.
    adjusted.forEach((value, i) => expect(lre(value, neuhaus.holmScipy[i]!)).toBeGreaterThanOrEqual(15));
    // `scipy.holm_rejections_at_0.05_derived` in the same file
    expect(adjusted.filter((value) => value <= 0.05)).toHaveLength(neuhaus.holmRejectionsScipy);
  });

  it('reproduces R pairwise.prop.test(smokers, patients) (Fleiss 1981)', () => {
    const adjusted = holm(fleiss.raw);
    adjusted.forEach((value, i) => {
      // `scipy.holm_adjusted` from `scipy.raw` in shared/reference/examples/p_adjust_holm--r-pairwise-prop-test-fleiss1981.json
      expect(lre(value, fleiss.holmScipy[i]!)).toBeGreaterThanOrEqual(15);
      // `published.holm_adjusted` in the same file, printed by R to 3 decimals
      const published = fleiss.holmPublished[i]!;
      expect(Math.abs(value - published)).toBeLessThanOrEqual(halfUnitDecimals(published, 3));
    });
  });

  it.each([
    ['pooled', airquality.holmPooledScipy, airquality.holmPooledPublished],
    ['welch', airquality.holmWelchScipy, airquality.holmWelchPublished],
  ] as const)('reproduces R pairwise.t.test(Ozone, Month) on airquality (%s)', (kind, scipy, published) => {
    const adjusted = holm(airqualityPairwiseP(kind));
    adjusted.forEach((value, i) => {
      // `scipy.holm_pooled_sd` / `scipy.holm_welch` in
      // shared/reference/examples/p_adjust_holm_bonferroni--r-pairwise-t-airquality.json; composite with
      // the t tail (@stdlib vs scipy), measured LRE ≥ 14.7, so 13 leaves room.
      expect(lre(value, scipy[i]!)).toBeGreaterThanOrEqual(13);
      // `published.holm_pooled_sd` / `published.holm_welch` in the same file, printed by R to 5 decimals
      expect(Math.abs(value - published[i]!)).toBeLessThanOrEqual(halfUnitDecimals(published[i]!, 5));
    });
  });

  it('matches R multtest mt.rawp2adjp for every stored table, with the input reversed', () => {
    for (const table of Object.values(multtest)) {
      const adjusted = holm([...table.raw].reverse()).reverse();
      // R multtest via statsmodels test_multi.py (see reference-values.ts); measured LRE ≥ 15.7.
      adjusted.forEach((value, i) => expect(lre(value, table.holm[i]!)).toBeGreaterThanOrEqual(15));
    }
  });

  it('steps down with a running maximum and gives tied p-values one value', () => {
    // hand computation from Holm (1979): sorted 0.01, 0.03, 0.03, 0.03 → 4·0.01, then max(·, 3·0.03)
    const adjusted = holm([0.03, 0.01, 0.03, 0.03]);
    [0.09, 0.04, 0.09, 0.09].forEach((expected, i) => expect(lre(adjusted[i]!, expected)).toBeGreaterThanOrEqual(15));
    // hand computation: 3·0.01 = 0.03, 2·0.03 = 0.06, max(0.06, 1·0.04) = 0.06
    const stepped = holm([0.01, 0.04, 0.03]);
    [0.03, 0.06, 0.06].forEach((expected, i) => expect(lre(stepped[i]!, expected)).toBeGreaterThanOrEqual(15));
  });
});
