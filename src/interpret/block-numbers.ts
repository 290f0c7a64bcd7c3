import {samplesOf, type ComputedBlock} from '../compute/compute-block.js';
import {
  decimalsForWidth,
  formatDf,
  formatFixed,
  formatInterval,
  pClause,
  recordedDecimals,
} from './format-number.js';
import {effectSymbols, wording} from './wording.js';

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
  const recorded = Math.max(...samplesOf(block.design).map((sample) => recordedDecimals(sample.values)));
  const summaryDecimals = Math.min(6, recorded + 1);
  const {outcome, spec} = block;
  const level = `${Math.round(spec.confidence * 1000) / 10}%`;
  const withUnits = (value: number, decimals = estimateDecimals) => unitText(formatFixed(value, decimals), block.units);
  const estimateDecimals = outcome ? decimalsForWidth(intervalWidth(outcome.estimate.value, outcome.estimate.ci)) : summaryDecimals;
  if (!outcome) {
    const all = Object.values(block.groups);
    const compact = all
      .map((g) => `M = ${formatFixed(g.mean, summaryDecimals)}, SD = ${formatFixed(g.sd, summaryDecimals)}, n = ${g.n}`)
      .join('; ');
    return {recordedDecimals: recorded, summaryDecimals, estimateDecimals, withUnits, estimateCi: '', statistic: '', testStatistics: '', effect: '', compact};
  }
  const df = outcome.df;
  const dfText = df === null ? '' : typeof df === 'number' ? `(${formatDf(df)})` : `(${df.map(formatDf).join(', ')})`;
  const statistic = `${outcome.statistic.name}${dfText} = ${formatFixed(outcome.statistic.value, 2)}`;
  const testStatistics = `${statistic}, ${pClause(outcome.p, pForDecision === outcome.p ? spec.alpha : undefined)}`;
  const symbol = effectSymbols[outcome.effect.name] ?? outcome.effect.name;
  const effectCi = wording.confidenceInterval(level, formatInterval(outcome.effect.ci, 2));
  const effect = `${symbol} = ${formatFixed(outcome.effect.value, 2)}, ${effectCi}`;
  return {
    recordedDecimals: recorded,
    summaryDecimals,
    estimateDecimals,
    withUnits,
    estimateCi: wording.confidenceInterval(level, formatInterval(outcome.estimate.ci, estimateDecimals)),
    statistic,
    testStatistics,
    effect,
    compact: `${testStatistics}, ${effect}`,
  };
}

export function unitText(number: string, units: string | undefined): string {
  if (!units) return number;
  return units === '%' ? `${number}%` : `${number} ${units}`;
}

/** Width of a two-sided interval; twice the finite half for one-sided ones. */
function intervalWidth(value: number, ci: readonly [number, number]): number {
  const [lower, upper] = ci;
  if (Number.isFinite(lower) && Number.isFinite(upper)) return upper - lower;
  return 2 * Math.abs(Number.isFinite(lower) ? value - lower : upper - value);
}
