import {hypergeometricPmf} from '../distributions/hypergeometric.js';
import {MethodError} from './method-error.js';
import {conditionalOddsRatio, type Table2x2} from './shared/conditional-odds-ratio.js';
import {tableMargins} from './shared/contingency-table.js';
import {eventRows} from './shared/event-rows.js';
import type {Alternative, ContingencyDesign, MethodDefinition} from './types.js';

/**
 * Fisher's exact test for a 2×2 table (Fisher 1935, JRSS 98:39; "The Design
 * of Experiments", ch. 2): conditional on the margins, the count a in the
 * first cell is hypergeometric under independence. One-sided p-values are
 * its tails; the two-sided p is the total probability of the tables no more
 * probable than the observed one, counting tables within a relative 1e-7 of
 * it as equal (R's fisher.test, src/library/stats/R/fisher.test.R, and
 * scipy.stats.fisher_exact use the same rule).
 *
 * The odds ratio compares the odds of the event level (`success`, else the
 * second row level) in the second column with those in the first, so
 * `greater` means higher odds in the second group; with the event in the
 * second row this is R's orientation, a·d / (b·c). Estimate and effect: the
 * conditional maximum-likelihood odds ratio with its exact conditional
 * interval (shared/conditional-odds-ratio.ts); the sample odds ratio ad/bc
 * (scipy's statistic) is the statistic and is repeated in `details`.
 *
 * @example the tea-tasting table [[3, 1], [1, 3]], greater: p = 0.2429, OR = 6.408
 */
export const fisherExact: MethodDefinition<ContingencyDesign> = {
  id: 'fisher-exact',
  title: 'Fisher’s exact test',
  design: 'contingency',
  question: 'independence',
  compute(design, options) {
    const {rows, columns} = design;
    if (rows.length !== 2 || columns.length !== 2) {
      throw new MethodError(
        `Fisher’s exact test here takes a 2×2 table; this one is ${rows.length} × ${columns.length}.`,
        'Use `test: chi-square` for larger tables, or keep two levels of each column (`levels:` and `where`).',
      );
    }
    tableMargins(design, 'Fisher’s exact test');
    const {event, other} = eventRows(design);
    const table: Table2x2 = [
      [design.counts[other]![0]!, design.counts[other]![1]!],
      [design.counts[event]![0]!, design.counts[event]![1]!],
    ];
    const [[a, b], [c, d]] = table;
    const oddsRatio = conditionalOddsRatio(table, options.confidence, options.alternative);
    const sampleOddsRatio = (a * d) / (b * c);
    return {
      statistic: {name: 'OR', value: sampleOddsRatio},
      df: null,
      p: fisherP(table, options.alternative),
      estimate: {
        name: `odds ratio of ${rows[event]} (${columns[1]} / ${columns[0]})`,
        value: oddsRatio.estimate,
        ci: oddsRatio.ci,
        level: options.confidence,
      },
      effect: {name: 'odds-ratio', value: oddsRatio.estimate, ci: oddsRatio.ci},
      variant: 'exact (conditional on the margins)',
      details: {observed: design.counts, sample_odds_ratio: sampleOddsRatio, event: rows[event]},
    };
  },
};

/** The p-value of Fisher's test of [[a, b], [c, d]]; `greater` is the upper tail of a. */
export function fisherP(table: Table2x2, alternative: Alternative): number {
  const [[a, b], [c, d]] = table;
  const population = a + b + c + d;
  const successes = a + c;
  const draws = a + b;
  const lo = Math.max(0, draws - (b + d));
  const hi = Math.min(draws, successes);
  const pmf = (i: number) => hypergeometricPmf(i, population, successes, draws);
  const observed = pmf(a);
  const bound = observed * (1 + 1e-7);
  let p = 0;
  for (let i = lo; i <= hi; i++) {
    const include = alternative === 'greater' ? i >= a : alternative === 'less' ? i <= a : i === a || pmf(i) <= bound;
    if (include) p += i === a ? observed : pmf(i);
  }
  return Math.min(1, p);
}
