import {validatePValues} from './validate-p-values.js';

/**
 * Bonferroni adjustment: each p-value multiplied by the number of tests m,
 * capped at 1. Controls the familywise error rate under any dependence.
 *
 * Dunn, O. J. (1961). Multiple comparisons among means. Journal of the
 * American Statistical Association 56:52–64 (the inequality-based bound;
 * the adjusted form p·m is the one R's `p.adjust(method = "bonferroni")`
 * reports).
 *
 * Example: bonferroni([0.01, 0.04, 0.5]) → [0.03, 0.12, 1].
 */
export function bonferroni(p: readonly number[]): number[] {
  validatePValues(p, 'bonferroni');
  const m = p.length;
  return p.map((value) => Math.min(1, m * value));
}
