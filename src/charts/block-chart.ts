import type {ComputedBlock} from '../compute/compute-block.js';
import {samplesOf} from '../compute/compute-block.js';
import type {InterpretedBlock} from '../interpret/result-record.js';
import {coefficientsChart, scatterChart} from './bivariate-chart.js';
import type {ChartDraft} from './chart-draft.js';
import {chooseChart, type DrawnChart} from './chart-choice.js';
import {countChart} from './count-chart.js';
import {groupChart, pairsChart} from './group-chart.js';
import {histogramChart, qqChart} from './one-sample-chart.js';
import {pairedChart} from './paired-chart.js';
import {renderDraft, type RenderedChart} from './render-draft.js';

/**
 * The charts of a block: the main one (`charts/ID.svg`, `charts/ID.vl.json`)
 * and any extra ones, each named `charts/ID-SUFFIX.svg` (post-hoc
 * comparisons: `ID-pairs`).
 */
export interface BlockChart extends RenderedChart {
  readonly extra: readonly (RenderedChart & {readonly suffix: string})[];
}

/**
 * The block's charts, or undefined when it has none (`chart: none`, `show`
 * without `chart`, or a description with `chart: auto`). A `chart:` kind
 * that does not fit the design throws a UserError at the key.
 *
 *   choose kind (chart-choice) → draft spec and words (one module per
 *   design) → render SVG and the themed vega-lite JSON
 */
export async function blockChart(block: InterpretedBlock): Promise<BlockChart | undefined> {
  const {spec} = block.computed;
  if (spec.chart === 'none' || !spec.show.has('chart')) return undefined;
  // 1. Choose (and check) the kind.
  const chosen = chooseChart(block.computed);
  if (!chosen) return undefined;
  // 2. Draft the main chart and the extras.
  const main = draftChart(block.computed, chosen);
  if (!main) return undefined;
  const pairs = chosen.kind === 'box' || chosen.kind === 'strip' ? pairsChart(block.computed) : undefined;
  // 3. Render.
  const rendered = await renderDraft(main, `stet-${spec.id}`);
  const extra = pairs ? [{suffix: 'pairs', ...(await renderDraft(pairs, `stet-${spec.id}-pairs`))}] : [];
  return {...rendered, extra};
}

function draftChart(block: ComputedBlock, chosen: DrawnChart): ChartDraft | undefined {
  const {design} = block;
  switch (chosen.kind) {
    case 'box':
    case 'strip':
      return design.kind === 'paired' ? pairedChart(block, design, chosen.kind === 'box') : groupChart(block, chosen.kind === 'box');
    case 'histogram':
    case 'qq': {
      const sample = samplesOf(design)[0];
      if (!sample) return undefined;
      return chosen.kind === 'qq' ? qqChart(block, sample) : histogramChart(block, sample);
    }
    case 'scatter':
      return design.kind === 'bivariate' ? scatterChart(block, design) : undefined;
    case 'coefficients':
      return coefficientsChart(block);
    case 'bar':
      return design.kind === 'contingency' || design.kind === 'paired-categorical' || design.kind === 'counts' || design.kind === 'proportion'
        ? countChart(block, design)
        : undefined;
  }
}
