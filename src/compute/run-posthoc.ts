import {dunn} from '../methods/posthoc/dunn.js';
import {gamesHowell} from '../methods/posthoc/games-howell.js';
import {tukey} from '../methods/posthoc/tukey.js';
import type {Design, MethodOptions, PosthocComparison, Sample} from '../methods/types.js';

/**
 * Pairwise comparisons after a k-group test: the block's `posthoc`, or the
 * companion of its test (Tukey–Kramer after ANOVA, Games–Howell after
 * Welch's ANOVA, Dunn after Kruskal–Wallis). Two groups need none.
 */
const companions: Record<string, 'tukey' | 'games-howell' | 'dunn'> = {
  anova: 'tukey',
  'welch-anova': 'games-howell',
  'kruskal-wallis': 'dunn',
};

const procedures: Record<string, (samples: readonly Sample[], confidence: number) => PosthocComparison[]> = {
  tukey,
  'games-howell': gamesHowell,
  dunn,
};

export function runPosthoc(method: string, design: Design, options: MethodOptions): PosthocComparison[] | undefined {
  if (design.kind !== 'k-group' || design.samples.length < 3) return undefined;
  const chosen = options.posthoc ?? companions[method];
  if (chosen === undefined || chosen === 'none') return undefined;
  return procedures[chosen]!(design.samples, options.confidence);
}
