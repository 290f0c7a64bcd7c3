/**
 * Charts of one numeric sample: the histogram of a one-sample test and the
 * normal Q–Q plot of a normality check.
 */
import type {ComputedBlock} from '../compute/compute-block.js';
import {capitalize} from '../interpret/wording.js';
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
  const name = outcome?.estimate?.name ?? 'mean';
  const estimate = ci ? {value: outcome?.estimate?.value ?? mean, ci, label: `${name}, ${ci.some((b) => !Number.isFinite(b)) ? 'one-sided ' : ''}${levelText(level)} CI`} : undefined;
  const reference = spec.mu === undefined ? undefined : {value: spec.mu, label: `μ₀ = ${quantity(spec.mu, decimals - 1 < 0 ? 0 : decimals - 1, units)}`};
  const parts = [
    `Histogram of ${withUnits(names.outcome, units)}, n = ${n}, median ${quantity(median, decimals, units)}.`,
    ...(estimate ? [`The ${name} ${quantity(estimate.value, decimals, units)} and its ${intervalText(ci!, decimals, level)} are drawn as a diamond with a bar at the top.`] : []),
    ...(reference ? [`A dashed line marks the null value ${quantity(reference.value, decimals, units)}.`] : []),
  ];
  return {
    spec: histogramSpec({values, xTitle: capitalize(names.outcome), ...(units ? {units} : {}), ...(reference ? {reference} : {}), ...(estimate ? {estimate} : {})}),
    title: spec.caption ?? `Distribution of ${names.outcome}`,
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
    title: spec.caption ?? `Normal Q–Q plot of ${names.outcome}`,
    description:
      `Normal Q–Q plot of ${withUnits(names.outcome, units)}, n = ${values.length}: each sorted value against the standard normal quantile at its plotting position. ` +
      `The dashed line passes through the quartiles (intercept ${quantity(line.intercept, decimals, units)}, slope ${quantity(line.slope, decimals, units)} per standard deviation); ` +
      `normal data fall near it, bends at the ends indicate heavier or lighter tails, and a curve indicates skew.`,
  };
}
