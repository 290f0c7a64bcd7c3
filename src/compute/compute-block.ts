import type {Dataset} from '../data/column.js';
import {MethodError} from '../methods/method-error.js';
import {methods} from '../methods/registry.js';
import {lag1Autocorrelation} from '../methods/shared/lag1-autocorrelation.js';
import {summarize, type Summary} from '../methods/shared/summarize.js';
import type {Design, MethodDefinition, MethodOutcome, Question, Sample} from '../methods/types.js';
import type {BlockSpec} from '../spec/block-spec.js';
import {UserError} from '../user-error.js';
import {assumptionChecks} from './assumption-checks.js';
import type {RowAccount} from './block-result.js';
import {chooseMethod, type AutoReason} from './choose-method.js';
import {prepareDesign} from './prepare-design.js';
import {runPosthoc} from './run-posthoc.js';

/** A block after its method ran, before families are adjusted and words written. */
export interface ComputedBlock {
  /** The block as declared, with `auto` replaced by the chosen method. */
  readonly spec: BlockSpec;
  readonly title: string;
  readonly question: Question | 'description';
  /** Why `auto` chose this method, when it did. */
  readonly autoReason: AutoReason | undefined;
  readonly design: Design;
  readonly outcome: MethodOutcome | undefined;
  readonly groups: Readonly<Record<string, Summary>>;
  readonly rows: RowAccount;
  /** Units of the outcome column, from the dataset. */
  readonly units: string | undefined;
  /** Units of the (first) predictor `x`, for axis titles. */
  readonly xUnits?: string | undefined;
  /** Words for the outcome and for each sample, from the dataset's `labels`. */
  readonly names: {readonly outcome: string; readonly by: string; readonly samples: readonly string[]};
}

/** Questions whose estimate is in the outcome's units. */
const inOutcomeUnits = new Set<Question>(['difference', 'equivalence']);

/** @param keep Rows of `dataset` that passed the block's `where`. */
export function computeBlock(declared: BlockSpec, dataset: Dataset, keep: Uint8Array): ComputedBlock {
  const choice = declared.method === 'auto' ? chooseMethod(declared, dataset, keep) : undefined;
  const spec = choice ? {...declared, method: choice.method} : declared;
  const definition = methods.get(spec.method);
  const {design, rows} = prepareDesign(spec, definition?.design ?? 'none', dataset, keep);
  const run = definition ? runMethod(definition, design, spec) : undefined;
  const outcome = run && choice?.method === 'pearson' ? withSpearman(run, design, spec) : run;
  const question = definition ? (definition.question ?? 'difference') : 'description';
  const outcomeColumn = typeof spec.y === 'string' ? spec.y : spec.y[0];
  const units = own(dataset.units, outcomeColumn);
  const label = (name: string) => own(dataset.labels, name) ?? name;
  const withUnits = outcome?.estimate && units !== undefined && inOutcomeUnits.has(question as Question) && design.kind !== 'bivariate';
  return {
    spec,
    title: definition?.title ?? 'description',
    question,
    autoReason: choice?.reason,
    design,
    outcome: withUnits ? {...outcome, estimate: {...outcome.estimate!, units}} : outcome,
    groups: Object.fromEntries(samplesOf(design).map((sample) => [sample.label, describeSample(sample, spec.method === 'describe')])),
    rows,
    units,
    xUnits: spec.x?.[0] === undefined ? undefined : own(dataset.units, spec.x[0]),
    names: {
      outcome: typeof spec.y === 'string' ? label(spec.y) : 'value',
      by: spec.by === undefined ? '' : label(spec.by),
      samples: sampleNames(design, label),
    },
  };
}

function runMethod(definition: MethodDefinition, design: Design, spec: BlockSpec): MethodOutcome {
  const options = {
    alternative: spec.alternative,
    confidence: spec.confidence,
    alpha: spec.alpha,
    mu: spec.mu ?? 0,
    smallestEffect: spec.smallestEffect,
    posthoc: spec.posthoc,
    correction: spec.correction,
    intercept: spec.intercept,
  };
  try {
    const outcome = definition.compute(design, options);
    // A constant sample leaves some statistics undefined (0/0); no sentence may print p = NaN.
    if (!Number.isFinite(outcome.p) || Number.isNaN(outcome.statistic.value)) {
      throw new MethodError(
        `\`${spec.method}\` cannot be computed for these data: its statistic divides by a spread of zero.`,
        'Check for a constant group or constant differences (a `where` filter, a column of one repeated value).',
      );
    }
    const posthoc = outcome.posthoc ?? runPosthoc(spec.method, design, options);
    const assumptions = [...(outcome.assumptions ?? []), ...assumptionChecks(spec.method, design)];
    return {...outcome, ...(posthoc ? {posthoc} : {}), assumptions};
  } catch (error) {
    if (!(error instanceof MethodError)) throw error;
    throw new UserError(`\`${spec.id}\`: ${error.message}`, {ruleId: 'method-not-applicable', place: spec.place, hint: error.hint});
  }
}

/**
 * Descriptives of a sample; `describe` blocks add the lag-1 autocorrelation
 * of the rows in file order (a check for drift between successive
 * measurements), computed on the exactly centred values.
 */
function describeSample(sample: Sample, withAutocorrelation: boolean): Summary {
  const summary = summarize(sample.values, sample.centred);
  if (!withAutocorrelation) return summary;
  return {...summary, lag1_autocorrelation: lag1Autocorrelation(sample.centred ?? sample.values)};
}

/**
 * `auto` on two numeric columns reports Spearman's rho beside Pearson's r,
 * so a reader sees at once whether one point or a curve drives r.
 */
function withSpearman(outcome: MethodOutcome, design: Design, spec: BlockSpec): MethodOutcome {
  const rank = runMethod(methods.get('spearman')!, design, spec);
  const rho = {rho: rank.estimate?.value, ci: rank.estimate?.ci, statistic: rank.statistic, p: rank.p, variant: rank.variant};
  return {...outcome, details: {...outcome.details, spearman: rho}};
}

/** A record's own value: column names such as `constructor` are data, not keys of Object. */
function own(record: Readonly<Record<string, string>>, key: string): string | undefined {
  return Object.hasOwn(record, key) ? record[key] : undefined;
}

/** The numeric samples of a design, for descriptives and charts. */
export function samplesOf(design: Design): readonly Sample[] {
  switch (design.kind) {
    case 'none':
    case 'k-group':
      return design.samples;
    case 'one-sample':
      return [design.sample];
    case 'paired':
    case 'two-group':
      return [design.first, design.second];
    case 'bivariate':
      return [...design.x, design.y];
    default:
      return [];
  }
}

function sampleNames(design: Design, label: (name: string) => string): readonly string[] {
  switch (design.kind) {
    case 'paired':
      return [label(design.first.label), label(design.second.label)];
    case 'bivariate':
      return [...design.x.map((x) => label(x.label)), label(design.y.label)];
    case 'contingency':
      return design.columns;
    case 'paired-categorical':
      return [label(design.first), label(design.second)];
    case 'counts':
      return design.levels;
    case 'proportion':
      return [design.success];
    default:
      return samplesOf(design).map((s) => s.label);
  }
}
