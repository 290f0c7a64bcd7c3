import {MethodError} from '../method-error.js';
import type {BivariateDesign, Sample} from '../types.js';

export interface CorrelationPairs {
  readonly x: Sample;
  readonly y: Sample;
  readonly n: number;
}

/**
 * The validation every correlation shares: one predictor, row-aligned with
 * y, at least `minimum` pairs (the Fisher-z interval needs n > 3, Kendall's
 * n > 4), and neither variable constant (the coefficient would be 0/0).
 */
export function correlationPairs(design: BivariateDesign, title: string, minimum: number): CorrelationPairs {
  const [x, ...others] = design.x;
  if (!x || others.length > 0) throw new Error(`${title}: expected exactly one x sample, got ${design.x.length}`);
  const {y} = design;
  const n = y.values.length;
  if (x.values.length !== n) throw new Error(`${title}: x has ${x.values.length} values but y has ${n}`);
  if (n < minimum) {
    throw new MethodError(
      `${title} needs at least ${minimum} complete pairs of ${x.label} and ${y.label}, but the data have ${n}.`,
      'Collect more pairs, or check the where filter and the missing values that removed rows.',
    );
  }
  for (const sample of [x, y]) {
    if (sample.values.every((value) => value === sample.values[0])) {
      throw new MethodError(
        `${sample.label} is constant (every value is ${sample.values[0]}), so its correlation with ${sample === x ? y.label : x.label} is undefined.`,
        'Check the column and the where filter; a correlation needs variation in both variables.',
      );
    }
  }
  return {x, y, n};
}
