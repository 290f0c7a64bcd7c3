import {studentTCdf, studentTQuantile, studentTSf} from '../../distributions/student-t.js';
import type {Alternative} from '../types.js';

/**
 * The inference shared by every t test: statistic, p-value and confidence
 * interval for an estimate with a standard error and degrees of freedom.
 * Upper tails come from the survival function, never `1 - cdf`, so small
 * p-values keep their digits.
 */
export interface TInference {
  readonly t: number;
  readonly p: number;
  readonly ci: readonly [number, number];
}

export interface TInferenceInput {
  readonly estimate: number;
  readonly se: number;
  readonly df: number;
  /** Value of the estimate under the null hypothesis. */
  readonly nullValue: number;
  readonly alternative: Alternative;
  readonly confidence: number;
}

export function tInference(input: TInferenceInput): TInference {
  const {estimate, se, df, nullValue, alternative, confidence} = input;
  const t = (estimate - nullValue) / se;
  return {t, p: tPValue(t, df, alternative), ci: tInterval(estimate, se, df, alternative, confidence)};
}

export function tPValue(t: number, df: number, alternative: Alternative): number {
  if (alternative === 'greater') return studentTSf(t, df);
  if (alternative === 'less') return studentTCdf(t, df);
  return Math.min(1, 2 * studentTSf(Math.abs(t), df));
}

/** Two-sided interval, or the one-sided bound matching the alternative. */
function tInterval(
  estimate: number,
  se: number,
  df: number,
  alternative: Alternative,
  confidence: number,
): readonly [number, number] {
  if (alternative === 'two-sided') {
    const half = studentTQuantile(1 - (1 - confidence) / 2, df) * se;
    return [estimate - half, estimate + half];
  }
  const half = studentTQuantile(confidence, df) * se;
  return alternative === 'greater' ? [estimate - half, Infinity] : [-Infinity, estimate + half];
}
