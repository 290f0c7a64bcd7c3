import {readFileSync} from 'node:fs';
import path from 'node:path';
import type {BivariateDesign} from '../../src/methods/types.js';

/**
 * A NIST StRD linear regression file as a bivariate design: the data rows
 * (read as float64, the way the data stage reads them today) and the
 * certified values from `certified.json` beside the files. Polynomial
 * models (Pontius, Filip, Wampler) get the powers x, x², … as predictors.
 */
const root = path.resolve(new URL('../..', import.meta.url).pathname, '../shared/reference/nist-strd');

interface Certified {
  file: string;
  intercept: boolean;
  lines: {data: [number, number]};
  numeric: {
    parameters: {name: string; estimate: number; sd: number}[];
    residual_sd: number;
    r_squared: number;
    anova: {regression: {ss: number; ms: number; f: number | null}; residual: {ss: number; ms: number}};
  };
  anova: {regression: {df: number}; residual: {df: number}};
}

export interface NistRegression {
  readonly design: BivariateDesign;
  readonly intercept: boolean;
  readonly certified: Certified['numeric'] & {readonly df: [number, number]};
}

export function nistRegression(name: string): NistRegression {
  const all = JSON.parse(readFileSync(path.join(root, 'certified.json'), 'utf8')) as Record<string, Certified>;
  const entry = all[name];
  if (!entry) throw new Error(`no certified values for ${name}`);
  const lines = readFileSync(path.join(root, entry.file), 'latin1').split(/\r?\n/);
  const rows = lines.slice(entry.lines.data[0] - 1, entry.lines.data[1]).map((line) => line.trim().split(/\s+/).map(Number));
  const columns = rows[0]!.length - 1;
  const slopes = entry.numeric.parameters.length - (entry.intercept ? 1 : 0);
  const x =
    columns === 1 && slopes > 1
      ? Array.from({length: slopes}, (_, d) => ({label: d === 0 ? 'x' : `x^${d + 1}`, values: Float64Array.from(rows, (r) => r[1]! ** (d + 1))}))
      : Array.from({length: columns}, (_, j) => ({label: `x${columns > 1 ? j + 1 : ''}`, values: Float64Array.from(rows, (r) => r[j + 1]!)}));
  return {
    design: {kind: 'bivariate', x, y: {label: 'y', values: Float64Array.from(rows, (r) => r[0]!)}},
    intercept: entry.intercept,
    certified: {...entry.numeric, df: [entry.anova.regression.df, entry.anova.residual.df]},
  };
}
