import {MethodError} from '../method-error.js';
import type {MethodNote, Sample} from '../types.js';
import type {OneWaySums} from './one-way-sums.js';

/** Preconditions and warnings shared by the k-group tests (ANOVA, Welch's ANOVA, Kruskal–Wallis). */

/** At least two groups, none empty: the shared precondition of every k-group test. */
export function requireGroups(samples: readonly Sample[], title: string): void {
  if (samples.length < 2) {
    throw new MethodError(`The ${title} needs at least two groups; found ${samples.length}.`, 'Check `by` and any `where` filter.');
  }
  const empty = samples.find((s) => s.values.length === 0);
  if (empty) {
    throw new MethodError(`Group ${empty.label} has no observations.`, 'Check `by` and any `where` filter, or drop the level.');
  }
}

/** The F and H tests of k groups have no direction: a one-sided `alternative` is a mistake. */
export function requireTwoSided(alternative: string, title: string): void {
  if (alternative !== 'two-sided') {
    throw new MethodError(
      `The ${title} compares all groups at once and has no direction; \`alternative: ${alternative}\` does not apply.`,
      'Remove `alternative`, or compare two groups with a two-sample test.',
    );
  }
}

/** Warnings when group SDs differ by more than a factor of 2 (a rule of thumb, a fact of the trade). */
export function spreadRatioWarning(sums: Pick<OneWaySums, 'labels' | 'variances'>, alternative: string): MethodNote[] {
  let low = -1;
  let high = -1;
  sums.variances.forEach((v, i) => {
    if (!(v > 0)) return;
    if (low < 0 || v < sums.variances[low]!) low = i;
    if (high < 0 || v > sums.variances[high]!) high = i;
  });
  if (low < 0) return [];
  const ratio = Math.sqrt(sums.variances[high]! / sums.variances[low]!);
  if (!(ratio > 2)) return [];
  return [{kind: 'spread-ratio', larger: sums.labels[high]!, smaller: sums.labels[low]!, ratio, alternative}];
}
