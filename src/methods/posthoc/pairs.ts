import {MethodError} from '../method-error.js';
import type {Sample} from '../types.js';

/** Every pair (i, j) with i < j, in level order: (0,1), (0,2), …, (1,2), … */
export function pairs(k: number): [number, number][] {
  const result: [number, number][] = [];
  for (let i = 0; i < k; i++) for (let j = i + 1; j < k; j++) result.push([i, j]);
  return result;
}

/**
 * The input checks every post-hoc method shares: at least two groups, each
 * with at least `minimum` observations (data problems, a `MethodError`),
 * and a confidence level in (0, 1) (a programmer error).
 */
export function checkGroups(samples: readonly Sample[], confidence: number, minimum: number, title: string): void {
  if (!(confidence > 0 && confidence < 1)) {
    throw new Error(`${title}: confidence must be in (0, 1), got ${String(confidence)}`);
  }
  if (samples.length < 2) {
    throw new MethodError(
      `${title} compares two or more groups, but the data have ${samples.length}.`,
      'Check the `by` column and any `where` filter.',
    );
  }
  const small = samples.find((s) => s.values.length < minimum);
  if (small) {
    const needed = minimum === 1 ? 'at least one observation' : `at least ${minimum} observations`;
    throw new MethodError(
      `${title} needs ${needed} in every group, but group ${small.label} has ${small.values.length}.`,
      'Collect more data for that group, or drop the level with a `where` filter.',
    );
  }
}
