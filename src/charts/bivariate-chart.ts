/**
 * Charts of correlation and regression: a scatter plot with the least-squares
 * line (and, for a regression, its confidence band), or, with several
 * predictors, the interval plot of the slopes.
 */
import type {ComputedBlock} from '../compute/compute-block.js';
import {decimalsForWidth, formatFixed} from '../interpret/format-number.js';
import {capitalize, chartWords} from '../interpret/wording.js';
import {linearRegression} from '../methods/linear-regression.js';
import {MethodError} from '../methods/method-error.js';
import type {BivariateDesign} from '../methods/types.js';
import {intervalText, levelText, summaryDecimals, withUnits, type ChartDraft} from './chart-draft.js';
import {intervalPlotSpec} from './interval-plot.js';
import {regressionBand, type FittedLine} from './regression-band.js';
import {completePairs, scatterSpec} from './scatter-plot.js';

interface Coefficient {
  readonly term: string;
  readonly estimate: number;
  readonly ci: readonly [number, number];
}

interface RegressionDetails {
  readonly coefficients: readonly Coefficient[];
  readonly residual_sd: number;
  readonly anova_table: {readonly residual: {readonly df: number}};
}

function regressionDetails(block: ComputedBlock): RegressionDetails | undefined {
  return block.spec.method === 'linear-regression' ? (block.outcome?.details as RegressionDetails | undefined) : undefined;
}

export function scatterChart(block: ComputedBlock, design: BivariateDesign): ChartDraft {
  const {names, units, xUnits, spec} = block;
  const xSample = design.x[0]!;
  const xName = names.samples[0] ?? xSample.label;
  const yName = names.samples[names.samples.length - 1] ?? design.y.label;
  const n = completePairs(xSample.values, design.y.values).length;
  const decimals = summaryDecimals(design.y.values);
  const level = levelText(spec.confidence);
  const details = regressionDetails(block);
  const common = {
    x: xSample.values,
    y: design.y.values,
    xTitle: capitalize(xName),
    yTitle: capitalize(yName),
    ...(xUnits ? {xUnits} : {}),
    ...(units ? {yUnits: units} : {}),
  };
  const words = chartWords.scatter;
  const head = words.head(withUnits(yName, units), xName, n);
  if (details) {
    const hasIntercept = spec.intercept;
    const intercept = hasIntercept ? details.coefficients[0]!.estimate : 0;
    const slope = details.coefficients[hasIntercept ? 1 : 0]!;
    const band = regressionBand({x: xSample.values, intercept, slope: slope.estimate, residualSd: details.residual_sd, residualDf: details.anova_table.residual.df, confidence: spec.confidence, hasIntercept});
    return {
      spec: scatterSpec({...common, band}),
      title: spec.caption ?? words.title(yName, xName),
      description: words.regression(
        head,
        fitText({intercept, slope: slope.estimate}, decimals, slopeDecimals(slope.ci)),
        intervalText(slope.ci, slopeDecimals(slope.ci), spec.confidence),
        level,
      ),
    };
  }
  const line = leastSquaresLine(block, design);
  return {
    spec: scatterSpec({...common, ...(line ? {line} : {})}),
    title: spec.caption ?? words.title(yName, xName),
    description: line ? words.correlation(head, fitText(line, decimals, decimals + 1), spec.method === 'pearson') : words.noLine(head),
  };
}

/** Least-squares line for a correlation block, by the regression code; none where it cannot be fitted. */
function leastSquaresLine(block: ComputedBlock, design: BivariateDesign): FittedLine | undefined {
  try {
    const fit = linearRegression.compute(design, {
      alternative: 'two-sided', confidence: block.spec.confidence, alpha: block.spec.alpha, mu: 0,
      smallestEffect: undefined, posthoc: undefined, correction: 'none', intercept: true,
    });
    const coefficients = (fit.details as RegressionDetails | undefined)?.coefficients;
    if (!coefficients || coefficients.length < 2) return undefined;
    return {intercept: coefficients[0]!.estimate, slope: coefficients[1]!.estimate};
  } catch (error) {
    if (error instanceof MethodError) return undefined;
    throw error;
  }
}

function fitText(line: FittedLine, decimals: number, slopeDigits: number): string {
  const sign = line.slope < 0 ? '−' : '+';
  return `y = ${formatFixed(line.intercept, decimals)} ${sign} ${formatFixed(Math.abs(line.slope), slopeDigits)} x`;
}

/** Decimals that show a slope's interval to three significant digits of its width. */
function slopeDecimals(ci: readonly [number, number]): number {
  return Math.min(6, decimalsForWidth(ci[1] - ci[0]) + 1);
}

/** Several predictors: each slope with its interval against zero. */
export function coefficientsChart(block: ComputedBlock): ChartDraft | undefined {
  const details = regressionDetails(block);
  if (!details) return undefined;
  const {spec, names} = block;
  const slopes = details.coefficients.filter((c) => c.term !== '(intercept)');
  const label = (term: string) => {
    const i = block.design.kind === 'bivariate' ? block.design.x.findIndex((x) => x.label === term) : -1;
    return i >= 0 ? (names.samples[i] ?? term) : term;
  };
  // Two columns may share a label in the dataset; their column names never clash.
  const labels = slopes.map((c) => label(c.term));
  const distinct = new Set(labels).size === labels.length;
  const rows = slopes.map((c, i) => ({label: distinct ? labels[i]! : c.term, estimate: c.estimate, ci: c.ci}));
  const parts = slopes.map((c) => `${label(c.term)} ${formatFixed(c.estimate, slopeDecimals(c.ci))} (${intervalText(c.ci, slopeDecimals(c.ci), spec.confidence)})`);
  const yName = names.samples[names.samples.length - 1] ?? names.outcome;
  return {
    spec: intervalPlotSpec({rows, xTitle: chartWords.slopes.axis(yName)}),
    title: spec.caption ?? chartWords.slopes.title(yName),
    description: chartWords.slopes.description(slopes.length, yName, levelText(spec.confidence), parts),
  };
}
