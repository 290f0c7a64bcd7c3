import {normalCdf, normalSf} from '../../distributions/normal.js';
import type {Alternative} from '../types.js';

/**
 * The p-value of a z statistic that is standard normal under the null:
 * P(Z ≥ z) for `greater`, P(Z ≤ z) for `less`, and 2·P(Z ≥ |z|) (at most 1)
 * for two-sided, each tail computed directly (never 1 - cdf).
 */
export function zTestP(z: number, alternative: Alternative): number {
  if (alternative === 'greater') return normalSf(z);
  if (alternative === 'less') return normalCdf(z);
  return Math.min(1, 2 * normalSf(Math.abs(z)));
}
