import {MethodError} from '../method-error.js';
import type {Alternative, MethodNote, Sensitivity} from '../types.js';
import {twoProportionDetectable, twoProportionPower} from './two-proportion-power.js';

/**
 * Sensitivity of the two-proportion z test as designed (never "observed
 * power"): the power to detect the declared smallest difference in
 * proportions at the block's alpha and group sizes, and the smallest
 * difference detectable with 80% power (shared/two-proportion-power.ts).
 *
 * Power depends on where the difference sits, so the first group's observed
 * proportion p₁ is taken as the baseline (reported as
 * `sensitivity_baseline`) and p₂ = p₁ ± δ: upwards for `greater`,
 * downwards for `less`, and for two-sided tests towards ½, where the
 * variance and so the difference needed are larger. When no difference
 * within [0, 1] reaches 80% power, or the declared one leaves [0, 1], the
 * result says so in a warning instead.
 */
export interface TwoProportionSensitivityInput {
  readonly p1: number;
  readonly n1: number;
  readonly n2: number;
  readonly alpha: number;
  readonly alternative: Alternative;
  /** Smallest difference in proportions of interest (its sign is ignored). */
  readonly smallestEffect: number | undefined;
}

export interface TwoProportionSensitivity {
  readonly sensitivity: Sensitivity | undefined;
  readonly baseline: number | undefined;
  readonly warnings: readonly MethodNote[];
}

export function twoProportionSensitivity(input: TwoProportionSensitivityInput): TwoProportionSensitivity {
  const {p1, n1, n2, alpha, alternative, smallestEffect} = input;
  if (smallestEffect !== undefined && !(Math.abs(smallestEffect) > 0 && Math.abs(smallestEffect) < 1)) {
    throw new MethodError(
      `\`smallest-effect\` of the two-proportion z test is a difference in proportions and must lie strictly between 0 and 1; it is ${smallestEffect}.`,
      'Write it as a proportion, e.g. `smallest-effect: 0.1` for ten percentage points.',
    );
  }
  const direction: 1 | -1 = alternative === 'greater' ? 1 : alternative === 'less' ? -1 : p1 <= 0.5 ? 1 : -1;
  const base = {p1, n1, n2, alpha, alternative};
  const warnings: MethodNote[] = [];
  let power: number | null = null;
  if (smallestEffect !== undefined) {
    const p2 = p1 + direction * Math.abs(smallestEffect);
    if (p2 >= 0 && p2 <= 1) power = twoProportionPower({...base, p2});
    else warnings.push({kind: 'smallest-effect-out-of-range', smallest: Math.abs(smallestEffect), bound: direction === 1 ? 1 : 0, baseline: p1});
  }
  const detectable = twoProportionDetectable(base, direction, 0.8);
  if (detectable === null) {
    warnings.push({kind: 'no-sensitivity', baseline: p1, n1, n2});
    return {sensitivity: undefined, baseline: undefined, warnings};
  }
  return {sensitivity: {power_at_smallest_effect: power, min_detectable_effect_80: detectable}, baseline: p1, warnings};
}
