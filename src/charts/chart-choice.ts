import type {ComputedBlock} from '../compute/compute-block.js';
import {chartWords} from '../interpret/wording.js';
import {placeOfKey, type ChartKind} from '../spec/block-spec.js';
import {UserError} from '../user-error.js';

/**
 * What stet draws for a block. `box` and `strip` of a paired design are its
 * two-panel chart (lines per subject, then the differences); `coefficients`
 * is the interval plot of a regression with several predictors.
 */
export interface DrawnChart {
  readonly kind: 'box' | 'strip' | 'histogram' | 'qq' | 'scatter' | 'bar' | 'coefficients';
}

/** The `chart:` values that fit the block's design, besides `auto` and `none`. */
export function fittingKinds(block: ComputedBlock): readonly ChartKind[] {
  const {design} = block;
  switch (design.kind) {
    case 'two-group':
    case 'k-group':
    case 'paired':
      return ['box', 'strip'];
    case 'one-sample':
      return ['histogram', 'qq', 'box', 'strip'];
    case 'none':
      return design.samples.length === 1 ? ['histogram', 'qq', 'box', 'strip'] : ['box', 'strip'];
    case 'bivariate':
      return design.x.length === 1 ? ['scatter'] : [];
    case 'contingency':
    case 'paired-categorical':
    case 'counts':
    case 'proportion':
      return ['bar'];
  }
}

/**
 * Resolves `chart: auto` from the design and the method, and checks an
 * explicit kind against the design; undefined means no chart. A kind that
 * does not fit is the author's mistake, placed at the `chart` key.
 */
export function chooseChart(block: ComputedBlock): DrawnChart | undefined {
  const {spec, design} = block;
  if (spec.chart === 'none') return undefined;
  if (spec.chart === 'auto') {
    switch (design.kind) {
      case 'none':
        // A description has no question to picture; `chart: box` asks for one.
        return undefined;
      case 'one-sample':
        return {kind: spec.method === 'shapiro-wilk' ? 'qq' : 'histogram'};
      case 'bivariate':
        return {kind: design.x.length === 1 ? 'scatter' : 'coefficients'};
      case 'two-group':
      case 'k-group':
      case 'paired':
        return {kind: 'box'};
      default:
        return {kind: 'bar'};
    }
  }
  const fitting = fittingKinds(block);
  if (!fitting.includes(spec.chart)) {
    throw new UserError(chartWords.choice.notFitting(spec.chart, describeDesign(block)), {
      ruleId: 'chart-not-applicable',
      place: placeOfKey(spec, 'chart'),
      hint: chartWords.choice.fitting(['auto', ...fitting, 'none']),
    });
  }
  return {kind: spec.chart as DrawnChart['kind']};
}

function describeDesign(block: ComputedBlock): string {
  const {design, spec} = block;
  const words = chartWords.choice;
  const method = words.block(spec.method);
  switch (design.kind) {
    case 'two-group':
    case 'k-group':
      return words.groups(method);
    case 'paired':
      return words.paired(method);
    case 'one-sample':
      return words.oneSample(method);
    case 'none':
      return words.samples(method, design.samples.length);
    case 'bivariate':
      return design.x.length === 1 ? words.pair(method) : words.predictors(method, design.x.length);
    default:
      return words.categorical(method);
  }
}
