import {normalQuantile, normalSf} from '../../distributions/normal.js';
import {MethodError} from '../method-error.js';
import {accurateMean, sampleVariance} from './summarize.js';

/**
 * The Shapiro–Wilk W test of normality (Shapiro & Wilk 1965, Biometrika
 * 52:591) computed by Royston's approximations: Royston 1992, "Approximating
 * the Shapiro-Wilk W-test for non-normality", Statistics and Computing
 * 2:117–119, as implemented in Algorithm AS R94 (Royston 1995, Applied
 * Statistics 44:547–551), complete samples only, 3 ≤ n ≤ 5000.
 *
 * Coefficients (Royston 1992): m_i = Φ⁻¹((i − 3/8)/(n + 1/4)); with
 * u = 1/√n the two outermost are corrected by quintic polynomials in u, the
 * rest are m_i/√φ, φ chosen so that Σa² = 1 (n = 4, 5 correct only the
 * outermost pair; n = 3 has a = ±√½ exactly).
 *
 * Significance (Royston 1992): n = 3 uses the exact null distribution of
 * Shapiro & Wilk 1965, p = (6/π)(asin √W − asin √¾); 4 ≤ n ≤ 11 the normal
 * approximation to −ln(γ − ln(1 − W)); n ≥ 12 that to ln(1 − W). Each with
 * mean and log-SD polynomials in n (small n) or ln n.
 *
 * Numerics: W is the squared correlation of the ordered data with a (as AS
 * R94 defines it), and 1 − W is computed directly as the residual sum of
 * squares of that regression over the total, so ln(1 − W) keeps its digits
 * near W = 1 (relative error about ε/√(1 − W), not ε/(1 − W)). Against a
 * 40-digit mpmath evaluation of the same formulas, n = 3 … 5000: 15 digits
 * in W, 14.5 in 1 − W, 12.7 in p (p ≈ 1e-58). scipy 1.17.1 `stats.shapiro`
 * agrees to 8.5+ digits in W only: its normal scores carry 7–9 digits
 * (test/methods/shared).
 *
 * @example shapiroWilk(Float64Array.of(148, 154, 158, 160, 161, 162, 166, 170, 182, 195, 236))
 * // {w: 0.788814694835387…, p: 0.00670381405650301…}
 */
export interface ShapiroWilkResult {
  readonly w: number;
  readonly p: number;
}

/** Royston 1992 polynomial corrections to a_n and a_{n−1}, coefficients of u⁰…u⁵. */
const LAST = [0, 0.221157, -0.147981, -2.07119, 4.434685, -2.706056];
const SECOND_LAST = [0, 0.042981, -0.293762, -1.752461, 5.682633, -3.582633];
/** Small samples (4 ≤ n ≤ 11): γ, μ and ln σ as polynomials in n. */
const SMALL_GAMMA = [-2.273, 0.459];
const SMALL_MEAN = [0.544, -0.39978, 0.025054, -6.714e-4];
const SMALL_LOG_SD = [1.3822, -0.77857, 0.062767, -0.0020322];
/** n ≥ 12: μ and ln σ as polynomials in ln n. */
const LARGE_MEAN = [-1.5861, -0.31082, -0.083751, 0.0038915];
const LARGE_LOG_SD = [-0.4803, -0.082676, 0.0030302];

export const SHAPIRO_WILK_MIN_N = 3;
export const SHAPIRO_WILK_MAX_N = 5000;

/** Horner evaluation of c[0] + c[1]x + c[2]x² + … */
function polynomial(c: readonly number[], x: number): number {
  let value = 0;
  for (let i = c.length - 1; i >= 0; i--) value = value * x + c[i]!;
  return value;
}

/**
 * The AS R94 coefficients a_1 … a_n for the ordered sample (antisymmetric:
 * a_i = −a_{n+1−i}; Σa² = 1).
 */
export function shapiroWilkCoefficients(n: number): Float64Array {
  if (!Number.isInteger(n) || n < SHAPIRO_WILK_MIN_N) throw new Error(`shapiroWilkCoefficients: n must be an integer ≥ 3, got ${n}`);
  const a = new Float64Array(n);
  const half = n >> 1;
  if (n === 3) {
    a[2] = Math.SQRT1_2;
  } else {
    // m_i for the upper half, i = n + 1 − j (positive scores).
    const m = new Float64Array(half);
    let mm = 0;
    for (let j = 0; j < half; j++) {
      m[j] = -normalQuantile((j + 1 - 0.375) / (n + 0.25));
      mm += m[j]! * m[j]!;
    }
    mm *= 2;
    const u = 1 / Math.sqrt(n);
    const root = Math.sqrt(mm);
    const aLast = m[0]! / root + polynomial(LAST, u);
    a[n - 1] = aLast;
    let corrected = 1;
    let phi = (mm - 2 * m[0]! ** 2) / (1 - 2 * aLast ** 2);
    if (n > 5) {
      const aSecond = m[1]! / root + polynomial(SECOND_LAST, u);
      a[n - 2] = aSecond;
      corrected = 2;
      phi = (mm - 2 * m[0]! ** 2 - 2 * m[1]! ** 2) / (1 - 2 * aLast ** 2 - 2 * aSecond ** 2);
    }
    const scale = 1 / Math.sqrt(phi);
    for (let j = corrected; j < half; j++) a[n - 1 - j] = m[j]! * scale;
  }
  for (let j = 0; j < half; j++) a[j] = -a[n - 1 - j]!;
  return a;
}

/**
 * W and its p-value (upper tail of the null distribution of ln(1 − W)).
 * Throws a `MethodError` outside 3 ≤ n ≤ 5000; a constant sample has no W
 * and gives `{w: NaN, p: NaN}` (the `shapiro-wilk` method reports it).
 */
export function shapiroWilk(values: Float64Array): ShapiroWilkResult {
  const n = values.length;
  if (n < SHAPIRO_WILK_MIN_N || n > SHAPIRO_WILK_MAX_N) {
    throw new MethodError(
      `the Shapiro–Wilk test needs between ${SHAPIRO_WILK_MIN_N} and ${SHAPIRO_WILK_MAX_N} observations; there are ${n}`,
      n < SHAPIRO_WILK_MIN_N ? 'Collect more data.' : 'Royston’s approximation is not calibrated above 5000; inspect a Q–Q plot instead.',
    );
  }
  const x = Float64Array.from(values).sort();
  // A typed-array sort puts NaN last.
  if (!Number.isFinite(x[0]!) || !Number.isFinite(x[n - 1]!)) throw new Error('shapiroWilk: values must be finite');
  // W is 0/0 for a constant sample: NaN, so an assumption check can skip it.
  if (x[0] === x[n - 1]) return {w: NaN, p: NaN};
  if (n === 3) return threePoints(x);
  const mean = accurateMean(x);
  const total = sampleVariance(x, mean) * (n - 1);
  const a = shapiroWilkCoefficients(n);
  let ax = 0;
  let aa = 0;
  for (let i = 0; i < n; i++) {
    ax += a[i]! * (x[i]! - mean);
    aa += a[i]! * a[i]!;
  }
  const slope = ax / aa;
  let residual = 0;
  for (let i = 0; i < n; i++) residual += (x[i]! - mean - slope * a[i]!) ** 2;
  const oneMinusW = Math.min(1, residual / total);
  return {w: 1 - oneMinusW, p: shapiroWilkPValue(n, oneMinusW)};
}

/** Royston's p-value for a sample of n ≥ 4 with statistic W, given as 1 − W. */
export function shapiroWilkPValue(n: number, oneMinusW: number): number {
  const logOneMinusW = Math.log(oneMinusW);
  if (n <= 11) {
    const gamma = polynomial(SMALL_GAMMA, n);
    // As ln(1 − W) approaches γ from below, z → +∞ and p → 0; beyond it the
    // approximation is undefined. Minimum W keeps real samples far below γ.
    if (logOneMinusW >= gamma) return 0;
    const y = -Math.log(gamma - logOneMinusW);
    return normalSf((y - polynomial(SMALL_MEAN, n)) / Math.exp(polynomial(SMALL_LOG_SD, n)));
  }
  const u = Math.log(n);
  return normalSf((logOneMinusW - polynomial(LARGE_MEAN, u)) / Math.exp(polynomial(LARGE_LOG_SD, u)));
}

/**
 * n = 3 in closed form: with gaps d1 = x2 − x1, d2 = x3 − x2 and
 * t = d1·d2/(d1² + d1·d2 + d2²), W = ¾(1 + t) and 4W − 3 = 3t, so the exact
 * p (Shapiro & Wilk 1965) is (6/π)·asin(3t / (2(√W + √(3(1 − W))))), the
 * difference of arcsines without cancellation near W = ¾.
 */
function threePoints(x: Float64Array): ShapiroWilkResult {
  // Gaps as fractions of the range, so their squares cannot overflow.
  const range = x[2]! - x[0]!;
  const d1 = (x[1]! - x[0]!) / range;
  const d2 = (x[2]! - x[1]!) / range;
  const t = (d1 * d2) / (d1 * d1 + d1 * d2 + d2 * d2);
  const w = 0.75 * (1 + t);
  const oneMinusW = 0.25 - 0.75 * t;
  const p = (6 / Math.PI) * Math.asin((3 * t) / (2 * (Math.sqrt(w) + Math.sqrt(3 * oneMinusW))));
  return {w, p: Math.min(1, p)};
}
