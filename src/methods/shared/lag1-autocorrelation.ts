import {accurateMean} from './summarize.js';

/**
 * Lag-1 sample autocorrelation, r(1) = Σ_{i≥2} (y_i − ȳ)(y_{i−1} − ȳ) /
 * Σ (y_i − ȳ)², the definition of the NIST StRD univariate files. Rows are
 * taken in file order, so it speaks of drift or carry-over between
 * successive measurements. Use the exactly centred values where available:
 * the statistic is shift-invariant.
 */
export function lag1Autocorrelation(values: Float64Array): number {
  const n = values.length;
  if (n < 2) return NaN;
  const mean = accurateMean(values);
  let numerator = 0;
  let denominator = 0;
  let previous = values[0]! - mean;
  denominator += previous * previous;
  for (let i = 1; i < n; i++) {
    const current = values[i]! - mean;
    numerator += current * previous;
    denominator += current * current;
    previous = current;
  }
  return numerator / denominator;
}
