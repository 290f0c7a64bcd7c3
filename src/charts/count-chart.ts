/**
 * Bar charts of categorical blocks: counts in every cell, or, where the
 * question is about a proportion, the proportion of successes with its
 * Wilson interval.
 */
import type {ComputedBlock} from '../compute/compute-block.js';
import {formatFixed, formatPercent} from '../interpret/format-number.js';
import {capitalize, chartWords} from '../interpret/wording.js';
import {wilsonInterval} from '../methods/shared/wilson-interval.js';
import type {Design} from '../methods/types.js';
import {barChartSpec, type Bar} from './bar-chart.js';
import {levelText, type ChartDraft} from './chart-draft.js';

type Categorical = Extract<Design, {kind: 'contingency' | 'paired-categorical' | 'counts' | 'proportion'}>;

export function countChart(block: ComputedBlock, design: Categorical): ChartDraft {
  switch (design.kind) {
    case 'contingency':
      return block.question === 'proportion' && design.success !== undefined ? groupProportions(block, design) : contingencyCounts(block, design);
    case 'paired-categorical':
      return pairedCounts(block, design);
    case 'counts':
      return fitCounts(block, design);
    case 'proportion':
      return oneProportion(block, design);
  }
}

/** `3 of 20 (15%, 95% Wilson CI 5.2% to 36.0%)`. */
function proportionText(successes: number, trials: number, ci: readonly [number, number], confidence: number): string {
  const pct = (v: number) => `${formatFixed(100 * v, 1)}%`;
  return chartWords.counts.proportion(successes, trials, formatPercent(successes / trials), levelText(confidence), pct(ci[0]), pct(ci[1]));
}

function groupProportions(block: ComputedBlock, design: Extract<Categorical, {kind: 'contingency'}>): ChartDraft {
  const {spec, names} = block;
  const by = names.by || chartWords.group;
  const success = design.success!;
  const row = design.rows.indexOf(success);
  const parts: string[] = [];
  const bars: Bar[] = design.columns.map((group, j) => {
    const successes = design.counts[row]?.[j] ?? 0;
    const trials = design.counts.reduce((sum, r) => sum + (r[j] ?? 0), 0);
    const ci = trials > 0 ? wilsonInterval(successes, trials, spec.confidence, 'two-sided') : undefined;
    if (ci) parts.push(`${group}: ${proportionText(successes, trials, ci, spec.confidence)}`);
    return {group, category: success, value: trials > 0 ? successes / trials : 0, ...(ci ? {ci} : {})};
  });
  return {
    spec: barChartSpec({bars, xTitle: capitalize(by), yTitle: chartWords.counts.proportionAxis(success), proportion: true}),
    title: spec.caption ?? chartWords.counts.proportionTitle(success, by),
    description: chartWords.counts.groupProportions(names.outcome, success, by, parts),
  };
}

function contingencyCounts(block: ComputedBlock, design: Extract<Categorical, {kind: 'contingency'}>): ChartDraft {
  const {spec, names} = block;
  const by = names.by || chartWords.group;
  const bars: Bar[] = design.columns.flatMap((group, j) => design.rows.map((category, i) => ({group, category, value: design.counts[i]?.[j] ?? 0})));
  const parts = design.columns.map((group, j) => `${group}: ${design.rows.map((category, i) => `${category} ${design.counts[i]?.[j] ?? 0}`).join(', ')}`);
  return {
    spec: barChartSpec({bars, xTitle: capitalize(by), yTitle: chartWords.count, categoryTitle: names.outcome}),
    title: spec.caption ?? chartWords.byTitle(names.outcome, by),
    description: chartWords.counts.contingency(names.outcome, by, parts),
  };
}

function pairedCounts(block: ComputedBlock, design: Extract<Categorical, {kind: 'paired-categorical'}>): ChartDraft {
  const {spec, names} = block;
  const [firstName = design.first, secondName = design.second] = names.samples;
  const bars: Bar[] = design.levels.flatMap((group, i) => design.levels.map((category, j) => ({group, category, value: design.table[i]![j]!})));
  const parts = design.levels.map((group, i) => `${firstName} ${group}: ${design.levels.map((category, j) => `${secondName} ${category} ${design.table[i]![j]!}`).join(', ')}`);
  return {
    spec: barChartSpec({bars, xTitle: capitalize(firstName), yTitle: chartWords.counts.subjects, categoryTitle: secondName}),
    title: spec.caption ?? chartWords.paired.title(capitalize(firstName), secondName),
    description: chartWords.counts.paired(firstName, secondName, parts),
  };
}

function fitCounts(block: ComputedBlock, design: Extract<Categorical, {kind: 'counts'}>): ChartDraft {
  const {spec, names, outcome} = block;
  const expected = (outcome?.details?.['expected'] as readonly number[] | undefined) ?? [];
  const bars: Bar[] = design.levels.flatMap((group, i) => [
    {group, category: chartWords.counts.observed, value: design.counts[i] ?? 0},
    ...(expected[i] === undefined ? [] : [{group, category: chartWords.counts.expected, value: expected[i]!}]),
  ]);
  const parts = design.levels.map((group, i) => chartWords.counts.fitPart(group, design.counts[i] ?? 0, expected[i] === undefined ? undefined : formatFixed(expected[i]!, 1)));
  return {
    spec: barChartSpec({bars, xTitle: capitalize(names.outcome), yTitle: chartWords.count, categoryTitle: null}),
    title: spec.caption ?? chartWords.counts.fitTitle(names.outcome),
    description: chartWords.counts.fit(names.outcome, parts),
  };
}

function oneProportion(block: ComputedBlock, design: Extract<Categorical, {kind: 'proportion'}>): ChartDraft {
  const {spec, names} = block;
  const ci = wilsonInterval(design.successes, design.trials, spec.confidence, 'two-sided');
  const p0 = spec.mu;
  return {
    spec: barChartSpec({
      bars: [{group: design.success, category: design.success, value: design.successes / design.trials, ci}],
      xTitle: capitalize(names.outcome),
      yTitle: chartWords.counts.proportionAxis(design.success),
      proportion: true,
      ...(p0 === undefined ? {} : {reference: p0}),
    }),
    title: spec.caption ?? chartWords.counts.proportionAxis(design.success),
    description: chartWords.counts.oneProportion(
      names.outcome,
      design.success,
      proportionText(design.successes, design.trials, ci, spec.confidence),
      p0 === undefined ? undefined : formatFixed(p0, 3),
    ),
  };
}
