import type {Sample} from '../types.js';
import {requireGroups} from './k-group-checks.js';
import {accurateMean, offsetOf, sampleVariance} from './summarize.js';

/**
 * Group sizes, means and variances and the one-way sums of squares, shared
 * by the classic and Welch ANOVA.
 *
 * Accuracy: every value is first shifted by a common offset, so that
 * data with many constant leading digits (NIST StRD SmLs04–09: 1e12 + 0.4)
 * are summed as the small numbers they differ by. When every sample carries
 * `centred` (the column's values minus its first value, subtracted exactly
 * in decimal by the data stage) those are used, and the digits the text
 * loses when rounded to doubles are kept; otherwise the values are shifted
 * by the first observation, exactly when they lie within a factor of two of
 * each other (Sterbenz's lemma). Group means are compensated and refined
 * (`accurateMean`); within-group sums of
 * squares use the corrected two-pass algorithm (Chan, Golub & LeVeque 1983,
 * Am. Stat. 37:242, eq. 1.7); the between-group sum Σ nᵢ(m̄ᵢ - m̄)² is taken
 * from centred means. Measured with exact decimal reading: at least 14.5
 * digits on every NIST StRD ANOVA file (test/methods/anova.test.ts).
 */
export interface OneWaySums {
  readonly labels: readonly string[];
  readonly n: readonly number[];
  /** Group means, in the outcome's units. */
  readonly means: readonly number[];
  /** Means minus the common offset: their differences keep every digit. */
  readonly centred: readonly number[];
  /** Sample variances (n - 1); NaN for a group of one. */
  readonly variances: readonly number[];
  readonly total: number;
  readonly ssBetween: number;
  readonly ssWithin: number;
}

/** Validates the groups (`requireGroups`) and sums them. */
export function oneWaySums(samples: readonly Sample[], title: string): OneWaySums {
  requireGroups(samples, title);
  const exact = samples.every((s) => s.centred !== undefined);
  const shift = exact ? offsetOf(samples[0]!.values, samples[0]!.centred!) : samples[0]!.values[0]!;
  const shifted = samples.map((s) => (exact ? s.centred! : s.values.map((v) => v - shift)));
  const all = new Float64Array(shifted.reduce((sum, v) => sum + v.length, 0));
  let offset = 0;
  for (const v of shifted) {
    all.set(v, offset);
    offset += v.length;
  }
  const grand = accurateMean(all);
  const centredMeans = shifted.map((v) => accurateMean(v));
  const variances = shifted.map((v, i) => sampleVariance(v, centredMeans[i]));
  let ssBetween = 0;
  let ssWithin = 0;
  for (let i = 0; i < samples.length; i++) {
    const n = shifted[i]!.length;
    ssBetween += n * (centredMeans[i]! - grand) ** 2;
    if (n > 1) ssWithin += (n - 1) * variances[i]!;
  }
  return {
    labels: samples.map((s) => s.label),
    n: shifted.map((v) => v.length),
    means: centredMeans.map((m) => m + shift),
    centred: centredMeans,
    variances,
    total: all.length,
    ssBetween,
    ssWithin,
  };
}

