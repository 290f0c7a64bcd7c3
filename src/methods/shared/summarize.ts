/**
 * Descriptive summary of one numeric sample: n, mean, sample SD (n - 1),
 * median, min, max.
 *
 * Accuracy: the mean is a Neumaier-compensated sum divided by n, then refined
 * by the mean of the residuals; the variance uses the corrected two-pass
 * algorithm (Chan, Golub & LeVeque 1983, "Algorithms for computing the sample
 * variance", The American Statistician 37(3), eq. 1.7) over compensated sums.
 * Checked against the NIST StRD univariate files (test/methods/shared).
 *
 * With `centred` (the values minus the column's first value, subtracted
 * exactly in decimal: `Sample.centred`), the SD is that of the centred data,
 * which is the same number without the rounding of the text to doubles
 * (NumAcc4: 10000000.2 has an ulp of 1.9e-9 against an SD of 0.1), and the
 * mean is the offset plus the centred mean. Median, min and max always come
 * from `values`.
 */
export interface Summary {
  readonly n: number;
  readonly mean: number;
  readonly sd: number;
  readonly median: number;
  readonly min: number;
  readonly max: number;
  /** `describe` blocks only: lag-1 autocorrelation of the rows in file order. */
  readonly lag1_autocorrelation?: number;
}

export function summarize(values: Float64Array, centred?: Float64Array): Summary {
  const n = values.length;
  if (n === 0) return {n: 0, mean: NaN, sd: NaN, median: NaN, min: NaN, max: NaN};
  if (centred !== undefined && centred.length !== n) throw new Error(`summarize: ${centred.length} centred values for ${n} values`);
  const centre = centred === undefined ? 0 : offsetOf(values, centred);
  const shifted = centred ?? values;
  const shiftedMean = accurateMean(shifted);
  const sorted = Float64Array.from(values).sort();
  return {
    n,
    mean: centre + shiftedMean,
    sd: Math.sqrt(sampleVariance(shifted, shiftedMean)),
    median: medianOfSorted(sorted),
    min: sorted[0]!,
    max: sorted[n - 1]!,
  };
}

/**
 * The offset of row-aligned `centred = values − offset`, as a double: read
 * at the smallest |centred[i]| (0 at the offset's own row), where the
 * roundings of values[i] and centred[i] are smallest.
 */
export function offsetOf(values: Float64Array, centred: Float64Array): number {
  let best = 0;
  for (let i = 1; i < centred.length; i++) if (Math.abs(centred[i]!) < Math.abs(centred[best]!)) best = i;
  return values[best]! - centred[best]!;
}

export function accurateMean(values: Float64Array): number {
  const n = values.length;
  const rough = compensatedSum(values, 0) / n;
  // One refinement step removes the rounding left in the first division.
  return rough + compensatedSum(values, rough) / n;
}

/** Sample variance (denominator n - 1); NaN below two observations. */
export function sampleVariance(values: Float64Array, mean = accurateMean(values)): number {
  const n = values.length;
  if (n < 2) return NaN;
  let squares = 0;
  let squaresCompensation = 0;
  let residuals = 0;
  for (let i = 0; i < n; i++) {
    const r = values[i]! - mean;
    residuals += r;
    const term = r * r;
    const t = squares + term;
    squaresCompensation += Math.abs(squares) >= Math.abs(term) ? squares - t + term : term - t + squares;
    squares = t;
  }
  return (squares + squaresCompensation - (residuals * residuals) / n) / (n - 1);
}

/** Neumaier's variant of Kahan summation of `values[i] - shift`. */
function compensatedSum(values: Float64Array, shift: number): number {
  let sum = 0;
  let compensation = 0;
  for (let i = 0; i < values.length; i++) {
    const term = values[i]! - shift;
    const t = sum + term;
    compensation += Math.abs(sum) >= Math.abs(term) ? sum - t + term : term - t + sum;
    sum = t;
  }
  return sum + compensation;
}

function medianOfSorted(sorted: Float64Array): number {
  const n = sorted.length;
  const mid = n >> 1;
  return n % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}
