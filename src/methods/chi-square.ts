import {chiSquareSf} from '../distributions/chi-square.js';
import {MethodError} from './method-error.js';
import {noncentralityInterval} from './shared/chi-square-noncentrality.js';
import {smallExpectedWarning, tableMargins} from './shared/contingency-table.js';
import type {ContingencyDesign, MethodDefinition} from './types.js';

/**
 * Pearson's chi-square test of independence for an r × c table (Pearson
 * 1900, Phil. Mag. 50:157; Agresti 2007, "An Introduction to Categorical
 * Data Analysis", 2nd ed., §2.4): X² = Σ (O - E)² / E with E = r_i c_j / N
 * on (r-1)(c-1) df. No continuity correction unless `correction: yates`
 * (2×2 tables only), which uses R's form Σ (|O - E| - min(½, |O - E|))² / E
 * (Yates 1934, JRSS Suppl. 1:217).
 *
 * Effect size: Cramér's V = √(X² / (N (k-1))), k = min(r, c) (Cramér 1946,
 * "Mathematical Methods of Statistics"), always from the uncorrected
 * X², with an interval for the population V by inverting the noncentral
 * chi-square distribution of X² (shared/chi-square-noncentrality.ts).
 * Reports the expected counts, Pearson residuals (O - E)/√E and
 * standardized residuals (O - E)/√(E (1 - r_i/N)(1 - c_j/N)) (Agresti 2007,
 * §2.4), and warns when an expected count is below 5.
 *
 * @example party identification by gender (Agresti 2007, p. 39): X²(2) = 30.07, p = 2.95e-7
 */
export const chiSquare: MethodDefinition<ContingencyDesign> = {
  id: 'chi-square',
  title: 'chi-square test of independence',
  design: 'contingency',
  question: 'independence',
  compute(design, options) {
    const title = 'The chi-square test of independence';
    if (options.alternative !== 'two-sided') {
      throw new MethodError(`${title} has no direction, so \`alternative: ${options.alternative}\` does not apply.`, 'Remove `alternative` (a 2×2 table can use `fisher-exact` or `two-proportion` for a one-sided test).');
    }
    const {counts, rows, columns} = design;
    const margins = tableMargins(design, title);
    const {expected, rowTotals, columnTotals, total} = margins;
    const is2x2 = rows.length === 2 && columns.length === 2;
    const yates = options.correction === 'yates';
    if (yates && !is2x2) {
      throw new MethodError(`Yates’ continuity correction applies to 2×2 tables; this table is ${rows.length} × ${columns.length}.`, 'Remove `correction: yates`.');
    }
    const deviation = counts.map((row, i) => row.map((o, j) => o - expected[i]![j]!));
    const sum = (term: (d: number, e: number) => number) =>
      deviation.reduce((acc, row, i) => row.reduce((a, d, j) => a + term(d, expected[i]![j]!), acc), 0);
    const uncorrected = sum((d, e) => (d * d) / e);
    // In a 2×2 table every |O - E| is the same, |ad - bc| / N.
    const shift = yates ? Math.min(0.5, Math.abs(deviation[0]![0]!)) : 0;
    const statistic = yates ? sum((d, e) => (Math.abs(d) - shift) ** 2 / e) : uncorrected;
    const df = (rows.length - 1) * (columns.length - 1);
    const k = Math.min(rows.length, columns.length);
    const toV = (chi2: number) => Math.sqrt(chi2 / (total * (k - 1)));
    const [lower, upper] = noncentralityInterval(uncorrected, df, options.confidence);
    const warning = smallExpectedWarning(expected, is2x2 ? 'fisher-exact' : undefined);
    return {
      statistic: {name: 'χ²', value: statistic},
      df,
      p: chiSquareSf(statistic, df),
      effect: {name: 'cramers-v', value: toV(uncorrected), ci: [toV(lower), toV(upper)]},
      variant: yates ? 'with Yates’ continuity correction' : 'without continuity correction',
      ...(warning ? {warnings: [warning]} : {}),
      details: {
        observed: counts,
        expected,
        pearson_residuals: deviation.map((row, i) => row.map((d, j) => d / Math.sqrt(expected[i]![j]!))),
        standardized_residuals: deviation.map((row, i) =>
          row.map((d, j) => d / Math.sqrt(expected[i]![j]! * (1 - rowTotals[i]! / total) * (1 - columnTotals[j]! / total))),
        ),
        ...(yates ? {statistic_uncorrected: uncorrected} : {}),
      },
    };
  },
};
