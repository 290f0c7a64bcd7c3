import {spreadTestOutcome} from './shared/spread-test.js';
import type {KGroupDesign, MethodDefinition} from './types.js';

/**
 * Levene's test of equal variances (Levene 1960, "Robust tests for equality
 * of variances", in Olkin et al. (eds), Contributions to Probability and
 * Statistics, Stanford University Press, pp. 278–292): a one-way ANOVA F on
 * the absolute deviations from each group's mean, on (k − 1, N − k) df.
 * Less robust than the median-centred `brown-forsythe` when data are skewed
 * (Brown & Forsythe 1974). Computation and accuracy: shared/levene-core.ts.
 *
 * @example F(3, 28) = 0.18815, p = 0.90357 on the Real Statistics example (scipy `levene(center='mean')`).
 */
export const levene: MethodDefinition<KGroupDesign> = {
  id: 'levene',
  title: 'Levene’s test',
  design: 'k-group',
  question: 'diagnostic',
  compute(design) {
    return spreadTestOutcome(design, 'mean', 'Levene’s test');
  },
};
