import {chiSquareSf} from '../distributions/chi-square.js';
import {MethodError} from './method-error.js';
import {binomialTestP} from './shared/binomial-test-p.js';
import {clopperPearsonInterval} from './shared/clopper-pearson.js';
import {newcombePairedInterval} from './shared/newcombe-interval.js';
import {zTestP} from './shared/z-test-p.js';
import type {Alternative, MethodDefinition, MethodOutcome, PairedCategoricalDesign} from './types.js';

/** Below this many discordant pairs the exact binomial test is used. */
const EXACT_BELOW = 25;

/**
 * McNemar's test for paired binary outcomes (McNemar 1947, Psychometrika
 * 12:153). Only the discordant pairs inform it: b subjects moved from the
 * first level to the second, c the other way, and under the null each
 * discordant pair is equally likely to go either way.
 *
 * With fewer than 25 discordant pairs (common practice) it is the exact
 * binomial test of b out of b + c against ½ (shared/binomial-test-p.ts);
 * otherwise the continuity-corrected X² = (|b - c| - 1)² / (b + c) on 1 df
 * (Edwards 1948, Psychometrika 13:185; R's mcnemar.test), or for a one-sided
 * alternative z = (b - c ∓ 1)/√(b + c). `variant` says which was used.
 *
 * Estimate: the change in the proportion at the second level, (b - c)/n,
 * second measurement minus first, with Newcombe's paired hybrid score
 * interval (shared/newcombe-interval.ts). Effect: the conditional odds ratio
 * b/c: given b + c, b is binomial with π = ψ/(1 + ψ), so the exact
 * interval maps the Clopper–Pearson interval of π = b/(b + c) through
 * ψ = π/(1 - π), consistent with the exact test.
 */
export const mcnemar: MethodDefinition<PairedCategoricalDesign> = {
  id: 'mcnemar',
  title: 'McNemar’s test',
  design: 'paired-categorical',
  compute({first, second, levels, table}, options) {
    const [[a, b], [c, d]] = table;
    const discordant = b + c;
    if (discordant === 0) {
      throw new MethodError(
        `McNemar’s test compares the pairs that changed between ${first} and ${second}, and no pair changed.`,
        'With no discordant pairs there is nothing to test; report the agreement instead.',
      );
    }
    const n = a + b + c + d;
    const [from, to] = levels;
    const exact = discordant < EXACT_BELOW;
    const test: Pick<MethodOutcome, 'statistic' | 'df' | 'p' | 'variant'> = exact
      ? {
          statistic: {name: 'b', value: b},
          df: null,
          p: binomialTestP(b, discordant, 0.5, options.alternative),
          variant: `exact binomial test (${discordant} discordant pairs, fewer than ${EXACT_BELOW})`,
        }
      : asymptotic(b, c, options.alternative);
    const pi = clopperPearsonInterval(b, discordant, options.confidence, options.alternative);
    const odds = (p: number) => (p === 1 ? Infinity : p / (1 - p));
    return {
      ...test,
      estimate: {
        name: `difference in proportions of ${to} (${second} - ${first})`,
        value: (b - c) / n,
        ci: newcombePairedInterval(table, options.confidence, options.alternative),
        level: options.confidence,
      },
      effect: {name: 'odds-ratio', value: b / c, ci: [odds(pi[0]), odds(pi[1])]},
      details: {
        observed: table,
        discordant: {[`${from} to ${to}`]: b, [`${to} to ${from}`]: c},
      },
    };
  },
};

function asymptotic(b: number, c: number, alternative: Alternative): Pick<MethodOutcome, 'statistic' | 'df' | 'p' | 'variant'> {
  if (alternative === 'two-sided') {
    const statistic = (Math.abs(b - c) - 1) ** 2 / (b + c);
    return {statistic: {name: 'χ²', value: statistic}, df: 1, p: chiSquareSf(statistic, 1), variant: 'chi-square approximation with continuity correction'};
  }
  // The correction moves b - c by 1 towards the null on the tested side.
  const z = (b - c + (alternative === 'greater' ? -1 : 1)) / Math.sqrt(b + c);
  return {statistic: {name: 'z', value: z}, df: null, p: zTestP(z, alternative), variant: 'normal approximation with continuity correction'};
}
