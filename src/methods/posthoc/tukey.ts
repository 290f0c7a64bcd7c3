import {studentizedRangeQuantile, studentizedRangeSf} from '../../distributions/studentized-range.js';
import {MethodError} from '../method-error.js';
import {accurateMean, sampleVariance} from '../shared/summarize.js';
import type {PosthocComparison, Sample} from '../types.js';
import {checkGroups, pairs} from './pairs.js';

/**
 * Tukey's honestly significant difference for all pairs of k groups (Tukey
 * 1953, "The problem of multiple comparisons", unpublished manuscript), with
 * Kramer's standard error for unequal group sizes (the Tukey–Kramer method:
 * Kramer 1956, "Extension of multiple range tests to group means with
 * unequal numbers of replications", Biometrics 12:307-310; conservative for
 * unequal n, Hayter 1984, Ann. Statist. 12:61-75). With the mean square
 * error MSE pooled over all k groups on N - k df and
 * se = √(MSE/2 · (1/n_a + 1/n_b)):
 *
 *   q = |ȳ_b - ȳ_a| / se,  p = P(Q_{k,N-k} > q),
 *   simultaneous interval (ȳ_b - ȳ_a) ± q_{conf; k, N-k} · se,
 *
 * Q the studentized range (studentized-range.ts, 13+ digits). `statistic`
 * is q ≥ 0; the direction is in `estimate` (b - a). Groups of one
 * observation contribute their mean but no error df.
 *
 * Checked (test/methods/posthoc/tukey.test.ts): NIST e-Handbook and R
 * TukeyHSD to all printed digits, p-values and interval half-widths to 14
 * digits against mpmath, scipy’s tukey_hsd to 10-15 digits (equal and
 * unequal n), Student's t exactly for k = 2.
 *
 * @example NIST e-Handbook 7.4.7.1 data (4 groups of 5): level_2 - level_1
 * = 2.38, interval [0.2926…, 4.4674…], p = 0.02279…
 */
export function tukey(samples: readonly Sample[], confidence: number): PosthocComparison[] {
  checkGroups(samples, confidence, 1, 'Tukey’s HSD');
  const k = samples.length;
  const n = samples.map((s) => s.values.length);
  const means = samples.map((s) => accurateMean(s.values));
  const total = n.reduce((sum, size) => sum + size, 0);
  const df = total - k;
  if (df < 1) {
    throw new MethodError(
      'Tukey’s HSD needs at least one group with two or more observations to estimate the error variance.',
      'Collect more data per group.',
    );
  }
  // Within-group sums of squares, each about its own mean (corrected two-pass).
  const within = samples.reduce(
    (sum, s, i) => sum + (n[i]! > 1 ? (n[i]! - 1) * sampleVariance(s.values, means[i]) : 0),
    0,
  );
  const mse = within / df;
  if (!(mse > 0)) {
    throw new MethodError(
      'Tukey’s HSD needs variation within groups, but every group is constant.',
      'Check the data; with no within-group variation the differences cannot be tested.',
    );
  }
  const critical = studentizedRangeQuantile(confidence, k, df);
  return pairs(k).map(([i, j]) => {
    const difference = means[j]! - means[i]!;
    const se = Math.sqrt((mse / 2) * (1 / n[i]! + 1 / n[j]!));
    const q = Math.abs(difference) / se;
    return {
      a: samples[i]!.label,
      b: samples[j]!.label,
      estimate: difference,
      ci: [difference - critical * se, difference + critical * se],
      statistic: q,
      p_adjusted: studentizedRangeSf(q, k, df),
    };
  });
}
