import {findRoot} from '../../distributions/find-root.js';
import {normalCdf, normalQuantile, normalSf} from '../../distributions/normal.js';
import type {Alternative} from '../types.js';

/**
 * Power of the pooled two-proportion z test by the normal approximation
 * (Fleiss, Levin & Paik 2003, "Statistical Methods for Rates and
 * Proportions", 3rd ed., ch. 4): with δ = p₂ - p₁, the pooled proportion
 * p̄ = (n₁p₁ + n₂p₂)/(n₁ + n₂) the test standardizes by, its null standard
 * error s₀ = √(p̄q̄(1/n₁ + 1/n₂)) and the true one s₁ = √(p₁q₁/n₁ + p₂q₂/n₂),
 *
 *   greater:   Φ((δ - z_{1-α} s₀) / s₁)
 *   less:      Φ((-δ - z_{1-α} s₀) / s₁)
 *   two-sided: Φ((δ - z_{1-α/2} s₀) / s₁) + Φ((-δ - z_{1-α/2} s₀) / s₁)
 *
 * With n₁ = n₂ this is R's power.prop.test(strict = TRUE) (R source
 * src/library/stats/R/power.R), which counts both rejection regions as the
 * t-test power here does. Critical values are taken as -Φ⁻¹(α), never
 * Φ⁻¹(1 - α), so tiny α keeps its digits.
 */
export interface TwoProportionPowerInput {
  readonly p1: number;
  readonly p2: number;
  readonly n1: number;
  readonly n2: number;
  readonly alpha: number;
  readonly alternative: Alternative;
}

export function twoProportionPower(input: TwoProportionPowerInput): number {
  const {p1, p2, n1, n2, alpha, alternative} = input;
  if (!(p1 >= 0 && p1 <= 1 && p2 >= 0 && p2 <= 1 && n1 > 0 && n2 > 0 && alpha > 0 && alpha < 1)) return NaN;
  const pooled = (n1 * p1 + n2 * p2) / (n1 + n2);
  const s0 = Math.sqrt(pooled * (1 - pooled) * (1 / n1 + 1 / n2));
  const s1 = Math.sqrt((p1 * (1 - p1)) / n1 + (p2 * (1 - p2)) / n2);
  const delta = p2 - p1;
  const z = -normalQuantile(alternative === 'two-sided' ? alpha / 2 : alpha);
  const reject = (shift: number): number => {
    const margin = shift - z * s0;
    // With s₁ = 0 the difference is certain: the test rejects exactly when it clears the margin.
    if (s1 === 0) return margin > 0 ? 1 : 0;
    return margin >= 0 ? normalCdf(margin / s1) : normalSf(-margin / s1);
  };
  if (alternative === 'greater') return reject(delta);
  if (alternative === 'less') return reject(-delta);
  return reject(delta) + reject(-delta);
}

/**
 * The smallest |δ| at which the test reaches `power` when p₁ is held at
 * `p1` and p₂ = p₁ + direction·|δ| stays within [0, 1]; null when even the
 * largest such δ falls short.
 */
export function twoProportionDetectable(
  base: Omit<TwoProportionPowerInput, 'p2'>,
  direction: 1 | -1,
  power: number,
): number | null {
  const room = direction === 1 ? 1 - base.p1 : base.p1;
  // Clamped: p₁ + (1 - p₁) can round above 1.
  const p2 = (size: number) => Math.min(1, Math.max(0, base.p1 + direction * size));
  const shortfall = (size: number) => twoProportionPower({...base, p2: p2(size)}) - power;
  if (!(room > 0) || !(shortfall(room) >= 0)) return null;
  if (shortfall(0) >= 0) return 0;
  return findRoot(shortfall, 0, room);
}
