import {studentTQuantile} from '../distributions/student-t.js';
import {accurateMean} from '../methods/shared/summarize.js';

/** A fitted straight line and, where known, the confidence band of the mean response. */
export interface FittedLine {
  readonly intercept: number;
  readonly slope: number;
}

export interface BandPoint {
  readonly x: number;
  readonly fit: number;
  readonly lower: number;
  readonly upper: number;
}

export interface BandInput extends FittedLine {
  readonly x: Float64Array;
  /** Residual SD of the fit, σ̂ = √(SSE / (n − p − k)). */
  readonly residualSd: number;
  readonly residualDf: number;
  readonly confidence: number;
  /** Whether the model has an intercept (the band is then narrowest at x̄). */
  readonly hasIntercept: boolean;
  /** Points along the x range (default 41). */
  readonly steps?: number;
}

/**
 * Pointwise confidence band for the mean response of a simple linear
 * regression (Draper & Smith 1998, "Applied Regression Analysis", 3rd ed.,
 * §3.1; R's `predict(fit, interval = "confidence")`):
 *
 *   ŷ(x₀) ± t(1 − α/2, df) · σ̂ · √(1/n + (x₀ − x̄)² / Sxx)
 *
 * and through the origin ŷ(x₀) ± t · σ̂ · |x₀| / √Σx². Sxx is summed about a
 * compensated mean, so a large offset in x does not cost digits.
 */
export function regressionBand(input: BandInput): BandPoint[] {
  const x = input.x.filter(Number.isFinite);
  const n = x.length;
  let min = Infinity;
  let max = -Infinity;
  for (const v of x) {
    min = Math.min(min, v);
    max = Math.max(max, v);
  }
  const mean = input.hasIntercept ? accurateMean(x) : 0;
  let sxx = 0;
  for (const v of x) sxx += (v - mean) ** 2;
  const t = studentTQuantile(1 - (1 - input.confidence) / 2, input.residualDf);
  const steps = input.steps ?? 41;
  return Array.from({length: steps}, (_, i) => {
    const x0 = i === steps - 1 ? max : min + ((max - min) * i) / (steps - 1);
    const fit = input.intercept + input.slope * x0;
    const leverage = input.hasIntercept ? 1 / n + (x0 - mean) ** 2 / sxx : x0 ** 2 / sxx;
    const half = t * input.residualSd * Math.sqrt(leverage);
    return {x: x0, fit, lower: fit - half, upper: fit + half};
  });
}
