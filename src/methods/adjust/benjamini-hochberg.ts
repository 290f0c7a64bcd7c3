import {stepAdjust} from './step-adjust.js';
import {validatePValues} from './validate-p-values.js';

/**
 * Benjamini–Hochberg step-up adjustment. Controls the false discovery rate
 * (expected share of false rejections among rejections) for independent
 * tests, and under positive regression dependence (Benjamini & Yekutieli
 * 2001, Theorem 1.2).
 *
 * Benjamini, Y. & Hochberg, Y. (1995). Controlling the false discovery
 * rate: a practical and powerful approach to multiple testing. Journal of
 * the Royal Statistical Society B 57:289–300, Section 3, procedure (1): with
 * p_(1) ≤ … ≤ p_(m), reject H_(1), …, H_(k) for the largest k with
 * p_(k) ≤ (k/m) q. The adjusted value is therefore
 *   p̃_(i) = min(1, min_{j ≥ i} (m/j) p_(j)).
 *
 * Example: benjaminiHochberg([0.01, 0.04, 0.03]) → [0.03, 0.04, 0.04].
 */
export function benjaminiHochberg(p: readonly number[]): number[] {
  validatePValues(p, 'benjaminiHochberg');
  return stepAdjust(p, 'up', benjaminiHochbergFactor);
}

/** m/j, shared with Benjamini–Yekutieli so BY ≥ BH holds bit for bit. */
export function benjaminiHochbergFactor(j: number, m: number): number {
  return m / j;
}
