/**
 * Charts of numeric groups: box or strip plot with every point and each
 * group's mean with its t interval, and the post-hoc interval plot.
 */
import {samplesOf, type ComputedBlock} from '../compute/compute-block.js';
import {summarize} from '../methods/shared/summarize.js';
import {formatFixed, pClause} from '../interpret/format-number.js';
import {capitalize} from '../interpret/wording.js';
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
  const outcome = capitalize(names.outcome);
  const byText = names.by ? ` by ${names.by}` : '';
  const parts = samples.map((s, i) => {
    const {n, median, mean} = summarize(s.values.filter(Number.isFinite));
    const ci = intervals[i];
    return `${s.label} n = ${n}, median ${quantity(median, decimals, units)}, mean ${formatFixed(mean, decimals)}${ci ? ` (${intervalText(ci, decimals, spec.confidence)})` : ''}`;
  });
  const drawn = boxes
    ? 'Every observation is a point; boxes show the quartiles and median, whiskers reach the furthest point within 1.5 IQR of the box'
    : 'Every observation is a point';
  // Groups without an interval (one value, no spread) show the mean alone.
  const complete = intervals.every((ci) => ci !== undefined);
  const description =
    `${boxes ? 'Box plot' : 'Strip plot'} of ${withUnits(names.outcome, units)}${byText}: ${parts.join('; ')}. ` +
    `${drawn}; a diamond with a bar beside each group marks its mean and ${level} confidence interval` +
    `${complete ? '' : ' (a group with one value or no spread has its mean alone)'}.`;
  return {
    spec: boxPlotSpec({
      samples,
      yTitle: outcome,
      ...(units ? {units} : {}),
      boxes,
      intervals,
      centreLabel: `mean and ${level} CI`,
    }),
    title: spec.caption ?? `${outcome}${byText}`,
    description,
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
  const what = ranks ? 'difference in mean ranks' : 'difference in means';
  const rows = posthoc.map((c) => ({label: `${c.b} − ${c.a}`, estimate: c.estimate, ci: c.ci}));
  const decimals = summaryDecimals(samplesOf(block.design).flatMap((s) => Array.from(s.values)));
  const u = ranks ? undefined : units;
  const parts = posthoc.map((c) => {
    const ci = c.ci ? `, simultaneous ${intervalText(c.ci, decimals, spec.confidence)}` : '';
    return `${c.b} − ${c.a}: ${quantity(c.estimate, decimals, u)}${ci}, ${pClause(c.p_adjusted, undefined, 'adjusted p')}`;
  });
  return {
    spec: intervalPlotSpec({rows, xTitle: withUnits(capitalize(what), u)}),
    title: `Pairwise comparisons of ${names.outcome}${names.by ? ` by ${names.by}` : ''}`,
    description:
      `Interval plot of every pairwise ${what} of ${names.outcome}${ranks ? '' : ` with simultaneous ${levelText(spec.confidence)} intervals`}, ` +
      `against a dashed line at zero: ${parts.join('; ')}.`,
  };
}
