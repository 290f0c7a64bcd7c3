import {fSf} from '../distributions/fisher-f.js';
import {MethodError} from './method-error.js';
import {anovaSensitivity} from './shared/anova-power.js';
import {etaSquaredInterval} from './shared/eta-squared-interval.js';
import {largestDifference} from './shared/largest-difference.js';
import {requireTwoSided, spreadRatioWarning} from './shared/k-group-checks.js';
import {oneWaySums} from './shared/one-way-sums.js';
import type {KGroupDesign, MethodDefinition} from './types.js';

/**
 * Classic one-way analysis of variance (Fisher 1925, "Statistical Methods
 * for Research Workers", ch. VII): F = MS_between / MS_within on k - 1 and
 * N - k df, p from the upper tail of F. Assumes equal population variances;
 * a warning points to `welch-anova` when group SDs differ by more than 2×.
 *
 * Sums of squares are computed from the exactly centred data the data stage
 * provides (`Sample.centred`) with compensated sums (`oneWaySums`). Against
 * the NIST StRD ANOVA certified values (SS, MS, F, R², residual SD): at
 * least 14.5 digits on every file, SmLs07–09 included. Read as plain doubles
 * instead, SmLs07–09 would reach only 3.9: the decimals' rounding, not the
 * arithmetic, is what limits them.
 *
 * Reported: the estimate is the largest minus the smallest group mean with a
 * Bonferroni-simultaneous interval (`largestDifference`); the effect is η²
 * = SS_between/SS_total with its interval by inverting the noncentral F
 * (Steiger 2004, Psychological Methods 9:164); `details` adds the ANOVA
 * table, R² (= η²), the residual SD √MS_within and ω² = (SS_between - (k-1)
 * MS_within) / (SS_total + MS_within) (Hays 1963; Olejnik & Algina 2003,
 * Psychological Methods 8:434, Table 2), which is less biased than η² and
 * may be negative; its interval is η²'s, since both estimate the same
 * population quantity. Sensitivity: `anovaSensitivity`.
 *
 * @example PlantGrowth (Dobson 1983): F(2, 27) = 4.846, p = 0.0159, η² = 0.264
 */
export const anova: MethodDefinition<KGroupDesign> = {
  id: 'anova',
  title: 'one-way ANOVA',
  design: 'k-group',
  compute({samples}, options) {
    requireTwoSided(options.alternative, 'one-way ANOVA');
    const sums = oneWaySums(samples, 'one-way ANOVA');
    const k = sums.n.length;
    const df1 = k - 1;
    const df2 = sums.total - k;
    if (df2 < 1) {
      throw new MethodError('The one-way ANOVA needs at least one group with two or more observations.', 'Collect more data per group.');
    }
    if (!(sums.ssWithin > 0)) {
      throw new MethodError(
        'Every group is constant (no variation within groups), so the F statistic is infinite.',
        'Check the outcome column; a test is not needed to see that the groups differ.',
      );
    }
    const msBetween = sums.ssBetween / df1;
    const msWithin = sums.ssWithin / df2;
    const f = msBetween / msWithin;
    const ssTotal = sums.ssBetween + sums.ssWithin;
    const etaSquared = sums.ssBetween / ssTotal;
    const interval = etaSquaredInterval(f, df1, df2, sums.total, options.confidence);
    const omegaSquared = (sums.ssBetween - df1 * msWithin) / (ssTotal + msWithin);
    return {
      statistic: {name: 'F', value: f},
      df: [df1, df2],
      p: fSf(f, df1, df2),
      estimate: largestDifference({
        labels: sums.labels,
        means: sums.centred,
        pair: (i, j) => ({se: Math.sqrt(msWithin * (1 / sums.n[i]! + 1 / sums.n[j]!)), df: df2}),
        confidence: options.confidence,
      }),
      effect: {name: 'eta-squared', value: etaSquared, ci: interval},
      sensitivity: anovaSensitivity({
        weights: sums.n.map((n) => n / msWithin),
        df1,
        df2,
        alpha: options.alpha,
        smallestEffect: options.smallestEffect,
      }),
      warnings: spreadRatioWarning(sums, 'welch-anova'),
      details: {
        anova_table: {
          between: {ss: sums.ssBetween, df: df1, ms: msBetween},
          within: {ss: sums.ssWithin, df: df2, ms: msWithin},
          total: {ss: ssTotal, df: sums.total - 1},
        },
        r_squared: etaSquared,
        residual_sd: Math.sqrt(msWithin),
        omega_squared: {value: omegaSquared, ci: interval},
      },
    };
  },
};
