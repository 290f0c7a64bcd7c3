/**
 * Estimates with their intervals, one row each, against a reference line:
 * the chart of post-hoc comparisons and the forest plot of a family.
 */
import type {TopLevelSpec} from 'vega-lite';
import {clampInterval, extentOf} from './interval-bounds.js';
import {ink, palette, schema, sizes} from './theme.js';

export interface IntervalRow {
  /** Row label, e.g. `membrane − moist`; distinct. */
  readonly label: string;
  readonly estimate: number;
  /** Null where the method gives no interval (Dunn's test): the point alone is drawn. */
  readonly ci: readonly [number, number] | null;
}

export interface IntervalPlotInput {
  readonly rows: readonly IntervalRow[];
  readonly xTitle: string;
  /** The value of no effect, marked by a dashed rule (default 0). */
  readonly reference?: number;
}

/** px per row: enough for a label of the axis font and a point. */
const rowHeight = 26;

export function intervalPlotSpec(input: IntervalPlotInput): TopLevelSpec {
  const {rows} = input;
  if (rows.length === 0) throw new Error('intervalPlotSpec: needs at least one row');
  const labels = rows.map((r) => r.label);
  if (new Set(labels).size !== labels.length) throw new Error(`intervalPlotSpec: row labels must be distinct, got ${labels.join(', ')}`);
  const reference = input.reference ?? 0;
  const extent = extentOf([reference, ...rows.flatMap((r) => [r.estimate, ...(r.ci ?? [])])]);
  const values = rows.map((r) => ({label: r.label, estimate: r.estimate, ...(r.ci ? clampInterval(r.ci, extent) : {})}));
  const x = {field: 'estimate', type: 'quantitative' as const, title: input.xTitle, scale: {zero: false, nice: true}};
  const y = {field: 'label', type: 'nominal' as const, title: null, sort: labels, axis: {labelLimit: 200, grid: false}};
  return {
    $schema: schema,
    width: sizes.plotWidth - 80,
    height: Math.max(2, rows.length) * rowHeight,
    data: {values},
    layer: [
      {name: 'reference', data: {values: [{estimate: reference}]}, mark: {type: 'rule', color: ink.rule, strokeDash: [4, 3]}, encoding: {x}},
      {
        name: 'intervals',
        transform: [{filter: 'isValid(datum.lower)'}],
        mark: {type: 'rule', color: palette[0], strokeWidth: 2},
        encoding: {x: {...x, field: 'lower'}, x2: {field: 'upper'}, y},
      },
      {name: 'estimates', mark: {type: 'point', shape: 'diamond', size: sizes.meanSymbol, filled: true, color: palette[0], opacity: 1}, encoding: {x, y}},
    ],
    config: {axisY: {grid: false, domain: false}, axisX: {grid: true}},
  } as TopLevelSpec;
}
