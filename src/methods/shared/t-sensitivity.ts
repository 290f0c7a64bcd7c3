import type {Alternative, Sensitivity} from '../types.js';
import {tTestNcpForPower, tTestPower} from './t-power.js';

/**
 * Sensitivity of a t test as designed (never "observed power"): the power to
 * detect the declared smallest effect at the block's alpha and n, and the
 * smallest effect detectable with 80% power. `ncpPerUnit` converts an effect
 * in the outcome's units into the noncentrality parameter (e.g.
 * sqrt(n) / sd for one sample).
 */
export interface TSensitivityInput {
  readonly ncpPerUnit: number;
  readonly df: number;
  readonly alpha: number;
  readonly alternative: Alternative;
  readonly smallestEffect: number | undefined;
}

export function tSensitivity(input: TSensitivityInput): Sensitivity | undefined {
  const {ncpPerUnit, df, alpha, alternative, smallestEffect} = input;
  if (!(ncpPerUnit > 0) || !Number.isFinite(ncpPerUnit) || !(df > 0)) return undefined;
  // For `less` the effect of interest points downwards; power is symmetric.
  const sign = alternative === 'less' ? -1 : 1;
  const power =
    smallestEffect === undefined
      ? null
      : tTestPower({ncp: sign * smallestEffect * ncpPerUnit, df, alpha, alternative});
  const ncp80 = tTestNcpForPower({power: 0.8, df, alpha, alternative});
  return {power_at_smallest_effect: power, min_detectable_effect_80: Math.abs(ncp80) / ncpPerUnit};
}
