import {spreadTestOutcome} from './shared/spread-test.js';
import type {KGroupDesign, MethodDefinition} from './types.js';

/**
 * The Brown–Forsythe test of equal variances (Brown & Forsythe 1974,
 * "Robust tests for the equality of variances", JASA 69(346):364–367, the
 * statistic W50): Levene's F computed on absolute deviations from each
 * group's median, on (k − 1, N − k) df. It keeps its level under skewed and
 * heavy-tailed data where the mean-centred test does not. Computation and
 * accuracy: shared/levene-core.ts.
 *
 * @example F(9, 90) = 1.70592, p = 0.0991 on NIST's GEAR data (e-Handbook 1.3.5.10).
 */
export const brownForsythe: MethodDefinition<KGroupDesign> = {
  id: 'brown-forsythe',
  title: 'Brown–Forsythe test',
  design: 'k-group',
  question: 'diagnostic',
  compute(design) {
    return spreadTestOutcome(design, 'median', 'the Brown–Forsythe test');
  },
};
