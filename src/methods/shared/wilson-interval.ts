import {normalQuantile} from '../../distributions/normal.js';
import type {Alternative} from '../types.js';

/**
 * The Wilson score interval for a binomial proportion (Wilson 1927, JASA
 * 22:209; Newcombe 1998, Stat Med 17:857, method 3): the p whose score test
 * does not reject, |p̂ - p| ≤ z √(p(1-p)/n). Its bounds are the roots of
 *
 *   (n + z²) p² - (2x + z²) p + x²/n = 0,
 *
 * the upper one taken as centre + half-width (no cancellation) and the lower
 * one as the product of the roots, x² / (n (n + z²)), divided by it, so a
 * small lower bound keeps its digits. This is R's prop.test(correct = FALSE)
 * interval. One-sided alternatives use z at the confidence level itself and
 * the other bound at the edge of [0, 1], as R and scipy report it.
 *
 * @example wilsonInterval(52, 100, 0.95, 'two-sided') // [0.42316577765…, 0.61535448241…]
 */
export function wilsonInterval(
  successes: number,
  trials: number,
  confidence: number,
  alternative: Alternative,
): readonly [number, number] {
  if (!(trials > 0) || !(successes >= 0 && successes <= trials) || !(confidence > 0 && confidence < 1)) {
    throw new Error(`wilsonInterval: invalid input (${successes} of ${trials}, confidence ${confidence})`);
  }
  const tail = alternative === 'two-sided' ? (1 - confidence) / 2 : 1 - confidence;
  const z = -normalQuantile(tail);
  const [lower, upper] = wilsonBounds(successes, trials, z);
  if (alternative === 'greater') return [lower, 1];
  if (alternative === 'less') return [0, upper];
  return [lower, upper];
}

/** Both roots of the score equation at critical value z. */
export function wilsonBounds(successes: number, trials: number, z: number): readonly [number, number] {
  const x = successes;
  const n = trials;
  const z2 = z * z;
  const denominator = n + z2;
  const upper = x === n ? 1 : (x + z2 / 2 + z * Math.sqrt((x * (n - x)) / n + z2 / 4)) / denominator;
  const lower = x === 0 ? 0 : (x * x) / (n * denominator) / upper;
  return [lower, upper];
}
