import {oneSampleTOutcome} from './shared/one-sample-t-outcome.js';
import type {MethodDefinition, PairedDesign} from './types.js';

/**
 * Paired t test: a one-sample t test on the within-pair differences
 * `second - first` (Student 1908). Effect: Hedges' g_z, the mean difference
 * over the SD of the differences with J on n - 1 df (Lakens 2013, eq. 6),
 * and its noncentral-t interval.
 */
export const pairedT: MethodDefinition<PairedDesign> = {
  id: 'paired-t',
  title: 'paired t test',
  design: 'paired',
  compute({first, second}, options) {
    const differences = second.values.map((value, i) => value - first.values[i]!);
    return oneSampleTOutcome(differences, options, {
      estimate: `mean difference (${second.label} - ${first.label})`,
      standardizer: 'standard deviation of the differences',
    });
  },
};
