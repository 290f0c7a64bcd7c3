/**
 * Histogram of one sample with the null value and the estimate's interval
 * marked: the chart of a one-sample test.
 */
import type {TopLevelSpec} from 'vega-lite';
import {chartWords} from '../interpret/wording.js';
import {clampInterval, extentOf} from './interval-bounds.js';
import {ink, palette, schema, sizes} from './theme.js';

export interface HistogramInput {
  readonly values: Float64Array;
  /** Name of the variable, e.g. `Strength`. */
  readonly xTitle: string;
  readonly units?: string;
  /** A value marked by a dashed vertical rule, e.g. the null mean, with its label (`μ₀ = 32`). */
  readonly reference?: {readonly value: number; readonly label: string};
  /** An estimate and its interval, drawn as a bar above the histogram, with its label (`mean, 95% CI`). */
  readonly estimate?: {readonly value: number; readonly ci: readonly [number, number]; readonly label: string};
  /** Most bins (default Sturges' ⌈log₂ n⌉ + 1, at least 5); vega picks "nice" edges at or below it. */
  readonly maxBins?: number;
}

/**
 * Counts per bin are vega's `bin` transform: deterministic nice edges of
 * width 1, 2 or 5 × 10ᵏ. The interval sits just above the plotting area,
 * its infinite bound (one-sided) cut at the edge of the data.
 */
export function histogramSpec(input: HistogramInput): TopLevelSpec {
  const values = Array.from(input.values).filter(Number.isFinite);
  if (values.length === 0) throw new Error('histogramSpec: needs at least one finite value');
  const title = input.units ? `${input.xTitle} (${input.units})` : input.xTitle;
  const extent = extentOf([...values, ...(input.reference ? [input.reference.value] : []), ...(input.estimate ? [input.estimate.value] : [])]);
  const x = {field: 'value', type: 'quantitative' as const, title, scale: {zero: false, nice: true}};
  const layers: unknown[] = [
    {
      name: 'bars',
      mark: {type: 'bar', color: palette[0], opacity: 0.55, stroke: 'white', strokeWidth: 0.5},
      encoding: {
        x: {...x, bin: {maxbins: input.maxBins ?? Math.max(5, Math.ceil(Math.log2(values.length)) + 1), extent: [...extent]}},
        y: {aggregate: 'count', type: 'quantitative', title: chartWords.count, axis: {tickMinStep: 1}},
      },
    },
  ];
  if (input.reference) {
    const ref = {values: [{value: input.reference.value, label: input.reference.label}]};
    layers.push(
      {name: 'reference', data: ref, mark: {type: 'rule', color: ink.text, strokeDash: [4, 3], strokeWidth: 1.25}, encoding: {x}},
      {name: 'reference-label', data: ref, mark: {type: 'text', align: 'left', dx: 4, y: sizes.plotHeight - 8, fontSize: sizes.label, color: ink.text}, encoding: {x, text: {field: 'label'}}},
    );
  }
  if (input.estimate) {
    const drawn = clampInterval(input.estimate.ci, extent);
    const row = {values: [{value: input.estimate.value, lower: drawn.lower, upper: drawn.upper, label: input.estimate.label}]};
    // Above the plotting area, so no bar can hide it (autosize pads the view to fit).
    const y = -14;
    layers.push(
      {name: 'interval', data: row, mark: {type: 'rule', color: ink.text, strokeWidth: 1.5, y}, encoding: {x: {...x, field: 'lower'}, x2: {field: 'upper'}}},
      {name: 'estimate', data: row, mark: {type: 'point', shape: 'diamond', size: sizes.meanSymbol, filled: true, fill: 'white', stroke: ink.text, strokeWidth: 1.5, opacity: 1, y}, encoding: {x}},
      {name: 'estimate-label', data: row, mark: {type: 'text', align: 'left', baseline: 'middle', dx: 8, y, fontSize: sizes.label, color: ink.label}, encoding: {x: {...x, field: 'upper'}, text: {field: 'label'}}},
    );
  }
  return {
    $schema: schema,
    width: sizes.plotWidth,
    height: sizes.plotHeight,
    data: {values: values.map((value) => ({value}))},
    layer: layers,
  } as TopLevelSpec;
}
