/**
 * Normal quantile–quantile plot of one sample: the chart of a normality check.
 */
import type {TopLevelSpec} from 'vega-lite';
import {normalQuantile} from '../distributions/normal.js';
import {chartWords} from '../interpret/wording.js';
import {ink, palette, schema, sizes} from './theme.js';

export interface QqPlotInput {
  readonly values: Float64Array;
  /** Name of the variable, e.g. `Strength`. */
  readonly yTitle: string;
  readonly units?: string;
}

export interface QqPoint {
  /** Standard normal quantile at the point's plotting position. */
  readonly theoretical: number;
  readonly value: number;
}

/**
 * Sorted values against normal quantiles at the plotting positions
 * (i − a)/(n + 1 − 2a), a = 3/8 for n ≤ 10 and 1/2 above (Blom 1958; R's
 * `ppoints`, used by `qqnorm`).
 */
export function qqPoints(values: Float64Array): QqPoint[] {
  const sorted = Float64Array.from(values.filter(Number.isFinite)).sort();
  const n = sorted.length;
  const a = n <= 10 ? 3 / 8 : 1 / 2;
  return Array.from(sorted, (value, i) => ({theoretical: normalQuantile((i + 1 - a) / (n + 1 - 2 * a)), value}));
}

/**
 * The reference line through the first and third quartiles of the data and
 * of the normal distribution (R's `qqline`, quantile type 7).
 */
export function qqLine(values: Float64Array): {readonly intercept: number; readonly slope: number} {
  const sorted = Float64Array.from(values.filter(Number.isFinite)).sort();
  const q = (p: number): number => {
    const h = (sorted.length - 1) * p;
    const lo = Math.floor(h);
    return sorted[lo]! + (h - lo) * ((sorted[lo + 1] ?? sorted[lo]!) - sorted[lo]!);
  };
  const z = normalQuantile(0.75);
  const slope = (q(0.75) - q(0.25)) / (2 * z);
  return {intercept: q(0.25) + slope * z, slope};
}

export function qqPlotSpec(input: QqPlotInput): TopLevelSpec {
  const points = qqPoints(input.values);
  if (points.length < 3) throw new Error('qqPlotSpec: needs at least three finite values');
  const {intercept, slope} = qqLine(input.values);
  const ends = [points[0]!.theoretical, points[points.length - 1]!.theoretical];
  const x = {field: 'theoretical', type: 'quantitative' as const, title: chartWords.qq.axis, scale: {zero: false, nice: true}};
  const y = {field: 'value', type: 'quantitative' as const, title: input.units ? `${input.yTitle} (${input.units})` : input.yTitle, scale: {zero: false, nice: true}};
  return {
    $schema: schema,
    width: sizes.plotWidth,
    height: sizes.plotHeight,
    layer: [
      {
        name: 'line',
        data: {values: ends.map((t) => ({theoretical: t, value: intercept + slope * t}))},
        mark: {type: 'line', color: ink.rule, strokeDash: [4, 3]},
        encoding: {x, y},
      },
      {
        name: 'points',
        data: {values: points},
        mark: {type: 'circle', size: sizes.point * 1.5, color: palette[0], opacity: 0.85, stroke: 'white', strokeWidth: 0.5},
        encoding: {x, y},
      },
    ],
  } as TopLevelSpec;
}
