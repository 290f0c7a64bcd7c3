import {stepAdjust} from './step-adjust.js';
import {validatePValues} from './validate-p-values.js';

/**
 * Holm's sequentially rejective (step-down) Bonferroni adjustment. Controls
 * the familywise error rate under any dependence and is never less powerful
 * than Bonferroni.
 *
 * Holm, S. (1979). A simple sequentially rejective multiple test procedure.
 * Scandinavian Journal of Statistics 6:65–70. With p_(1) ≤ … ≤ p_(m), the
 * procedure rejects H_(1), …, H_(k) while p_(j) ≤ α/(m − j + 1); the
 * adjusted value is therefore
 *   p̃_(i) = min(1, max_{j ≤ i} (m − j + 1) p_(j)).
 *
 * Example: holm([0.01, 0.04, 0.03]) → [0.03, 0.06, 0.06].
 */
export function holm(p: readonly number[]): number[] {
  validatePValues(p, 'holm');
  return stepAdjust(p, 'down', (j, m) => m - j + 1);
}
