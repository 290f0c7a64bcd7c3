import type {Alternative} from '../types.js';
import {tPValue} from './t-inference.js';

/**
 * The t test of a correlation coefficient against zero,
 * t = r √((n−2)/(1−r²)) on n − 2 df: exact for Pearson's r under bivariate
 * normality (Fisher 1915, Biometrika 10:507–521), and the usual large-sample
 * approximation for Spearman's rho (Zar 1972, JASA 67:578–580; the
 * approximation of scipy's spearmanr and R's cor.test above its exact range).
 * 1 − r² is formed as (1 − r)(1 + r), exact near |r| = 1.
 */
export interface CorrelationT {
  readonly t: number;
  readonly df: number;
  readonly p: number;
}

export function correlationT(r: number, n: number, alternative: Alternative): CorrelationT {
  const df = n - 2;
  const t = r * Math.sqrt(df / ((1 - r) * (1 + r)));
  if (!Number.isFinite(t)) {
    // |r| = 1: the statistic is infinite and the p-value its limit.
    const p = alternative === 'two-sided' ? 0 : (alternative === 'greater') === t > 0 ? 0 : 1;
    return {t, df, p};
  }
  return {t, df, p: tPValue(t, df, alternative)};
}
