import {MethodError} from '../method-error.js';
import type {ProportionDesign} from '../types.js';

/**
 * The checks both one-sample proportion tests share: at least one trial,
 * and a null proportion (`mu`) strictly between 0 and 1 — at 0 or 1 a single
 * opposite outcome refutes the null outright and no test is needed.
 */
export function checkProportion(design: ProportionDesign, mu: number, title: string): void {
  const {successes, trials} = design;
  if (!Number.isInteger(trials) || !Number.isInteger(successes) || successes < 0 || successes > trials) {
    throw new Error(`${title}: invalid counts (${successes} of ${trials})`);
  }
  if (trials === 0) throw new MethodError(`${title} has no observations to test.`, 'Check the where filter and the missing values.');
  if (!(mu > 0 && mu < 1)) {
    throw new MethodError(`${title} compares the proportion of “${design.success}” with \`mu\`, which must lie strictly between 0 and 1; it is ${mu}.`, 'Set `mu` to the null proportion, e.g. `mu: 0.5`.');
  }
}

/**
 * Cohen's h = 2 asin √p₁ - 2 asin √p₀, the difference of two proportions on
 * the arcsine (variance-stabilizing) scale (Cohen 1988, "Statistical Power
 * Analysis for the Behavioral Sciences", 2nd ed., §6.2).
 */
export function cohensH(p: number, reference: number): number {
  return arcsine(p) - arcsine(reference);
}

/** 2 asin √p, the arcsine transformation (φ in Cohen's notation), 0 to π. */
export function arcsine(p: number): number {
  return 2 * Math.asin(Math.sqrt(p));
}
