/**
 * Box plot with every observation shown: the chart stet draws for comparing
 * groups (and, with `paired`, the two conditions of a paired design).
 */
import type {TopLevelSpec} from 'vega-lite';
import {chartWords} from '../interpret/wording.js';
import {summarize} from '../methods/shared/summarize.js';
import type {Sample} from '../methods/types.js';
import {boxStats} from './box-stats.js';
import {clampInterval, extentOf} from './interval-bounds.js';
import {ink, palette, schema, sizes} from './theme.js';

export interface BoxPlotInput {
  /** One box per sample, in this order; labels must be distinct. */
  readonly samples: readonly Sample[];
  /** Name of the outcome, e.g. `Strength`. */
  readonly yTitle: string;
  /** Units of the outcome, e.g. `MPa`; shown as `Strength (MPa)`. */
  readonly units?: string;
  /**
   * Two row-aligned samples measured on the same subjects: a thin line joins
   * each subject's two values. Default false.
   */
  readonly paired?: boolean;
  /**
   * One interval per sample, drawn as a bar through its marker (e.g. the
   * mean's t interval); infinite bounds are cut at the plot's edge, and a
   * sample without one (undefined) shows its marker alone.
   */
  readonly intervals?: readonly (readonly [number, number] | undefined)[];
  /**
   * The centre marked per sample (default: the mean, by `summarize`); give
   * it when the interval is about another estimate (a Hodges–Lehmann shift).
   */
  readonly centres?: readonly number[];
  /** Legend text of the centre marker (default `mean`). */
  readonly centreLabel?: string;
  /** Draw boxes (default true); false gives a strip plot: points, centre and interval only. */
  readonly boxes?: boolean;
  /** A value to mark with a dashed horizontal rule, e.g. 0 for differences. */
  readonly reference?: number;
  /** Width of the plotting area in px (default `sizes.plotWidth`). */
  readonly width?: number;
  /**
   * Prefix of the layer names (default none). vega-lite names marks and
   * datasets by them, so two box plots in one chart need different prefixes.
   */
  readonly layerPrefix?: string;
}

interface Row {
  /** Horizontal position: group index plus jitter, in group units. */
  readonly x: number;
  /** Group index: where the box, the mean and the label sit. */
  readonly box: number;
  readonly value: number;
  readonly subject: number;
}

const {plotHeight} = sizes;

/** Box width in px for `k` groups: 40% of a group's slot, between 14 and 44 px. */
function boxWidth(k: number, plotWidth: number): number {
  return Math.round(Math.min(44, Math.max(14, (0.4 * plotWidth) / k)));
}

/** 1/φ: the golden-ratio step gives the most evenly spread additive sequence. */
const inverseGolden = 0.6180339887498949;

/**
 * Horizontal jitter of row `i` in [-1, 1): the additive recurrence
 * frac(1/2 + i/φ), a low-discrepancy sequence (Kuipers & Niederreiter 1974,
 * "Uniform Distribution of Sequences", ch. 1), so neighbouring rows spread
 * out evenly and every render places each point in the same spot. Rounded
 * to 4 digits to keep the spec short.
 */
export function jitter(i: number): number {
  const u = (0.5 + i * inverseGolden) % 1;
  return Math.round((2 * u - 1) * 1e4) / 1e4;
}

/** One row per drawn observation; `spread` is the jitter half-width in group units. */
function rows(input: BoxPlotInput, spread: number): Row[] {
  const row = (box: number, i: number, value: number): Row => ({
    x: Math.round((box + spread * jitter(i)) * 1e4) / 1e4,
    box,
    value,
    subject: i,
  });
  const out: Row[] = [];
  if (input.paired) {
    const [first, second] = input.samples;
    if (input.samples.length !== 2 || !first || !second) throw new Error('boxPlotSpec: paired needs exactly two samples');
    if (first.values.length !== second.values.length) {
      throw new Error(`boxPlotSpec: paired samples must be row-aligned, got ${first.values.length} and ${second.values.length} values`);
    }
    // A subject with a missing value has no pair to draw: leave it out of both boxes.
    for (let i = 0; i < first.values.length; i++) {
      const a = first.values[i] ?? Number.NaN;
      const b = second.values[i] ?? Number.NaN;
      if (Number.isFinite(a) && Number.isFinite(b)) out.push(row(0, i, a), row(1, i, b));
    }
    return out;
  }
  input.samples.forEach((sample, box) => {
    sample.values.forEach((value, i) => {
      if (Number.isFinite(value)) out.push(row(box, i, value));
    });
  });
  return out;
}

/**
 * Box plot per group with the raw points overlaid and each group's mean marked.
 *
 * Convention (Tukey 1977, "Exploratory Data Analysis", ch. 2): the box spans
 * the first to the third quartile with a line at the median; whiskers reach
 * the most extreme observation within 1.5 × IQR of the box. Quartiles are
 * Hyndman & Fan (1996) type 7, the default of R and numpy (box-stats.ts).
 * Points beyond the whiskers are not drawn twice: every
 * observation is already a point, jittered horizontally by `jitter(row)`.
 * The mean (or the given centre) is an open diamond beside the box, with its
 * interval as a bar through it when given. Non-finite values are left out.
 *
 * Groups sit at x = 0, 1, …, k − 1 on a linear scale rather than a band
 * scale: vega-lite splits a line at every band (`pathGroupingFields`), which
 * would break the lines joining paired points. Group names are therefore
 * drawn by a text layer, where vega escapes them like any other datum, and
 * cut with an ellipsis when wider than their slot (say them in the caption).
 */
export function boxPlotSpec(input: BoxPlotInput): TopLevelSpec {
  return {$schema: schema, ...boxPlotLayer(input)} as TopLevelSpec;
}

/** The box plot as a layer spec without `$schema`, to place in a concatenation. */
export function boxPlotLayer(input: BoxPlotInput) {
  const k = input.samples.length;
  if (k === 0) throw new Error('boxPlotSpec: needs at least one sample');
  const labels = input.samples.map((s) => s.label);
  if (new Set(labels).size !== k) throw new Error(`boxPlotSpec: sample labels must be distinct, got ${labels.join(', ')}`);
  const yTitle = input.units ? `${input.yTitle} (${input.units})` : input.yTitle;
  if (input.intervals && input.intervals.length !== k) throw new Error(`boxPlotSpec: ${input.intervals.length} intervals for ${k} samples`);
  if (input.centres && input.centres.length !== k) throw new Error(`boxPlotSpec: ${input.centres.length} centres for ${k} samples`);
  const plotWidth = input.width ?? sizes.plotWidth;
  const pre = input.layerPrefix ?? '';
  const slot = plotWidth / k;
  const box = boxWidth(k, plotWidth);
  const data = rows(input, (0.4 * box) / slot);
  const centres = input.centres ?? input.samples.map((s) => summarize(s.values.filter(Number.isFinite)).mean);
  const extent = extentOf([...data.map((r) => r.value), ...centres, ...(input.reference === undefined ? [] : [input.reference])]);
  const centreRows = centres.map((centre, i) => {
    const ci = input.intervals?.[i];
    // Beside the box, so the interval never hides the median or the whiskers.
    return {box: i, side: Math.round((i + (box / 2 + 9) / slot) * 1e4) / 1e4, centre, ...(ci ? clampInterval(ci, extent) : {})};
  });

  const x = {
    field: 'x',
    type: 'quantitative' as const,
    scale: {domain: [-0.5, k - 0.5], nice: false, zero: false},
    axis: {title: null, labels: false, ticks: false, grid: false, values: []},
  };
  const boxX = {...x, field: 'box'};
  const sideX = {...x, field: 'side'};
  const y = {field: 'value', type: 'quantitative' as const, title: yTitle, scale: {zero: false, nice: true, padding: 10}};
  const color = {field: 'box', type: 'ordinal' as const, scale: {domain: labels.map((_, i) => i), range: [...palette]}, legend: null};

  const pairLines = {
    name: `${pre}pairs`,
    mark: {type: 'line' as const, color: ink.pair, strokeWidth: 0.75},
    encoding: {x, y, detail: {field: 'subject', type: 'nominal' as const}},
  };

  // Boxes drawn from our own quartiles (box-stats.ts) with plain marks: the
  // same convention as vega-lite's composite boxplot at a third of the cost.
  const half = box / 2 / slot;
  const stats = input.samples.map((s) => boxStats(s.values));
  const boxRows = stats.flatMap((st, i) => (st ? [{box: i, left: i - half, right: i + half, ...st}] : []));
  // Whiskers and their caps, two per box, in one dataset each.
  const whiskerRows = boxRows.flatMap((r) => [
    {box: r.box, from: r.q1, to: r.lowerWhisker, capLeft: r.box - half / 2, capRight: r.box + half / 2},
    {box: r.box, from: r.q3, to: r.upperWhisker, capLeft: r.box - half / 2, capRight: r.box + half / 2},
  ]);
  const span = (field: string) => ({...x, field});
  const boxLayers = [
    {name: `${pre}whiskers`, data: {values: whiskerRows}, mark: {type: 'rule' as const, color: ink.rule}, encoding: {x: boxX, y: {...y, field: 'from'}, y2: {field: 'to'}}},
    {name: `${pre}caps`, data: {values: whiskerRows}, mark: {type: 'rule' as const, color: ink.rule}, encoding: {x: span('capLeft'), x2: {field: 'capRight'}, y: {...y, field: 'to'}}},
    {name: `${pre}boxes`, data: {values: boxRows}, mark: {type: 'rect' as const, fillOpacity: 0.12, stroke: ink.rule, strokeWidth: 1}, encoding: {x: span('left'), x2: {field: 'right'}, y: {...y, field: 'q1'}, y2: {field: 'q3'}, color}},
    {name: `${pre}medians`, data: {values: boxRows}, mark: {type: 'rule' as const, color: ink.text, strokeWidth: 1.5}, encoding: {x: span('left'), x2: {field: 'right'}, y: {...y, field: 'median'}}},
  ];
  const centreY = {...y, field: 'centre'};
  const legend = {title: null, orient: 'top' as const, direction: 'horizontal' as const};
  return {
    width: plotWidth,
    height: plotHeight,
    data: {values: data},
    layer: [
      ...(input.reference === undefined
        ? []
        : [{name: `${pre}reference`, data: {values: [{reference: input.reference}]}, mark: {type: 'rule' as const, color: ink.rule, strokeDash: [4, 3]}, encoding: {y: {...y, field: 'reference'}}}]),
      ...(input.paired ? [pairLines] : []),
      ...(input.boxes === false ? [] : boxLayers),
      {
        name: `${pre}points`,
        mark: {type: 'circle', size: sizes.point, opacity: 0.85, stroke: 'white', strokeWidth: 0.5},
        encoding: {x, y, color},
      },
      ...(input.intervals
        ? [{name: `${pre}intervals`, data: {values: centreRows}, transform: [{filter: 'isValid(datum.lower)'}], mark: {type: 'rule' as const, color: ink.text, strokeWidth: 1.5}, encoding: {x: sideX, y: {...y, field: 'lower'}, y2: {field: 'upper'}}}]
        : []),
      {
        name: `${pre}means`,
        data: {values: centreRows},
        mark: {type: 'point', size: sizes.meanSymbol, filled: true, fill: 'white', stroke: ink.text, strokeWidth: 1.5, opacity: 1},
        encoding: {
          x: sideX,
          y: centreY,
          // A one-entry legend says what the diamond is.
          shape: {datum: input.centreLabel ?? chartWords.mean, type: 'nominal' as const, scale: {range: ['diamond']}, legend},
        },
      },
      {
        name: `${pre}group-labels`,
        data: {values: labels.map((label, i) => ({label, box: i}))},
        mark: {type: 'text', baseline: 'top', fontSize: sizes.label, color: ink.label, limit: slot - 8, y: plotHeight + 6},
        encoding: {x: boxX, text: {field: 'label', type: 'nominal' as const}},
      },
    ],
  };
}

