import {chiSquareSf} from '../distributions/chi-square.js';
import {MethodError} from './method-error.js';
import {noncentralityInterval} from './shared/chi-square-noncentrality.js';
import {smallExpectedWarning} from './shared/contingency-table.js';
import type {CountsDesign, MethodDefinition} from './types.js';

/**
 * Pearson's chi-square goodness-of-fit test (Pearson 1900, Phil. Mag.
 * 50:157): X² = Σ (O - E)² / E on k - 1 df, with E = N·π the counts
 * expected under the declared proportions π (equal when none are declared).
 * Declared proportions that sum to 1 within 1e-6 are rescaled to sum to 1
 * exactly (as R's chisq.test(rescale.p = TRUE)).
 *
 * Effect size: Cohen's w = √(X²/N) (Cohen 1988, "Statistical Power Analysis
 * for the Behavioral Sciences", 2nd ed., ch. 7), with an interval for the
 * population w = √(λ/N) by inverting the noncentral chi-square distribution
 * (shared/chi-square-noncentrality.ts). Warns when an expected count is
 * below 5.
 *
 * @example counts 20, 15, 25 against equal proportions: X²(2) = 2.5, p = .2865
 */
export const chiSquareGof: MethodDefinition<CountsDesign> = {
  id: 'chi-square-gof',
  title: 'chi-square goodness-of-fit test',
  design: 'counts',
  question: 'fit',
  compute({levels, counts, expected: declared}, options) {
    const title = 'The chi-square goodness-of-fit test';
    if (options.alternative !== 'two-sided') {
      throw new MethodError(`${title} has no direction, so \`alternative: ${options.alternative}\` does not apply.`, 'Remove `alternative`.');
    }
    if (counts.length !== levels.length || (declared && declared.length !== levels.length)) {
      throw new Error(`${title}: ${levels.length} levels but ${counts.length} counts`);
    }
    if (levels.length < 2) {
      throw new MethodError(`${title} needs at least two levels; the data have ${levels.length}.`, 'Check the where filter and the outcome column.');
    }
    const total = counts.reduce((a, b) => a + b, 0);
    if (total === 0) throw new MethodError(`${title} has no observations to test.`, 'Check the where filter and the missing values.');
    const proportions = expectedProportions(levels, declared, title);
    const expected = proportions.map((p) => p * total);
    const impossible = levels.findIndex((_, i) => expected[i] === 0 && counts[i]! > 0);
    if (impossible >= 0) {
      throw new MethodError(
        `Level “${levels[impossible]}” is observed ${counts[impossible]} times but expected with proportion 0, so the data cannot come from the declared proportions.`,
        'Give the level a positive expected proportion, or check the data.',
      );
    }
    // Levels expected and observed 0 times add nothing to X² and are not counted in df.
    const used = levels.map((_, i) => i).filter((i) => expected[i]! > 0);
    const statistic = used.reduce((sum, i) => sum + (counts[i]! - expected[i]!) ** 2 / expected[i]!, 0);
    const df = used.length - 1;
    if (df < 1) {
      throw new MethodError(`${title} needs at least two levels with a positive expected proportion.`, 'Check `expected`.');
    }
    const [lower, upper] = noncentralityInterval(statistic, df, options.confidence);
    const toW = (chi2: number) => Math.sqrt(chi2 / total);
    const warning = smallExpectedWarning([used.map((i) => expected[i]!)], undefined);
    return {
      statistic: {name: 'χ²', value: statistic},
      df,
      p: chiSquareSf(statistic, df),
      effect: {name: 'cohens-w', value: toW(statistic), ci: [toW(lower), toW(upper)]},
      ...(warning ? {warnings: [warning]} : {}),
      details: {observed: counts, expected, expected_proportions: proportions},
    };
  },
};

function expectedProportions(levels: readonly string[], declared: readonly number[] | undefined, title: string): number[] {
  if (!declared) return levels.map(() => 1 / levels.length);
  const bad = declared.findIndex((p) => !(p >= 0 && p <= 1));
  if (bad >= 0) {
    throw new MethodError(`The expected proportion of “${levels[bad]}” is ${declared[bad]}; proportions lie between 0 and 1.`, 'Correct `expected`.');
  }
  const sum = declared.reduce((a, b) => a + b, 0);
  if (!(Math.abs(sum - 1) <= 1e-6)) {
    throw new MethodError(`The expected proportions of ${title.replace(/^The /, 'the ')} sum to ${sum}, not 1.`, 'Correct `expected` so that the proportions sum to 1.');
  }
  return declared.map((p) => p / sum);
}
