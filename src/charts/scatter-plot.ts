/**
 * Scatter plot of two numeric variables, with a fitted straight line and,
 * for a regression, the confidence band of the mean response.
 */
import type {TopLevelSpec} from 'vega-lite';
import type {BandPoint, FittedLine} from './regression-band.js';
import {ink, palette, schema, sizes} from './theme.js';

export interface ScatterInput {
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly xTitle: string;
  readonly xUnits?: string;
  readonly yTitle: string;
  readonly yUnits?: string;
  /** The band to shade and the line through its middle (regression). */
  readonly band?: readonly BandPoint[];
  /** A line without a band (correlation), drawn across the x range. */
  readonly line?: FittedLine;
}

/** Pairs with both values finite: a row missing either has no place in the plane. */
export function completePairs(x: Float64Array, y: Float64Array): {x: number; y: number}[] {
  if (x.length !== y.length) throw new Error(`scatterSpec: x has ${x.length} values but y has ${y.length}`);
  const out: {x: number; y: number}[] = [];
  for (let i = 0; i < x.length; i++) if (Number.isFinite(x[i]) && Number.isFinite(y[i])) out.push({x: x[i]!, y: y[i]!});
  return out;
}

export function scatterSpec(input: ScatterInput): TopLevelSpec {
  const points = completePairs(input.x, input.y);
  if (points.length === 0) throw new Error('scatterSpec: needs at least one complete pair');
  const x = {field: 'x', type: 'quantitative' as const, title: input.xUnits ? `${input.xTitle} (${input.xUnits})` : input.xTitle, scale: {zero: false, nice: true}};
  const y = {field: 'y', type: 'quantitative' as const, title: input.yUnits ? `${input.yTitle} (${input.yUnits})` : input.yTitle, scale: {zero: false, nice: true}};
  const layers: unknown[] = [];
  if (input.band) {
    const values = input.band.map((b) => ({x: b.x, y: b.fit, lower: b.lower, upper: b.upper}));
    layers.push(
      {name: 'band', data: {values}, mark: {type: 'area', color: palette[0], opacity: 0.15}, encoding: {x, y: {...y, field: 'lower'}, y2: {field: 'upper'}}},
      {name: 'fit', data: {values}, mark: {type: 'line', color: palette[0], strokeWidth: 1.75}, encoding: {x, y}},
    );
  } else if (input.line) {
    const xs = points.map((p) => p.x);
    const ends = [Math.min(...xs), Math.max(...xs)].map((v) => ({x: v, y: input.line!.intercept + input.line!.slope * v}));
    layers.push({name: 'fit', data: {values: ends}, mark: {type: 'line', color: ink.rule, strokeWidth: 1.5, strokeDash: [5, 3]}, encoding: {x, y}});
  }
  layers.push({
    name: 'points',
    data: {values: points},
    mark: {type: 'circle', size: sizes.point * 1.5, color: palette[0], opacity: 0.85, stroke: 'white', strokeWidth: 0.5},
    encoding: {x, y},
  });
  return {$schema: schema, width: sizes.plotWidth, height: sizes.plotHeight, layer: layers} as TopLevelSpec;
}
