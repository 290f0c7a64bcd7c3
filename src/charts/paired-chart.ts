/**
 * The chart of a paired design, in two panels: each subject's two
 * measurements joined by a line, and beside them the distribution of the
 * differences with the block's estimate, its interval and the null value.
 */
import type {TopLevelSpec} from 'vega-lite';
import type {ComputedBlock} from '../compute/compute-block.js';
import {pairedDifferences} from '../methods/shared/paired-differences.js';
import {summarize} from '../methods/shared/summarize.js';
import {recordedDecimals} from '../interpret/format-number.js';
import {capitalize, chartWords} from '../interpret/wording.js';
import type {PairedDesign} from '../methods/types.js';
import {boxPlotLayer} from './box-plot.js';
import {intervalText, levelText, quantity, summaryDecimals, withUnits, type ChartDraft} from './chart-draft.js';
import {meanInterval} from './mean-interval.js';
import {schema, sizes} from './theme.js';

export function pairedChart(block: ComputedBlock, design: PairedDesign, boxes: boolean): ChartDraft {
  const {names, units, spec, outcome} = block;
  const first = {label: names.samples[0] ?? design.first.label, values: design.first.values};
  const second = {label: names.samples[1] ?? design.second.label, values: design.second.values};
  const mu = spec.mu ?? 0;
  const differences = pairedDifferences(design.first, design.second, mu).raw.filter(Number.isFinite);
  const fallback = meanInterval(differences, spec.confidence);
  // The block's own estimate when it has one (mean, median or Hodges–Lehmann shift).
  const words = chartWords.paired;
  const estimate = outcome?.estimate ?? (fallback ? {name: words.meanDifference, value: summarize(differences).mean, ci: fallback, level: spec.confidence} : undefined);
  const diffLabel = `${second.label} − ${first.label}`;
  const decimals = summaryDecimals([...design.first.values, ...design.second.values].filter(Number.isFinite));
  const valueTitle = units ? capitalize(units) : words.measurement;
  const left = boxPlotLayer({samples: [first, second], yTitle: valueTitle, paired: true, boxes, width: Math.round(sizes.plotWidth * 0.6)});
  const right = boxPlotLayer({
    samples: [{label: words.difference, values: differences}],
    // The axis is short; the description names the order of subtraction in full.
    yTitle: withUnits(words.differenceAxis(diffLabel.length <= 24 ? diffLabel : undefined), units),
    boxes,
    reference: mu,
    layerPrefix: 'difference-',
    width: Math.round(sizes.plotWidth * 0.3),
    ...(estimate ? {centres: [estimate.value], intervals: [estimate.ci], centreLabel: chartWords.estimateLegend(estimate.name.replace(/\s*\(.*\)$/, ''), levelText(estimate.level))} : {}),
  });
  const n = differences.length;
  const med = summarize(differences).median;
  const estimateText = estimate ? words.estimate(estimate.name, quantity(estimate.value, decimals, units), intervalText(estimate.ci, decimals, estimate.level)) : undefined;
  return {
    spec: {$schema: schema, hconcat: [left, right], resolve: {scale: {shape: 'independent'}, legend: {shape: 'independent'}}} as TopLevelSpec,
    title: spec.caption ?? words.title(first.label, second.label),
    description: words.description(first.label, second.label, n, boxes, diffLabel, quantity(med, decimals, units), quantity(mu, recordedDecimals([mu]), units), estimateText),
  };
}
