import {
  noncentralChiSquareNcpForCdf,
  noncentralChiSquareNcpForSf,
} from '../../distributions/noncentral-chi-square.js';

/**
 * A confidence interval for the noncentrality λ of a chi-square statistic
 * by inverting its noncentral distribution (Smithson 2003, "Confidence
 * Intervals", Sage QASS 140, ch. 4; Steiger 2004, Psychological Methods
 * 9:164): λ_L solves P(X ≥ x; λ) = α/2 and λ_U solves P(X ≤ x; λ) = α/2,
 * each at 0 when no λ ≥ 0 reaches it (a p-value at or above α/2 gives
 * λ_L = 0). Effect sizes follow by the same formula as their point estimate
 * with λ in place of X² — Cohen's w = √(λ/N), Cramér's V = √(λ/(N(k-1))) —
 * so the interval is for the population effect.
 */
export function noncentralityInterval(statistic: number, df: number, confidence: number): readonly [number, number] {
  if (!(confidence > 0 && confidence < 1)) throw new Error(`noncentralityInterval: invalid confidence ${confidence}`);
  // X² = 0 (observed counts equal to the expected ones) is the lowest value at every λ.
  if (!(statistic > 0)) return [0, 0];
  const alpha = (1 - confidence) / 2;
  return [noncentralChiSquareNcpForSf(statistic, df, alpha), noncentralChiSquareNcpForCdf(statistic, df, alpha)];
}
