import {normalQuantile} from '../../distributions/normal.js';
import type {Alternative} from '../types.js';
import {wilsonBounds} from './wilson-interval.js';

/**
 * Newcombe's hybrid score ("square-and-add") intervals for a difference of
 * two proportions, built from the Wilson interval of each proportion.
 *
 * Independent samples (Newcombe 1998, Stat Med 17:873, method 10), for
 * δ = p₂ - p₁ with Wilson bounds (l₁, u₁) and (l₂, u₂):
 *
 *   L = δ - √((p₂ - l₂)² + (u₁ - p₁)²),   U = δ + √((u₂ - p₂)² + (p₁ - l₁)²).
 *
 * Paired samples (Newcombe 1998, Stat Med 17:2635, method 10) subtract the
 * covariance term 2φ̂(…)(…) inside each root, with φ̂ the continuity-corrected
 * phi coefficient of the paired table (0 when a margin is empty).
 *
 * One-sided alternatives take the Wilson bounds at z = Φ⁻¹(level), keep the
 * bound on the tested side and put the other at the edge of [-1, 1].
 */
export interface ProportionCount {
  readonly successes: number;
  readonly trials: number;
}

/** Interval for p₂ - p₁ from independent samples. */
export function newcombeInterval(
  first: ProportionCount,
  second: ProportionCount,
  confidence: number,
  alternative: Alternative,
): readonly [number, number] {
  return squareAndAdd(first, second, 0, confidence, alternative);
}

/**
 * Interval for the difference between the proportions of the second level
 * on the second and on the first measurement, (b - c)/n, from the paired
 * table [[a, b], [c, d]] (rows: first measurement; columns: second).
 */
export function newcombePairedInterval(
  table: readonly [readonly [number, number], readonly [number, number]],
  confidence: number,
  alternative: Alternative,
): readonly [number, number] {
  const [[a, b], [c, d]] = table;
  const n = a + b + c + d;
  const margins = (a + b) * (c + d) * (a + c) * (b + d);
  // Newcombe's correction shrinks a positive ad - bc by n/2 (to no less than 0).
  const cross = a * d - b * c;
  const adjusted = cross > n / 2 ? cross - n / 2 : cross >= 0 ? 0 : cross;
  const phi = margins === 0 ? 0 : adjusted / Math.sqrt(margins);
  // Proportions of the second level: first measurement (c + d)/n, second (b + d)/n.
  return squareAndAdd({successes: c + d, trials: n}, {successes: b + d, trials: n}, phi, confidence, alternative);
}

function squareAndAdd(
  first: ProportionCount,
  second: ProportionCount,
  phi: number,
  confidence: number,
  alternative: Alternative,
): readonly [number, number] {
  if (!(first.trials > 0 && second.trials > 0)) throw new Error('newcombeInterval: a sample has no trials');
  const tail = alternative === 'two-sided' ? (1 - confidence) / 2 : 1 - confidence;
  const z = -normalQuantile(tail);
  const p1 = first.successes / first.trials;
  const p2 = second.successes / second.trials;
  const [l1, u1] = wilsonBounds(first.successes, first.trials, z);
  const [l2, u2] = wilsonBounds(second.successes, second.trials, z);
  const delta = p2 - p1;
  const root = (x: number, y: number) => Math.sqrt(x * x + y * y - 2 * phi * x * y);
  const lower = delta - root(p2 - l2, u1 - p1);
  const upper = delta + root(u2 - p2, p1 - l1);
  if (alternative === 'greater') return [lower, 1];
  if (alternative === 'less') return [-1, upper];
  return [lower, upper];
}
