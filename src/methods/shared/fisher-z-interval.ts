import {normalQuantile} from '../../distributions/normal.js';
import type {Alternative} from '../types.js';

/**
 * Confidence interval for a correlation through Fisher's z = atanh(r)
 * (Fisher 1921, Metron 1:3–32): z ± q·se, mapped back with tanh. The
 * standard error depends on the coefficient:
 * - Pearson r: 1/√(n−3) (Fisher 1921);
 * - Spearman rho: √((1 + rho²/2)/(n−3)) (Bonett & Wright 2000,
 *   Psychometrika 65:23–28, refining the 1.06/(n−3) of Fieller, Hartley &
 *   Pearson 1957, Biometrika 44:470–481);
 * - Kendall tau: √(0.437/(n−4)) (Fieller, Hartley & Pearson 1957, as
 *   recommended by Bonett & Wright 2000).
 * The last two are large-sample approximations, not exact intervals.
 * A one-sided alternative gives a one-sided interval bounded by ±1, the
 * convention of R's cor.test.
 */
export function fisherZInterval(
  r: number,
  se: number,
  alternative: Alternative,
  confidence: number,
): readonly [number, number] {
  const z = Math.atanh(r);
  if (alternative === 'two-sided') {
    const q = -normalQuantile((1 - confidence) / 2);
    return [Math.tanh(z - q * se), Math.tanh(z + q * se)];
  }
  const q = -normalQuantile(1 - confidence);
  return alternative === 'greater' ? [Math.tanh(z - q * se), 1] : [-1, Math.tanh(z + q * se)];
}

/** Fisher-z standard errors of the three coefficients for n pairs. */
export const fisherZSe = {
  pearson: (n: number): number => 1 / Math.sqrt(n - 3),
  spearman: (rho: number, n: number): number => Math.sqrt((1 + (rho * rho) / 2) / (n - 3)),
  kendall: (n: number): number => Math.sqrt(0.437 / (n - 4)),
};
