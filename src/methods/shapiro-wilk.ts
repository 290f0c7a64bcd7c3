import {MethodError} from './method-error.js';
import {shapiroWilk as shapiroWilkCore} from './shared/shapiro-wilk-core.js';
import type {MethodDefinition, OneSampleDesign} from './types.js';

/**
 * The Shapiro–Wilk test of normality (Shapiro & Wilk 1965, Biometrika
 * 52:591–611), by Royston's Algorithm AS R94 (Applied Statistics 44:547–551,
 * 1995) for 3 ≤ n ≤ 5000: W close to 1 means the ordered sample is close to
 * the expected normal order statistics; the p-value is the upper tail of
 * Royston's normalizing transformation of W (exact for n = 3).
 *
 * A small p says the data are unlikely under normality; a large p does not
 * show normality (the test has little power in small samples and flags
 * trivial departures in large ones). No estimate or effect size: W itself is
 * the measure of fit. Accuracy in `shared/shapiro-wilk-core.ts`.
 *
 * @example W = 0.7888, p = 0.0067 for the 11 weights of Shapiro & Wilk 1965, Example 1.
 */
export const shapiroWilk: MethodDefinition<OneSampleDesign> = {
  id: 'shapiro-wilk',
  title: 'Shapiro–Wilk test',
  design: 'one-sample',
  question: 'diagnostic',
  compute({sample}) {
    const {w, p} = shapiroWilkCore(sample.values);
    if (Number.isNaN(w)) {
      throw new MethodError(
        `all ${sample.values.length} values are equal, so normality cannot be tested`,
        'Check the data: a constant outcome has no distribution to test.',
      );
    }
    const variant = sample.values.length === 3 ? 'exact (n = 3)' : 'Royston’s normal approximation (AS R94)';
    return {statistic: {name: 'W', value: w}, df: null, p, variant};
  },
};
