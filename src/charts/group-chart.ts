/**
 * Charts of numeric groups: box or strip plot with every point and each
 * group's mean with its t interval, and the post-hoc interval plot.
 */
import {samplesOf, type ComputedBlock} from '../compute/compute-block.js';
import {summarize} from '../methods/shared/summarize.js';
import {formatFixed, pClause} from '../interpret/format-number.js';
import {capitalize, chartWords} from '../interpret/wording.js';
import {boxPlotSpec} from './box-plot.js';
import {intervalText, levelText, quantity, summaryDecimals, withUnits, type ChartDraft} from './chart-draft.js';
import {intervalPlotSpec} from './interval-plot.js';
import {meanInterval} from './mean-interval.js';

export function groupChart(block: ComputedBlock, boxes: boolean): ChartDraft {
  const {names, units, spec} = block;
  const samples = samplesOf(block.design).map((s, i) => ({label: names.samples[i] ?? s.label, values: s.values}));
  const intervals = samples.map((s) => meanInterval(s.values, spec.confidence));
  const all = samples.flatMap((s) => Array.from(s.values));
  const decimals = summaryDecimals(all);
  const level = levelText(spec.confidence);
  const parts = samples.map((s, i) => {
    const {n, median, mean} = summarize(s.values.filter(Number.isFinite));
    const ci = intervals[i];
    return chartWords.groups.part(s.label, n, quantity(median, decimals, units), formatFixed(mean, decimals), ci ? intervalText(ci, decimals, spec.confidence) : undefined);
  });
  // Groups without an interval (one value, no spread) show the mean alone.
  const complete = intervals.every((ci) => ci !== undefined);
  return {
    spec: boxPlotSpec({
      samples,
      yTitle: capitalize(names.outcome),
      ...(units ? {units} : {}),
      boxes,
      intervals,
      centreLabel: chartWords.groups.centreLegend(level),
    }),
    title: spec.caption ?? chartWords.byTitle(names.outcome, names.by),
    description: chartWords.groups.description(boxes, withUnits(names.outcome, units), names.by, parts, level, complete),
  };
}

/**
 * Every pairwise difference of a k-group test's post-hoc comparisons with
 * its simultaneous interval, against zero; Dunn's test has no interval and
 * compares mean ranks, so its points stand alone.
 */
export function pairsChart(block: ComputedBlock): ChartDraft | undefined {
  const posthoc = block.outcome?.posthoc;
  if (!posthoc || posthoc.length === 0) return undefined;
  const {units, spec, names} = block;
  const ranks = posthoc.some((c) => c.ci === null);
  const what = chartWords.pairs.what(ranks);
  const rows = posthoc.map((c) => ({label: `${c.b} − ${c.a}`, estimate: c.estimate, ci: c.ci}));
  const decimals = summaryDecimals(samplesOf(block.design).flatMap((s) => Array.from(s.values)));
  const u = ranks ? undefined : units;
  const parts = posthoc.map((c) =>
    chartWords.pairs.part(c.b, c.a, quantity(c.estimate, decimals, u), c.ci ? intervalText(c.ci, decimals, spec.confidence) : undefined, pClause(c.p_adjusted, undefined, chartWords.adjustedP)),
  );
  return {
    spec: intervalPlotSpec({rows, xTitle: withUnits(capitalize(what), u)}),
    title: chartWords.pairs.title(names.outcome, names.by),
    description: chartWords.pairs.description(what, names.outcome, ranks ? undefined : levelText(spec.confidence), parts),
  };
}
