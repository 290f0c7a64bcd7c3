import type {Dataset} from '../../data/column.js';
import type {BlockSpec} from '../../spec/block-spec.js';
import {numericColumn} from './columns.js';
import {requireSize, type Prepared} from './numeric.js';

/** Numeric predictors and outcome, keeping rows where every one is present. */
export function prepareBivariate(spec: BlockSpec, dataset: Dataset, keep: Uint8Array, excludedFilter: number): Prepared {
  const xs = (spec.x ?? []).map((name) => numericColumn(spec, 'x', name, dataset));
  const y = numericColumn(spec, 'y', spec.y as string, dataset);
  const xValues: number[][] = xs.map(() => []);
  const yValues: number[] = [];
  let missing = 0;
  for (let row = 0; row < keep.length; row++) {
    if (!keep[row]) continue;
    if (y.missing[row] || xs.some((x) => x.missing[row])) {
      missing++;
      continue;
    }
    xs.forEach((x, i) => xValues[i]!.push(x.values[row]!));
    yValues.push(y.values[row]!);
  }
  const ySample = {label: y.name, values: Float64Array.from(yValues)};
  requireSize(spec, [ySample], 3);
  return {
    design: {kind: 'bivariate', x: xs.map((x, i) => ({label: x.name, values: Float64Array.from(xValues[i]!)})), y: ySample},
    rows: {used: yValues.length, excluded_missing: missing, excluded_filter: excludedFilter, excluded_levels: 0},
  };
}
