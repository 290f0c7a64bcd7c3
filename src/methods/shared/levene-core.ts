import {fSf} from '../../distributions/fisher-f.js';
import type {Sample} from '../types.js';
import {accurateMean, sampleVariance, summarize} from './summarize.js';

/**
 * Tests of equal spread across k groups: a one-way ANOVA on the absolute
 * deviations z_ij = |x_ij − c_i| from each group's centre c_i,
 *
 *   F = [(N − k) Σ n_i (z̄_i − z̄)²] / [(k − 1) Σ Σ (z_ij − z̄_i)²]  on (k − 1, N − k) df.
 *
 * With c_i the group mean this is Levene's test (Levene 1960, in Olkin et
 * al., "Contributions to Probability and Statistics", Stanford, pp.
 * 278–292); with the group median it is the Brown–Forsythe test (Brown &
 * Forsythe 1974, JASA 69:364–367, their W50), which keeps its level under
 * skewed and heavy-tailed data.
 *
 * Numerics: group means of z are compensated sums, the within-group sum of
 * squares is the corrected two-pass variance of each group (Chan, Golub &
 * LeVeque 1983) and the between-group sum is formed from differences of
 * means, so no sum of squares is a difference of large numbers. The upper
 * tail comes from the F survival function. Against F in exact rational
 * arithmetic on the printed decimals and a 40-digit p (GEAR, SciPy docs and
 * Real Statistics data): 14+ digits in F, 13+ in p (test/methods/shared).
 *
 * @example levene([{label: 'a', values: Float64Array.of(1, 2, 4)}, {label: 'b', values: Float64Array.of(1, 5, 9)}], 'mean')
 * // {f: 1.24840764331210…, df1: 1, df2: 4, p: 0.32643504953312…}
 */
export type LeveneCentre = 'mean' | 'median';

export interface LeveneResult {
  readonly f: number;
  readonly df1: number;
  readonly df2: number;
  readonly p: number;
}

/**
 * Levene (`mean`) or Brown–Forsythe (`median`) F test over two or more
 * groups. F and p are NaN when the test is undefined: fewer observations
 * than groups plus one, or absolute deviations constant within every group
 * (as with groups of two under mean centring). The `levene` and
 * `brown-forsythe` methods turn that into an author-facing error.
 */
export function levene(samples: readonly Sample[], centre: LeveneCentre): LeveneResult {
  const k = samples.length;
  if (k < 2) throw new Error(`levene: needs at least two groups, got ${k}`);
  if (centre !== 'mean' && centre !== 'median') throw new Error(`levene: unknown centre "${String(centre)}"`);
  let n = 0;
  const means: number[] = [];
  let within = 0;
  for (const sample of samples) {
    const values = sample.centred ?? sample.values; // deviations are shift-invariant: use the exact decimal centring
    if (values.length === 0) throw new Error('levene: every group needs at least one value');
    const z = absoluteDeviations(values, centre);
    const mean = accurateMean(z);
    means.push(mean);
    if (z.length > 1) within += sampleVariance(z, mean) * (z.length - 1);
    n += z.length;
  }
  const df1 = k - 1;
  const df2 = n - k;
  // The between-group sum is least at the true grand mean, so rounding in
  // it changes the sum only at second order.
  let grand = 0;
  samples.forEach((s, i) => (grand += (s.values.length * means[i]!) / n));
  let between = 0;
  samples.forEach((s, i) => (between += s.values.length * (means[i]! - grand) ** 2));
  if (!(df2 > 0) || !(within > 0)) return {f: NaN, df1, df2, p: NaN};
  const f = (between / df1) / (within / df2);
  return {f, df1, df2, p: fSf(f, df1, df2)};
}

function absoluteDeviations(values: Float64Array, centre: LeveneCentre): Float64Array {
  const c = centre === 'mean' ? accurateMean(values) : summarize(values).median;
  return values.map((v) => Math.abs(v - c));
}
