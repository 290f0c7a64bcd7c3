/**
 * Charts of one numeric sample: the histogram of a one-sample test and the
 * normal Q–Q plot of a normality check.
 */
import type {ComputedBlock} from '../compute/compute-block.js';
import {capitalize, chartWords} from '../interpret/wording.js';
import {summarize} from '../methods/shared/summarize.js';
import type {Sample} from '../methods/types.js';
import {intervalText, levelText, quantity, summaryDecimals, withUnits, type ChartDraft} from './chart-draft.js';
import {histogramSpec} from './histogram.js';
import {meanInterval} from './mean-interval.js';
import {qqLine, qqPlotSpec} from './qq-plot.js';

export function histogramChart(block: ComputedBlock, sample: Sample): ChartDraft {
  const {names, units, spec, outcome} = block;
  const values = sample.values.filter(Number.isFinite);
  const {n, mean, median} = summarize(values);
  const decimals = summaryDecimals(values);
  // A test's own estimate (the mean and its interval, one-sided if the test is); else the mean's t interval.
  const ci = outcome?.estimate?.ci ?? meanInterval(values, spec.confidence);
  const level = outcome?.estimate?.level ?? spec.confidence;
  const name = outcome?.estimate?.name ?? chartWords.mean;
  const words = chartWords.histogram;
  const estimate = ci ? {value: outcome?.estimate?.value ?? mean, ci, label: chartWords.estimateLegend(name, levelText(level), ci.some((b) => !Number.isFinite(b)))} : undefined;
  const reference = spec.mu === undefined ? undefined : {value: spec.mu, label: words.nullLabel(quantity(spec.mu, decimals - 1 < 0 ? 0 : decimals - 1, units))};
  const parts = [
    words.summary(withUnits(names.outcome, units), n, quantity(median, decimals, units)),
    ...(estimate ? [words.estimate(name, quantity(estimate.value, decimals, units), intervalText(ci!, decimals, level))] : []),
    ...(reference ? [words.nullValue(quantity(reference.value, decimals, units))] : []),
  ];
  return {
    spec: histogramSpec({values, xTitle: capitalize(names.outcome), ...(units ? {units} : {}), ...(reference ? {reference} : {}), ...(estimate ? {estimate} : {})}),
    title: spec.caption ?? words.title(names.outcome),
    description: parts.join(' '),
  };
}

export function qqChart(block: ComputedBlock, sample: Sample): ChartDraft {
  const {names, units, spec} = block;
  const values = sample.values.filter(Number.isFinite);
  const decimals = summaryDecimals(values);
  const line = qqLine(values);
  return {
    spec: qqPlotSpec({values, yTitle: capitalize(names.outcome), ...(units ? {units} : {})}),
    title: spec.caption ?? chartWords.qq.title(names.outcome),
    description: chartWords.qq.description(withUnits(names.outcome, units), values.length, quantity(line.intercept, decimals, units), quantity(line.slope, decimals, units)),
  };
}
