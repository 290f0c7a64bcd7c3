import {summarize} from '../methods/shared/summarize.js';
import {tInference} from '../methods/shared/t-inference.js';

/**
 * Two-sided t interval for a sample's mean, mean ± t(1 − α/2, n − 1) · s/√n,
 * by the same code as the one-sample t test; undefined below two finite
 * values or with no spread, where there is no interval to draw.
 */
export function meanInterval(values: Float64Array, confidence: number): readonly [number, number] | undefined {
  const finite = values.filter(Number.isFinite);
  const {n, mean, sd} = summarize(finite);
  if (n < 2 || !(sd > 0)) return undefined;
  const se = sd / Math.sqrt(n);
  return tInference({estimate: mean, se, df: n - 1, nullValue: mean, alternative: 'two-sided', confidence}).ci;
}
