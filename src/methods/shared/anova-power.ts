import {fQuantile} from '../../distributions/fisher-f.js';
import {noncentralFNcpForCdf, noncentralFSf} from '../../distributions/noncentral-f.js';
import type {Sensitivity} from '../types.js';

/**
 * Sensitivity of a one-way ANOVA as designed (never "observed power"): the
 * power to detect the declared `smallest-effect` at the block's alpha and
 * group sizes, and the smallest effect detectable with 80% power.
 *
 * Power comes from the noncentral F distribution of the statistic under the
 * alternative: P(F' > F_{1-α; ν₁, ν₂}; λ) (Tang 1938, Stat. Res. Mem. 2:126;
 * Cohen 1988, "Statistical Power Analysis", ch. 8), with noncentrality
 * λ = Σ wᵢ(μᵢ - μ̄_w)², wᵢ = nᵢ/σ², μ̄_w the w-weighted mean.
 *
 * How `smallest-effect` δ (outcome units) becomes λ: δ is read as the
 * largest difference between two group means, with every other mean at the
 * weighted grand mean, the least favourable spread of means for a given
 * range (Cohen 1988, ch. 8, pattern 1, "minimum variability"). Placing the
 * extremes on groups i and j gives λ = δ² wᵢwⱼ/(wᵢ + wⱼ); the power is
 * reported for the pair that makes it smallest, the two groups with the
 * least weight. With equal n and a pooled SD σ this is λ = nδ²/(2σ²), i.e.
 * Cohen's f = δ/(σ√(2k)) and λ = f²N.
 *
 * Classic ANOVA: wᵢ = nᵢ/MS_within, ν₂ = N - k. Welch's ANOVA: wᵢ = nᵢ/sᵢ²
 * (Welch's own weights) and ν₂ its adjusted df: a plain noncentral-F
 * approximation to the power of Welch's test, not an exact one (Jan & Shieh
 * 2014, Br. J. Math. Stat. Psychol. 67:72, compare more refined ones).
 */
export interface AnovaPowerInput {
  readonly ncp: number;
  readonly df1: number;
  readonly df2: number;
  /** Significance level, 0 < alpha < 1. */
  readonly alpha: number;
}

export interface AnovaSensitivityInput {
  /** Precision weight of each group, nᵢ/σᵢ² (σ in the outcome's units). */
  readonly weights: readonly number[];
  readonly df1: number;
  readonly df2: number;
  readonly alpha: number;
  /** Smallest effect of interest: a difference between two group means. */
  readonly smallestEffect: number | undefined;
}

/** Power of the F test whose statistic has noncentrality `ncp`. */
export function anovaPower(input: AnovaPowerInput): number {
  const {ncp, df1, df2, alpha} = input;
  if (!(alpha > 0 && alpha < 1)) return NaN;
  return noncentralFSf(fQuantile(1 - alpha, df1, df2), df1, df2, ncp);
}

/** The noncentrality at which the F test reaches `power` (0 when power ≤ alpha). */
export function anovaNcpForPower(power: number, df1: number, df2: number, alpha: number): number {
  if (!(alpha > 0 && alpha < 1) || !(power > 0 && power < 1)) return NaN;
  return noncentralFNcpForCdf(fQuantile(1 - alpha, df1, df2), df1, df2, 1 - power);
}

/** λ per squared unit of δ for the least favourable pair: the two smallest weights. */
export function ncpPerSquaredUnit(weights: readonly number[]): number {
  const [a, b] = [...weights].sort((x, y) => x - y);
  if (a === undefined || b === undefined) return NaN;
  return (a * b) / (a + b);
}

export function anovaSensitivity(input: AnovaSensitivityInput): Sensitivity | undefined {
  const {weights, df1, df2, alpha, smallestEffect} = input;
  const unit = ncpPerSquaredUnit(weights);
  if (!(unit > 0) || !Number.isFinite(unit) || !(df2 > 0)) return undefined;
  const power =
    smallestEffect === undefined ? null : anovaPower({ncp: unit * smallestEffect ** 2, df1, df2, alpha});
  const ncp80 = anovaNcpForPower(0.8, df1, df2, alpha);
  return {power_at_smallest_effect: power, min_detectable_effect_80: Math.sqrt(ncp80 / unit)};
}
