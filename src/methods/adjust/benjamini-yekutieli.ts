import {benjaminiHochbergFactor} from './benjamini-hochberg.js';
import {stepAdjust} from './step-adjust.js';
import {validatePValues} from './validate-p-values.js';

/**
 * Benjamini–Yekutieli step-up adjustment: the Benjamini–Hochberg procedure
 * run at level q / c(m) with c(m) = Σ_{i=1}^{m} 1/i, which controls the
 * false discovery rate under any dependence between the tests.
 *
 * Benjamini, Y. & Yekutieli, D. (2001). The control of the false discovery
 * rate in multiple testing under dependency. Annals of Statistics
 * 29:1165–1188, Theorem 1.3. The adjusted value is therefore
 *   p̃_(i) = min(1, min_{j ≥ i} c(m) (m/j) p_(j)).
 *
 * Example: benjaminiYekutieli([0.01, 0.04, 0.03]) → [0.055, 0.0733…, 0.0733…]
 * (c(3) = 11/6).
 */
export function benjaminiYekutieli(p: readonly number[]): number[] {
  validatePValues(p, 'benjaminiYekutieli');
  const c = harmonicNumber(p.length);
  // c · (m/j) rounds to ≥ m/j because c ≥ 1, so BY ≥ BH survives rounding.
  return stepAdjust(p, 'up', (j, m) => c * benjaminiHochbergFactor(j, m));
}

/** Σ 1/i for i = 1..m, summed from the small terms up to keep their bits. */
function harmonicNumber(m: number): number {
  let sum = 0;
  for (let i = m; i >= 1; i--) sum += 1 / i;
  return sum;
}
