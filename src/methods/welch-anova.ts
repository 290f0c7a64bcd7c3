import {fSf} from '../distributions/fisher-f.js';
import {MethodError} from './method-error.js';
import {anovaSensitivity} from './shared/anova-power.js';
import {etaSquaredInterval} from './shared/eta-squared-interval.js';
import {largestDifference} from './shared/largest-difference.js';
import {requireTwoSided} from './shared/k-group-checks.js';
import {oneWaySums} from './shared/one-way-sums.js';
import type {KGroupDesign, MethodDefinition} from './types.js';

/**
 * Welch's heteroscedastic one-way ANOVA (Welch 1951, Biometrika 38:330,
 * the statistic of §3 as written out by R's oneway.test): with weights
 * wᵢ = nᵢ/sᵢ², W = Σwᵢ, m̄_w = Σwᵢm̄ᵢ/W and Λ = Σ(1 - wᵢ/W)²/(nᵢ - 1),
 *
 *   F = [Σwᵢ(m̄ᵢ - m̄_w)²/(k-1)] / [1 + 2(k-2)Λ/(k²-1)]  on  k - 1  and  (k²-1)/(3Λ) df.
 *
 * With two groups it is the square of Welch's t. Every group needs two
 * observations and a nonzero SD.
 *
 * Effect: ω² from Welch's F, ω² = (k-1)(F-1)/((k-1)(F-1) + N). This is
 * the classic ω² (Hays 1963) written in terms of F, with Welch's F put in
 * place of the pooled one; the substitution is a convention of the trade
 * (often attributed to Carroll & Nordholm 1975, Educ. Psychol. Meas. 35:541,
 * not verified here). It may be negative (F < 1). Its interval inverts the
 * noncentral F on (k-1, Welch df) and maps λ to λ/(λ+N)
 * (`etaSquaredInterval`); Welch's F is only approximately noncentral F, so
 * the interval is approximate.
 *
 * Estimate: the largest minus the smallest group mean with a Bonferroni
 * interval using each pair's Welch standard error and Welch–Satterthwaite
 * df (`largestDifference`). `details` adds the classic ANOVA table and R²
 * as descriptions of the data. Sensitivity: `anovaSensitivity` with Welch's
 * weights and df.
 *
 * @example PlantGrowth (Dobson 1983): F(2, 17.128) = 5.181, p = 0.0174 (R oneway.test)
 */
export const welchAnova: MethodDefinition<KGroupDesign> = {
  id: 'welch-anova',
  title: 'Welch’s ANOVA',
  design: 'k-group',
  compute({samples}, options) {
    requireTwoSided(options.alternative, 'Welch’s ANOVA');
    const sums = oneWaySums(samples, 'Welch’s ANOVA');
    sums.n.forEach((n, i) => {
      if (n < 2 || !(sums.variances[i]! > 0)) {
        throw new MethodError(
          `Group ${sums.labels[i]} has ${n < 2 ? 'a single observation' : 'no variation'}; Welch’s ANOVA needs each group’s standard deviation.`,
          'Collect more data for that group, or drop the level.',
        );
      }
    });
    const k = sums.n.length;
    const weights = sums.n.map((n, i) => n / sums.variances[i]!);
    const totalWeight = weights.reduce((a, b) => a + b, 0);
    const weightedMean = weights.reduce((sum, w, i) => sum + w * sums.centred[i]!, 0) / totalWeight;
    const between = weights.reduce((sum, w, i) => sum + w * (sums.centred[i]! - weightedMean) ** 2, 0) / (k - 1);
    const lambda = weights.reduce((sum, w, i) => sum + (1 - w / totalWeight) ** 2 / (sums.n[i]! - 1), 0);
    const f = between / (1 + (2 * (k - 2) * lambda) / (k * k - 1));
    const df1 = k - 1;
    const df2 = (k * k - 1) / (3 * lambda);
    const omegaSquared = (df1 * (f - 1)) / (df1 * (f - 1) + sums.total);
    const ssTotal = sums.ssBetween + sums.ssWithin;
    const pairVariance = (i: number) => sums.variances[i]! / sums.n[i]!;
    return {
      statistic: {name: 'F', value: f},
      df: [df1, df2],
      p: fSf(f, df1, df2),
      estimate: largestDifference({
        labels: sums.labels,
        means: sums.centred,
        pair: (i, j) => {
          const [vi, vj] = [pairVariance(i), pairVariance(j)];
          const df = (vi + vj) ** 2 / (vi ** 2 / (sums.n[i]! - 1) + vj ** 2 / (sums.n[j]! - 1));
          return {se: Math.sqrt(vi + vj), df};
        },
        confidence: options.confidence,
      }),
      effect: {
        name: 'omega-squared',
        value: omegaSquared,
        ci: etaSquaredInterval(f, df1, df2, sums.total, options.confidence),
      },
      sensitivity: anovaSensitivity({weights, df1, df2, alpha: options.alpha, smallestEffect: options.smallestEffect}),
      details: {
        anova_table: {
          between: {ss: sums.ssBetween, df: df1, ms: sums.ssBetween / df1},
          within: {ss: sums.ssWithin, df: sums.total - k, ms: sums.ssWithin / (sums.total - k)},
          total: {ss: ssTotal, df: sums.total - 1},
        },
        r_squared: sums.ssBetween / ssTotal,
      },
    };
  },
};
