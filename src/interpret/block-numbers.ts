import {samplesOf, type ComputedBlock} from '../compute/compute-block.js';
import {
  decimalsForWidth,
  formatDf,
  formatFixed,
  formatInterval,
  formatUnitBounded,
  pClause,
  recordedDecimals,
} from './format-number.js';
import type {EffectSize} from '../methods/types.js';
import {effectSymbols, statisticSymbols, unitBoundedEffects, wording} from './wording.js';

/**
 * The block's numbers formatted once, with decimals chosen from the data:
 * summaries one decimal finer than the data were recorded, estimates at the
 * precision that shows their interval's width to two significant digits.
 */
export interface BlockNumbers {
  /** Decimals the data were recorded with: for min, max and median. */
  readonly recordedDecimals: number;
  /** One finer than recorded: for means and SDs. */
  readonly summaryDecimals: number;
  readonly estimateDecimals: number;
  /** `3.1 MPa` */
  withUnits(value: number, decimals?: number): string;
  /** `95% CI [0.8, 5.4]` for the estimate. */
  readonly estimateCi: string;
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
  const samples = samplesOf(block.design);
  const recorded = samples.length ? Math.max(...samples.map((sample) => recordedDecimals(sample.values))) : 0;
  const summaryDecimals = Math.min(6, recorded + 1);
  const {outcome, spec} = block;
  const level = `${Math.round(spec.confidence * 1000) / 10}%`;
  const estimate = outcome?.estimate;
  // Ratios and coefficients keep two decimals at least: `OR = 3 [1, 15]` hides too much.
  const minimum = estimate && estimate.units === undefined && block.question !== 'difference' ? 2 : 0;
  const estimateDecimals = estimate ? Math.max(minimum, decimalsForWidth(intervalWidth(estimate.value, estimate.ci))) : summaryDecimals;
  const withUnits = (value: number, decimals = estimateDecimals) => unitText(formatFixed(value, decimals), block.units);
  if (!outcome) {
    const compact = Object.values(block.groups)
      .map((g) => `M = ${formatFixed(g.mean, summaryDecimals)}, SD = ${formatFixed(g.sd, summaryDecimals)}, n = ${g.n}`)
      .join('; ');
    return {recordedDecimals: recorded, summaryDecimals, estimateDecimals, withUnits, estimateCi: '', statistic: '', testStatistics: '', effect: '', compact};
  }
  const df = outcome.df;
  const dfText = df === null ? '' : typeof df === 'number' ? `(${formatDf(df)})` : `(${df.map(formatDf).join(', ')})`;
  const statisticSymbol = statisticSymbols[outcome.statistic.name] ?? outcome.statistic.name;
  // Counting statistics (U, V, S, k) are whole numbers and print as such.
  const value = outcome.statistic.value;
  const statistic = `${statisticSymbol}${dfText} = ${Number.isInteger(value) ? formatFixed(value, 0) : formatFixed(value, 2)}`;
  const testStatistics = `${statistic}, ${pClause(outcome.p, pForDecision === outcome.p ? spec.alpha : undefined)}`;
  const effect = outcome.effect ? effectText(outcome.effect, level) : '';
  return {
    recordedDecimals: recorded,
    summaryDecimals,
    estimateDecimals,
    withUnits,
    estimateCi: estimate ? wording.confidenceInterval(percentOf(estimate.level), boundedScale(block) ? boundedInterval(estimate.ci, Math.max(2, estimateDecimals)) : formatInterval(estimate.ci, estimateDecimals)) : '',
    statistic,
    testStatistics,
    effect,
    compact: effect ? `${testStatistics}, ${effect}` : testStatistics,
  };
}

/**
 * Estimates on a scale bounded by 1 (correlations, proportions and their
 * differences) print without a leading zero, as the reporting style asks.
 */
export function boundedScale(block: ComputedBlock): boolean {
  const estimate = block.outcome?.estimate;
  return estimate !== undefined && estimate.units === undefined && Math.abs(estimate.value) <= 1 && block.question !== 'difference'
    && block.question !== 'equivalence';
}

function boundedInterval(ci: readonly [number, number], decimals: number): string {
  return `[${formatUnitBounded(ci[0], decimals)}, ${formatUnitBounded(ci[1], decimals)}]`;
}

/** `g = 1.25, 95% CI [0.31, 2.17]`; bounded effects (r, V, η²) without a leading zero. */
function effectText(effect: EffectSize, level: string): string {
  const symbol = effectSymbols[effect.name] ?? effect.name;
  const bounded = unitBoundedEffects.has(effect.name);
  const format = (v: number) => (bounded ? formatUnitBounded(v, 2) : formatFixed(v, 2));
  const ci = effect.ci && (Number.isFinite(effect.ci[0]) || Number.isFinite(effect.ci[1]))
    ? `, ${wording.confidenceInterval(level, `[${format(effect.ci[0])}, ${format(effect.ci[1])}]`)}`
    : '';
  return `${symbol} = ${format(effect.value)}${ci}`;
}

export function unitText(number: string, units: string | undefined): string {
  if (!units) return number;
  return units === '%' ? `${number}%` : `${number} ${units}`;
}

/** `95%`, `90%` (TOST's interval is at 1 − 2α, not at the block's confidence). */
function percentOf(level: number): string {
  return `${Math.round(level * 1000) / 10}%`;
}

/** Width of a two-sided interval; twice the finite half for one-sided ones. */
function intervalWidth(value: number, ci: readonly [number, number]): number {
  const [lower, upper] = ci;
  if (Number.isFinite(lower) && Number.isFinite(upper)) return upper - lower;
  return 2 * Math.abs(Number.isFinite(lower) ? value - lower : upper - value);
}
