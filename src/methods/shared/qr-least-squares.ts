/**
 * Linear least squares min ‖y − Xb‖ by Householder QR (Golub & Van Loan
 * 2013, "Matrix Computations", 4th ed., Algorithm 5.1.1 for the Householder
 * vector, 5.2.1 for the factorization, §5.3.3 for its use in least
 * squares), never the normal equations, whose condition number is the
 * square of X's (Golub & Van Loan §5.3.2; Longley 1967, JASA 62:819–841).
 * QR is backward stable, so when the residuals are small the coefficients
 * lose about log10 κ(X) digits, where the normal equations lose
 * 2·log10 κ(X) whatever the residuals.
 *
 * Rank: a column whose remaining norm after the earlier reflections is below
 * 1e-7 of its original norm is reported as collinear, the default tolerance
 * of R's lm (LINPACK dqrdc2). Callers centre the columns first when the
 * model has an intercept, which removes the collinearity with the constant
 * column that makes raw polynomial and time-trend data ill-conditioned.
 *
 * Residuals are computed directly as y − Xb; the unscaled covariance of b is
 * R⁻¹R⁻ᵀ, kept as R⁻¹ so that variances are sums of squares.
 */
export interface QrFit {
  readonly kind: 'fit';
  readonly coefficients: Float64Array;
  /** R⁻¹, upper triangular, by rows: Cov(b) = σ² R⁻¹R⁻ᵀ. */
  readonly rInverse: readonly Float64Array[];
  readonly residuals: Float64Array;
  /** ‖Q₁ᵀy‖²: the sum of squares the columns explain (no cancellation). */
  readonly explainedSumOfSquares: number;
}

export interface QrCollinear {
  readonly kind: 'collinear';
  /** Index of the first column that depends on the earlier ones. */
  readonly column: number;
}

export const RANK_TOLERANCE = 1e-7;

export function qrLeastSquares(columns: readonly Float64Array[], y: Float64Array): QrFit | QrCollinear {
  const p = columns.length;
  const n = y.length;
  if (p === 0 || p > n || columns.some((c) => c.length !== n)) {
    throw new Error(`qrLeastSquares: need 1 to ${n} columns of length ${n}`);
  }
  const a = columns.map((c) => Float64Array.from(c));
  const qty = Float64Array.from(y);
  const r = Array.from({length: p}, () => new Float64Array(p));
  for (let j = 0; j < p; j++) {
    const column = a[j]!;
    const original = norm(columns[j]!, 0);
    const sigma = norm(column, j);
    if (!(sigma > RANK_TOLERANCE * original)) return {kind: 'collinear', column: j};
    // v = x − αe₁ with α = −sign(x₀)‖x‖, so v₀ = x₀ + sign(x₀)‖x‖ never cancels.
    const x0 = column[j]!;
    const alpha = x0 >= 0 ? -sigma : sigma;
    const v = column.subarray(j);
    v[0] = x0 - alpha;
    const vtv = 2 * sigma * (sigma + Math.abs(x0));
    for (let k = j + 1; k < p; k++) reflect(v, a[k]!.subarray(j), vtv);
    reflect(v, qty.subarray(j), vtv);
    r[j]![j] = alpha;
    for (let k = j + 1; k < p; k++) r[j]![k] = a[k]![j]!;
  }
  const coefficients = new Float64Array(p);
  for (let i = p - 1; i >= 0; i--) {
    let s = qty[i]!;
    for (let k = i + 1; k < p; k++) s -= r[i]![k]! * coefficients[k]!;
    coefficients[i] = s / r[i]![i]!;
  }
  const residuals = Float64Array.from(y);
  for (let k = 0; k < p; k++) {
    const b = coefficients[k]!;
    const c = columns[k]!;
    for (let i = 0; i < n; i++) residuals[i] = residuals[i]! - b * c[i]!;
  }
  return {
    kind: 'fit',
    coefficients,
    rInverse: upperInverse(r),
    residuals,
    explainedSumOfSquares: sumOfSquares(qty.subarray(0, p)),
  };
}

/** x ← (I − 2vvᵀ/vᵀv) x. */
function reflect(v: Float64Array, x: Float64Array, vtv: number): void {
  let s = 0;
  for (let i = 0; i < v.length; i++) s += v[i]! * x[i]!;
  const f = (2 * s) / vtv;
  for (let i = 0; i < v.length; i++) x[i] = x[i]! - f * v[i]!;
}

/** ‖x[from…]‖, scaled so that squares neither overflow nor underflow. */
function norm(x: Float64Array, from: number): number {
  let scale = 0;
  for (let i = from; i < x.length; i++) scale = Math.max(scale, Math.abs(x[i]!));
  if (scale === 0 || !Number.isFinite(scale)) return scale;
  let s = 0;
  for (let i = from; i < x.length; i++) s += (x[i]! / scale) ** 2;
  return scale * Math.sqrt(s);
}

export function sumOfSquares(x: Float64Array): number {
  const s = norm(x, 0);
  return s * s;
}

/** Inverse of an upper triangular matrix, column by column from the right. */
function upperInverse(r: readonly Float64Array[]): Float64Array[] {
  const p = r.length;
  const inverse = Array.from({length: p}, () => new Float64Array(p));
  for (let j = p - 1; j >= 0; j--) {
    inverse[j]![j] = 1 / r[j]![j]!;
    for (let i = j - 1; i >= 0; i--) {
      let s = 0;
      for (let k = i + 1; k <= j; k++) s += r[i]![k]! * inverse[k]![j]!;
      inverse[i]![j] = -s / r[i]![i]!;
    }
  }
  return inverse;
}
