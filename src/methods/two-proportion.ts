import {normalQuantile} from '../distributions/normal.js';
import {MethodError} from './method-error.js';
import {conditionalOddsRatio} from './shared/conditional-odds-ratio.js';
import {smallExpectedWarning} from './shared/contingency-table.js';
import {newcombeInterval} from './shared/newcombe-interval.js';
import {arcsine} from './shared/proportion-checks.js';
import {twoProportionSensitivity} from './shared/two-proportion-sensitivity.js';
import {zTestP} from './shared/z-test-p.js';
import type {Alternative, ContingencyDesign, MethodDefinition, MethodNote} from './types.js';

/**
 * The two-proportion z test with the pooled standard error (Fleiss, Levin &
 * Paik 2003, "Statistical Methods for Rates and Proportions", 3rd ed.,
 * ch. 3; R's prop.test(correct = FALSE), whose X² is z²):
 * z = (p₂ - p₁) / √(p̄(1 - p̄)(1/n₁ + 1/n₂)), p̄ the pooled proportion, for
 * the proportion of `success` in the second level of `by` minus the first.
 *
 * Estimate: p₂ - p₁ with Newcombe's hybrid score interval (Newcombe 1998,
 * Stat Med 17:873, method 10). Effect: Cohen's h = 2 asin √p₂ - 2 asin √p₁
 * with the interval h ± z √(1/n₁ + 1/n₂) from the arcsine transformation's
 * variance 1/n (Cohen 1988, ch. 6), clipped to [-π, π].
 * Details: the risk ratio p₂/p₁ with the Katz log interval (Katz et al.
 * 1978, Biometrics 34:469; none when a group has no successes), and the
 * conditional maximum-likelihood odds ratio with its exact interval (as
 * Fisher's exact test reports it). Sensitivity: shared/two-proportion-sensitivity.ts.
 */
export const twoProportion: MethodDefinition<ContingencyDesign> = {
  id: 'two-proportion',
  title: 'two-proportion z test',
  design: 'contingency',
  question: 'proportion',
  needsSuccess: true,
  compute(design, options) {
    const {rows, columns, counts, success} = design;
    const title = 'The two-proportion z test';
    if (columns.length !== 2) {
      throw new MethodError(`${title} compares two groups; \`by\` has ${columns.length} levels here.`, 'Keep two levels with `levels: [a, b]`, or use `test: chi-square` for more groups.');
    }
    const row = success === undefined ? -1 : rows.indexOf(success);
    if (row < 0) throw new Error(`${title}: success level "${String(success)}" is not a row of the table`);
    const trials = [0, 1].map((j) => counts.reduce((sum, r) => sum + r[j]!, 0)) as [number, number];
    const successes = [counts[row]![0]!, counts[row]![1]!] as [number, number];
    const empty = trials.findIndex((n) => n === 0);
    if (empty >= 0) {
      throw new MethodError(`Group “${columns[empty]}” has no observations.`, 'Check the where filter and the declared levels.');
    }
    const [n1, n2] = trials;
    const [x1, x2] = successes;
    const p1 = x1 / n1;
    const p2 = x2 / n2;
    const pooled = (x1 + x2) / (n1 + n2);
    if (pooled === 0 || pooled === 1) {
      throw new MethodError(
        `Every observation in both groups is ${pooled === 1 ? '' : 'not '}“${success}”, so the proportions cannot differ and the z statistic is undefined.`,
        'Check the success level and the data.',
      );
    }
    const z = (p2 - p1) / Math.sqrt(pooled * (1 - pooled) * (1 / n1 + 1 / n2));
    const {alternative, confidence} = options;
    const first = {successes: x1, trials: n1};
    const second = {successes: x2, trials: n2};
    const h = arcsine(p2) - arcsine(p1);
    const expected = [trials.map((n) => n * pooled), trials.map((n) => n * (1 - pooled))];
    const warning = smallExpectedWarning(expected, 'fisher-exact');
    const sensitivity = twoProportionSensitivity({p1, n1, n2, alpha: options.alpha, alternative, smallestEffect: options.smallestEffect});
    // Failures above successes, groups in order: R's a·d/(b·c) is then the odds of success in group 2 over group 1.
    const odds = conditionalOddsRatio([[n1 - x1, n2 - x2], [x1, x2]], confidence, alternative);
    const warnings = [warning, ...sensitivity.warnings].filter((w): w is MethodNote => w !== undefined);
    return {
      statistic: {name: 'z', value: z},
      df: null,
      p: zTestP(z, alternative),
      estimate: {
        name: `difference in proportions of ${success} (${columns[1]} - ${columns[0]})`,
        value: p2 - p1,
        ci: newcombeInterval(first, second, confidence, alternative),
        level: confidence,
      },
      effect: {name: 'cohens-h', value: h, ci: arcsineInterval(h, n1, n2, confidence, alternative)},
      ...(sensitivity.sensitivity ? {sensitivity: sensitivity.sensitivity} : {}),
      ...(warnings.length > 0 ? {warnings} : {}),
      details: {
        observed: counts,
        proportions: {[columns[0]!]: p1, [columns[1]!]: p2},
        risk_ratio: {value: p2 / p1, ci: katzInterval(first, second, confidence, alternative), method: 'Katz log'},
        odds_ratio: {value: odds.estimate, ci: odds.ci, method: 'conditional maximum likelihood, exact interval'},
        sample_odds_ratio: (x2 * (n1 - x1)) / ((n2 - x2) * x1),
        ...(sensitivity.baseline === undefined ? {} : {sensitivity_baseline: sensitivity.baseline}),
      },
    };
  },
};

/** h ± z √(1/n₁ + 1/n₂), within [-π, π]; one-sided alternatives keep one bound. */
function arcsineInterval(h: number, n1: number, n2: number, confidence: number, alternative: Alternative): readonly [number, number] {
  const tail = alternative === 'two-sided' ? (1 - confidence) / 2 : 1 - confidence;
  const half = -normalQuantile(tail) * Math.sqrt(1 / n1 + 1 / n2);
  const lower = alternative === 'less' ? -Math.PI : Math.max(-Math.PI, h - half);
  const upper = alternative === 'greater' ? Math.PI : Math.min(Math.PI, h + half);
  return [lower, upper];
}

/**
 * Katz's log interval for p₂/p₁: exp(log RR ± z √(1/x₂ - 1/n₂ + 1/x₁ - 1/n₁));
 * null when either group has no successes (the log is then undefined).
 */
function katzInterval(
  first: {successes: number; trials: number},
  second: {successes: number; trials: number},
  confidence: number,
  alternative: Alternative,
): readonly [number, number] | null {
  if (first.successes === 0 || second.successes === 0) return null;
  const rr = second.successes / second.trials / (first.successes / first.trials);
  const se = Math.sqrt(1 / second.successes - 1 / second.trials + 1 / first.successes - 1 / first.trials);
  const tail = alternative === 'two-sided' ? (1 - confidence) / 2 : 1 - confidence;
  const factor = Math.exp(-normalQuantile(tail) * se);
  return [alternative === 'less' ? 0 : rr / factor, alternative === 'greater' ? Infinity : rr * factor];
}
