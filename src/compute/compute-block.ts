import type {Dataset} from '../data/column.js';
import {methods} from '../methods/registry.js';
import {summarize, type Summary} from '../methods/shared/summarize.js';
import type {Design, MethodOutcome, Sample} from '../methods/types.js';
import type {BlockSpec} from '../spec/block-spec.js';
import type {RowAccount} from './block-result.js';
import {prepareDesign} from './prepare-design.js';

/** A block after its method ran, before families are adjusted and words written. */
export interface ComputedBlock {
  readonly spec: BlockSpec;
  readonly title: string;
  readonly design: Design;
  readonly outcome: MethodOutcome | undefined;
  readonly groups: Readonly<Record<string, Summary>>;
  readonly rows: RowAccount;
  /** Units of the outcome column, from the dataset. */
  readonly units: string | undefined;
  /** Words for the outcome and for each sample, from the dataset's `labels`. */
  readonly names: {readonly outcome: string; readonly samples: readonly string[]};
}

/** @param keep Rows of `dataset` that passed the block's `where`. */
export function computeBlock(spec: BlockSpec, dataset: Dataset, keep: Uint8Array): ComputedBlock {
  const definition = methods.get(spec.method);
  const {design, rows} = prepareDesign(spec, definition?.design ?? 'none', dataset, keep);
  const outcome = definition?.compute(design, {
    alternative: spec.alternative,
    confidence: spec.confidence,
    alpha: spec.alpha,
    mu: spec.mu ?? 0,
    smallestEffect: spec.smallestEffect,
  });
  const outcomeColumn = typeof spec.y === 'string' ? spec.y : spec.y[0];
  const units = own(dataset.units, outcomeColumn);
  const label = (column: string) => own(dataset.labels, column) ?? column;
  const samples = samplesOf(design);
  const names = {
    outcome: typeof spec.y === 'string' ? label(spec.y) : 'value',
    samples: design.kind === 'paired' ? samples.map((s) => label(s.label)) : samples.map((s) => s.label),
  };
  return {
    spec,
    title: definition?.title ?? 'description',
    design,
    outcome: outcome && units !== undefined ? {...outcome, estimate: {...outcome.estimate, units}} : outcome,
    groups: Object.fromEntries(samples.map((sample) => [sample.label, summarize(sample.values)])),
    rows,
    units,
    names,
  };
}

/** A record's own value: column names such as `constructor` are data, not keys of Object. */
function own(record: Readonly<Record<string, string>>, key: string): string | undefined {
  return Object.hasOwn(record, key) ? record[key] : undefined;
}

export function samplesOf(design: Design): readonly Sample[] {
  switch (design.kind) {
    case 'none':
      return design.samples;
    case 'one-sample':
      return [design.sample];
    default:
      return [design.first, design.second];
  }
}
