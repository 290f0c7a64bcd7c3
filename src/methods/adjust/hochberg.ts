import {stepAdjust} from './step-adjust.js';
import {validatePValues} from './validate-p-values.js';

/**
 * Hochberg's step-up adjustment: Holm's critical values α/(m − j + 1) used
 * from the largest p-value downwards. Controls the familywise error rate
 * for independent tests (and under positive dependence, Sarkar 1998); at
 * least as powerful as Holm.
 *
 * Hochberg, Y. (1988). A sharper Bonferroni procedure for multiple tests of
 * significance. Biometrika 75:800–802. With p_(1) ≤ … ≤ p_(m), reject
 * H_(1), …, H_(k) for the largest k with p_(k) ≤ α/(m − k + 1); the adjusted
 * value is therefore
 *   p̃_(i) = min(1, min_{j ≥ i} (m − j + 1) p_(j)).
 *
 * Example: hochberg([0.01, 0.04, 0.03]) → [0.03, 0.04, 0.04].
 */
export function hochberg(p: readonly number[]): number[] {
  validatePValues(p, 'hochberg');
  return stepAdjust(p, 'up', (j, m) => m - j + 1);
}
