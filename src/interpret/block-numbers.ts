import {samplesOf, type ComputedBlock} from '../compute/compute-block.js';
import {decimalsForWidth, formatDf, numberFormat, recordedDecimals, type NumberFormat} from './format-number.js';
import {styleNamed} from './number-style.js';
import {symbol} from './symbol-marks.js';
import type {EffectSize} from '../methods/types.js';
import {effectSymbols, statisticSymbols, unitBoundedEffects, wording} from './wording.js';

/**
 * The block's numbers formatted once, in the document's style, with
 * decimals chosen from the data: summaries one decimal finer than the data
 * were recorded, estimates at the precision that shows their interval's
 * width to two significant digits. Symbols are marked (`symbol-marks.ts`).
 */
export interface BlockNumbers {
  readonly format: NumberFormat;
  /** Decimals the data were recorded with: for min, max and median. */
  readonly recordedDecimals: number;
  /** One finer than recorded: for means and SDs. */
  readonly summaryDecimals: number;
  readonly estimateDecimals: number;
  /** `3.1 MPa` */
  withUnits(value: number, decimals?: number): string;
  /** The estimate's scale: `.45` on bounded scales, `3.1 MPa` in units. */
  estimateText(value: number): string;
  /** `95% CI [0.8, 5.4]` for the estimate. */
  readonly estimateCi: string;
  /** The pre-declared alpha: `.05`. */
  readonly alpha: string;
  /** `t(17.3) = 2.91` */
  readonly statistic: string;
  /** `t(17.3) = 2.91, p = .010` */
  readonly testStatistics: string;
  /** `g = 1.25, 95% CI [0.31, 2.17]` */
  readonly effect: string;
  /** The contract's compact string for `{{id}}`. */
  readonly compact: string;
}

export function blockNumbers(block: ComputedBlock, pForDecision: number | undefined): BlockNumbers {
  const format = numberFormat(styleNamed(block.spec.style));
  const samples = samplesOf(block.design);
  const recorded = samples.length ? Math.max(...samples.map((sample) => recordedDecimals(sample.values))) : 0;
  const summaryDecimals = Math.min(6, recorded + 1);
  const {outcome, spec} = block;
  const level = percentOf(spec.confidence);
  const estimate = outcome?.estimate;
  // Ratios and coefficients keep two decimals at least: `OR = 3 [1, 15]` hides too much.
  const minimum = estimate && estimate.units === undefined && block.question !== 'difference' ? 2 : 0;
  const estimateDecimals = estimate ? Math.max(minimum, decimalsForWidth(intervalWidth(estimate.value, estimate.ci))) : summaryDecimals;
  const withUnits = (value: number, decimals = estimateDecimals) => unitText(format.fixed(value, decimals), block.units);
  const bounded = boundedScale(block);
  const estimateText = (value: number) => (bounded ? format.bounded(value, Math.max(2, estimateDecimals)) : withUnits(value));
  const alpha = format.alpha(spec.alpha);
  if (!outcome) {
    const compact = Object.values(block.groups)
      .map((g) => `${symbol('M')} = ${format.fixed(g.mean, summaryDecimals)}, ${symbol('SD')} = ${format.fixed(g.sd, summaryDecimals)}, ${symbol('n')} = ${format.fixed(g.n, 0)}`)
      .join('; ');
    return {format, recordedDecimals: recorded, summaryDecimals, estimateDecimals, withUnits, estimateText, estimateCi: '', alpha, statistic: '', testStatistics: '', effect: '', compact};
  }
  const df = outcome.df;
  const dfText = df === null ? '' : typeof df === 'number' ? `(${formatDf(df, format)})` : `(${df.map((d) => formatDf(d, format)).join(', ')})`;
  const statisticSymbol = symbol(statisticSymbols[outcome.statistic.name] ?? outcome.statistic.name);
  // Counting statistics (U, V, S, k) are whole numbers and print as such.
  const value = outcome.statistic.value;
  const statistic = `${statisticSymbol}${dfText} = ${Number.isInteger(value) ? format.fixed(value, 0) : format.fixed(value, 2)}`;
  const testStatistics = `${statistic}, ${format.pClause(outcome.p, pForDecision === outcome.p ? spec.alpha : undefined)}`;
  const effect = outcome.effect ? effectText(outcome.effect, level, format) : '';
  const estimateCi = estimate
    ? wording.confidenceInterval(percentOf(estimate.level), bounded ? format.boundedInterval(estimate.ci, Math.max(2, estimateDecimals)) : format.interval(estimate.ci, estimateDecimals))
    : '';
  return {
    format,
    recordedDecimals: recorded,
    summaryDecimals,
    estimateDecimals,
    withUnits,
    estimateText,
    estimateCi,
    alpha,
    statistic,
    testStatistics,
    effect,
    compact: effect ? `${testStatistics}, ${effect}` : testStatistics,
  };
}

/**
 * Estimates on a scale bounded by 1 (correlations, proportions and their
 * differences), printed as the style prints bounded quantities.
 */
export function boundedScale(block: ComputedBlock): boolean {
  return block.outcome?.estimate !== undefined && boundedMethods.has(block.spec.method);
}

/** Methods whose estimate is a correlation, a proportion or a difference of proportions. */
const boundedMethods = new Set(['pearson', 'spearman', 'kendall', 'binomial', 'one-proportion', 'two-proportion', 'mcnemar']);

/** `g = 1.25, 95% CI [0.31, 2.17]`; bounded effects (r, V, η²) as the style prints them. */
function effectText(effect: EffectSize, level: string, format: NumberFormat): string {
  const name = effectSymbols[effect.name] ?? effect.name;
  const bounded = unitBoundedEffects.has(effect.name);
  const show = (v: number) => (bounded ? format.bounded(v, 2) : format.fixed(v, 2));
  const ci = effect.ci && (Number.isFinite(effect.ci[0]) || Number.isFinite(effect.ci[1]))
    ? `, ${wording.confidenceInterval(level, `[${show(effect.ci[0])}, ${show(effect.ci[1])}]`)}`
    : '';
  return `${symbol(name)} = ${show(effect.value)}${ci}`;
}

export function unitText(number: string, units: string | undefined): string {
  if (!units) return number;
  return units === '%' ? `${number}%` : `${number} ${units}`;
}

/** `95%`, `90%` (TOST's interval is at 1 − 2α, not at the block's confidence). */
export function percentOf(level: number): string {
  return `${Math.round(level * 1000) / 10}%`;
}

/** Width of a two-sided interval; twice the finite half for one-sided ones. */
function intervalWidth(value: number, ci: readonly [number, number]): number {
  const [lower, upper] = ci;
  if (Number.isFinite(lower) && Number.isFinite(upper)) return upper - lower;
  return 2 * Math.abs(Number.isFinite(lower) ? value - lower : upper - value);
}
