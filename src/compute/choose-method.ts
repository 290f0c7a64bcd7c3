import {isNumericColumn, type Dataset} from '../data/column.js';
import {placeOfKey, type BlockSpec} from '../spec/block-spec.js';
import {UserError} from '../user-error.js';
import {column, labelReader} from './design/columns.js';
import {groupLevels} from './design/group-levels.js';

/**
 * `test: auto` resolved from the declared design alone — column types,
 * number of groups, pairing — never from a pre-test's p-value. The one
 * data-dependent rule is the classical one for 2×2 tables: Fisher's exact
 * test when an expected count is below 5 (Cochran 1954, Biometrics 10:417).
 */
export interface MethodChoice {
  readonly method: string;
  readonly reason: string;
}

export function chooseMethod(spec: BlockSpec, dataset: Dataset, keep: Uint8Array): MethodChoice {
  const numeric = (name: string, key: string) => isNumericColumn(column(spec, key, name, dataset));
  if (typeof spec.y !== 'string') {
    const both = spec.y.every((name) => numeric(name, 'y'));
    return both
      ? {method: 'paired-t', reason: 'y lists two numeric measurements of the same rows (paired design)'}
      : {method: 'mcnemar', reason: 'y lists two categorical measurements of the same rows (paired design)'};
  }
  const yNumeric = numeric(spec.y, 'y');
  if (spec.x) {
    if (yNumeric && spec.x.every((name) => numeric(name, 'x'))) {
      return spec.x.length === 1
        ? {method: 'pearson', reason: 'x and y are both numeric (Spearman’s rho is reported beside it)'}
        : {method: 'linear-regression', reason: 'y is numeric with several numeric predictors'};
    }
    throw autoError(spec, 'x', 'x and y must both be numeric for an association');
  }
  if (spec.by) {
    const levels = groupLevels(spec, column(spec, 'by', spec.by, dataset), keep).levels.length;
    if (yNumeric) {
      if (levels === 2) return {method: 'welch-t', reason: 'a numeric outcome in two independent groups (Welch’s test does not assume equal spreads)'};
      return {method: 'welch-anova', reason: `a numeric outcome in ${levels} independent groups (Welch’s ANOVA does not assume equal spreads; Games–Howell comparisons)`};
    }
    if (levels === 2 && smallExpected2x2(spec, dataset, keep)) {
      return {method: 'fisher-exact', reason: 'two categorical columns forming a 2×2 table with an expected count below 5'};
    }
    return {method: 'chi-square', reason: 'two categorical columns (test of independence)'};
  }
  if (yNumeric && spec.mu !== undefined) return {method: 'one-sample-t', reason: 'one numeric sample compared with `mu`'};
  if (!yNumeric && spec.success !== undefined && spec.mu !== undefined) {
    return {method: 'binomial', reason: 'one categorical sample: successes out of trials compared with `mu` (exact test)'};
  }
  throw autoError(spec, 'test', 'a single column needs `mu` (and `success` for a categorical column), `by` or `x`');
}

function smallExpected2x2(spec: BlockSpec, dataset: Dataset, keep: Uint8Array): boolean {
  const y = labelReader(column(spec, 'y', spec.y as string, dataset));
  const by = labelReader(column(spec, 'by', spec.by!, dataset));
  const cells = new Map<string, number>();
  const rows = new Map<string, number>();
  const columns = new Map<string, number>();
  let total = 0;
  for (let row = 0; row < keep.length; row++) {
    const a = keep[row] ? y(row) : null;
    const b = keep[row] ? by(row) : null;
    if (a === null || b === null) continue;
    cells.set(`${a}\u0000${b}`, (cells.get(`${a}\u0000${b}`) ?? 0) + 1);
    rows.set(a, (rows.get(a) ?? 0) + 1);
    columns.set(b, (columns.get(b) ?? 0) + 1);
    total++;
  }
  if (rows.size !== 2 || columns.size !== 2) return false;
  return [...rows.values()].some((r) => [...columns.values()].some((c) => (r * c) / total < 5));
}

function autoError(spec: BlockSpec, key: string, why: string): UserError {
  return new UserError(`\`test: auto\` cannot choose a test: ${why}`, {
    ruleId: 'auto-undecided',
    place: placeOfKey(spec, key),
    hint: 'Declare the test yourself, e.g. `test: welch-t`, or add the missing key.',
  });
}
