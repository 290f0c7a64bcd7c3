import type {MethodOptions, Sample} from '../../src/methods/types.js';

/** A sample from published data. */
export function sample(label: string, values: readonly number[]): Sample {
  return {label, values: Float64Array.from(values)};
}

export function options(overrides: Partial<MethodOptions> = {}): MethodOptions {
  return {
    alternative: 'two-sided',
    confidence: 0.95,
    alpha: 0.05,
    mu: 0,
    smallestEffect: undefined,
    posthoc: undefined,
    correction: 'none',
    intercept: true,
    ...overrides,
  };
}

/**
 * Digits of agreement of an interval, as centre and half-width. Comparing
 * the bounds themselves would punish a bound near zero for the cancellation
 * in `centre − half-width`, which both implementations suffer alike.
 */
export function intervalDigits(actual: readonly [number, number], expected: readonly [number, number], lre: (a: number, b: number) => number) {
  const centre = (ci: readonly [number, number]) => (ci[0] + ci[1]) / 2;
  const half = (ci: readonly [number, number]) => (ci[1] - ci[0]) / 2;
  return Math.min(lre(centre(actual), centre(expected)), lre(half(actual), half(expected)));
}

/**
 * Floor for p-values against scipy: two independent float64 implementations
 * of the t tail (scipy's cephes `stdtr` and ours) agree to about 11 digits
 * at these arguments; 10 keeps one digit of margin.
 */
export const pDigits = 10;

/**
 * Floor for interval half-widths against the examples' scipy 1.10 values.
 * Their t quantiles carry about 10.6 digits: t(.975, 9) there is
 * 2.262157162740992, while mpmath 1.3.0 at 40 digits gives
 * 2.2621571627982055426 (scipy 1.17.1 agrees with mpmath, and so does stet).
 */
export const intervalFloor = 9.5;
