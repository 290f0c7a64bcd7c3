/**
 * Grouped bar chart of counts or proportions: the chart of categorical tests.
 */
import type {TopLevelSpec} from 'vega-lite';
import {ink, palette, schema, sizes} from './theme.js';

export interface Bar {
  /** Position on the x axis, e.g. the supplier. */
  readonly group: string;
  /** Colour within a group, e.g. the outcome level; one per bar in a group. */
  readonly category: string;
  readonly value: number;
  /** An interval around `value` (a Wilson interval for a proportion). */
  readonly ci?: readonly [number, number];
}

export interface BarChartInput {
  /** In drawing order: groups and categories appear as first met. */
  readonly bars: readonly Bar[];
  readonly xTitle: string;
  readonly yTitle: string;
  /** Legend title for the categories; no legend when there is one category. */
  readonly categoryTitle?: string | null;
  /** A value marked by a dashed horizontal rule, e.g. the null proportion. */
  readonly reference?: number;
  /** Fix the y axis to [0, 1] (proportions). */
  readonly proportion?: boolean;
}

export function barChartSpec(input: BarChartInput): TopLevelSpec {
  if (input.bars.length === 0) throw new Error('barChartSpec: needs at least one bar');
  const groups = [...new Set(input.bars.map((b) => b.group))];
  const categories = [...new Set(input.bars.map((b) => b.category))];
  if (categories.length > palette.length) {
    if (input.bars.some((b) => b.ci) || input.reference !== undefined) {
      throw new Error(`barChartSpec: intervals and reference lines need at most ${palette.length} categories, got ${categories.length}`);
    }
    return panelledBars(input, groups, categories);
  }
  const values = input.bars.map((b) => ({group: b.group, category: b.category, value: b.value, ...(b.ci ? {lower: b.ci[0], upper: b.ci[1]} : {})}));
  const x = {field: 'group', type: 'nominal' as const, title: input.xTitle, sort: groups, axis: {labelLimit: sizes.plotWidth / groups.length}};
  const xOffset = {field: 'category', type: 'nominal' as const, sort: categories};
  const y = {
    field: 'value',
    type: 'quantitative' as const,
    title: input.yTitle,
    ...(input.proportion ? {scale: {domain: [0, 1]}, axis: {format: '.0%'}} : {axis: {tickMinStep: 1}}),
  };
  const color = {
    field: 'category',
    type: 'nominal' as const,
    sort: categories,
    scale: {domain: categories, range: palette.slice(0, categories.length)},
    legend: categories.length > 1 ? {title: input.categoryTitle ?? null, orient: 'top' as const, direction: 'horizontal' as const} : null,
  };
  const layers: unknown[] = [{name: 'bars', mark: {type: 'bar', opacity: 0.85}, encoding: {x, xOffset, y, color}}];
  if (input.bars.some((b) => b.ci)) {
    layers.push({
      name: 'intervals',
      transform: [{filter: 'isValid(datum.lower)'}],
      mark: {type: 'rule', color: ink.text, strokeWidth: 1.5},
      encoding: {x, xOffset, y: {...y, field: 'lower'}, y2: {field: 'upper'}},
    });
  }
  if (input.reference !== undefined) {
    layers.push({
      name: 'reference',
      data: {values: [{value: input.reference}]},
      mark: {type: 'rule', color: ink.text, strokeDash: [4, 3]},
      encoding: {y: {field: 'value', type: 'quantitative'}},
    });
  }
  return {$schema: schema, width: sizes.plotWidth, height: sizes.plotHeight, data: {values}, layer: layers} as TopLevelSpec;
}

/**
 * More categories than the palette has colours: one panel per group with the
 * categories named on its x axis, in one colour, so no two categories ever
 * share a colour in a legend.
 */
function panelledBars(input: BarChartInput, groups: readonly string[], categories: readonly string[]): TopLevelSpec {
  return {
    $schema: schema,
    data: {values: input.bars.map((b) => ({group: b.group, category: b.category, value: b.value}))},
    mark: {type: 'bar', opacity: 0.85, color: palette[0]},
    width: Math.max(60, Math.round(sizes.plotWidth / groups.length)),
    height: sizes.plotHeight,
    encoding: {
      column: {field: 'group', type: 'nominal', title: input.xTitle, sort: [...groups], header: {labelFontSize: sizes.label, titleFontSize: sizes.axisTitle}},
      x: {field: 'category', type: 'nominal', title: input.categoryTitle ?? null, sort: [...categories], axis: {labelAngle: -45}},
      y: {field: 'value', type: 'quantitative', title: input.yTitle, axis: {tickMinStep: 1}},
    },
  } as TopLevelSpec;
}
