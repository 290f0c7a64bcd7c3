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
  /** Why, as data; `interpret/wording.ts` (`autoReason`) words it. */
  readonly reason: AutoReason;
}

/** The declared design that decided `auto`, with the number of groups where it matters. */
export interface AutoReason {
  readonly design:
    | 'paired-numeric'
    | 'paired-categorical'
    | 'numeric-pair'
    | 'numeric-predictors'
    | 'two-groups'
    | 'k-groups'
    | 'sparse-2x2'
    | 'two-categorical'
    | 'one-sample'
    | 'one-proportion';
  readonly groups?: number;
}

export function chooseMethod(spec: BlockSpec, dataset: Dataset, keep: Uint8Array): MethodChoice {
  const numeric = (name: string, key: string) => isNumericColumn(column(spec, key, name, dataset));
  if (typeof spec.y !== 'string') {
    const both = spec.y.every((name) => numeric(name, 'y'));
    return both
      ? {method: 'paired-t', reason: {design: 'paired-numeric'}}
      : {method: 'mcnemar', reason: {design: 'paired-categorical'}};
  }
  const yNumeric = numeric(spec.y, 'y');
  if (spec.x) {
    if (yNumeric && spec.x.every((name) => numeric(name, 'x'))) {
      return spec.x.length === 1
        ? {method: 'pearson', reason: {design: 'numeric-pair'}}
        : {method: 'linear-regression', reason: {design: 'numeric-predictors'}};
    }
    throw autoError(spec, 'x', 'x and y must both be numeric for an association');
  }
  if (spec.by) {
    const levels = groupLevels(spec, column(spec, 'by', spec.by, dataset), keep).levels.length;
    if (yNumeric) {
      if (levels === 2) return {method: 'welch-t', reason: {design: 'two-groups'}};
      return {method: 'welch-anova', reason: {design: 'k-groups', groups: levels}};
    }
    if (levels === 2 && smallExpected2x2(spec, dataset, keep)) {
      return {method: 'fisher-exact', reason: {design: 'sparse-2x2'}};
    }
    return {method: 'chi-square', reason: {design: 'two-categorical'}};
  }
  if (yNumeric && spec.mu !== undefined) return {method: 'one-sample-t', reason: {design: 'one-sample'}};
  if (!yNumeric && spec.success !== undefined && spec.mu !== undefined) {
    return {method: 'binomial', reason: {design: 'one-proportion'}};
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
