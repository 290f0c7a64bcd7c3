import {correlationPairs} from './shared/correlation-pairs.js';
import {correlationT} from './shared/correlation-t-test.js';
import {fisherZInterval, fisherZSe} from './shared/fisher-z-interval.js';
import {pearsonR} from './shared/pearson-r.js';
import type {BivariateDesign, MethodDefinition} from './types.js';

/**
 * Pearson's product-moment correlation with its t test,
 * t = r √((n−2)/(1−r²)) on n − 2 df (Fisher 1915, Biometrika 10:507–521),
 * and the Fisher-z interval tanh(atanh r ± z_{1−α/2}/√(n−3)) (Fisher 1921,
 * Metron 1:3–32), as R's cor.test and scipy's pearsonr. The statistic is
 * symmetric in x and y; `greater` tests a positive association. Needs at
 * least 4 pairs (the interval's n − 3).
 *
 * Accuracy: r from compensated centred sums (shared/pearson-r.ts); p and the
 * interval through the Student t and normal modules (≥ 13 digits).
 *
 * @example x = 1…7, y = [10, 9, 2.5, 6, 4, 3, 2]: r = -0.8285, p = 0.02128
 */
export const pearson: MethodDefinition<BivariateDesign> = {
  id: 'pearson',
  title: 'Pearson’s correlation',
  design: 'bivariate',
  question: 'association',
  compute(design, options) {
    const {x, y, n} = correlationPairs(design, 'Pearson’s correlation', 4);
    const r = pearsonR(x.values, y.values);
    const test = correlationT(r, n, options.alternative);
    const ci = fisherZInterval(r, fisherZSe.pearson(n), options.alternative, options.confidence);
    return {
      statistic: {name: 't', value: test.t},
      df: test.df,
      p: test.p,
      estimate: {name: 'Pearson r', value: r, ci, level: options.confidence},
      effect: {name: 'r', value: r, ci},
      variant: 't test; Fisher-z interval',
    };
  },
};
