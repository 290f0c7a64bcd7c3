import {defaultStyle, type NumberStyle} from './number-style.js';
import {symbol} from './symbol-marks.js';

/**
 * Number formatting in a report's style (`number-style.ts`): a true minus
 * sign, thousands separators, `p < .001` rather than `p = .000`, and the
 * leading zero of quantities bounded by 1 as the style asks. The free
 * functions below use the default style; `numberFormat(style)` binds another.
 */
const minus = '\u2212';

export interface FormattedP {
  readonly relation: '=' | '<' | '>';
  readonly text: string;
}

export interface NumberFormat {
  readonly style: NumberStyle;
  /** Fixed decimals with a true minus sign and grouped thousands. */
  fixed(value: number, decimals: number): string;
  /** A value bounded by 1 in magnitude (`.45` or `0.45`, as the style asks). */
  bounded(value: number, decimals: number): string;
  p(p: number, alpha?: number): FormattedP;
  /** `p = .010` with the symbol marked (`symbol-marks.ts`). */
  pClause(p: number, alpha?: number, name?: string): string;
  /** The declared alpha: `.05`, `.005`. */
  alpha(alpha: number): string;
  /** `[0.8, 5.4]` */
  interval(ci: readonly [number, number], decimals: number): string;
  boundedInterval(ci: readonly [number, number], decimals: number): string;
}

export function numberFormat(style: NumberStyle = defaultStyle): NumberFormat {
  const fixed = (value: number, decimals: number): string => {
    if (Number.isNaN(value)) return 'NaN';
    if (value === Infinity) return '\u221e';
    if (value === -Infinity) return `${minus}\u221e`;
    const rounded = Math.abs(value).toFixed(decimals);
    const negative = value < 0 && Number(rounded) !== 0;
    const [whole = '', fraction] = rounded.split('.');
    const grouped = whole.length >= style.groupFromDigits ? whole.replace(/\B(?=(\d{3})+(?!\d))/g, style.thousandsSeparator) : whole;
    return `${negative ? minus : ''}${grouped}${fraction === undefined ? '' : `.${fraction}`}`;
  };
  const bounded = (value: number, decimals: number): string => {
    const text = fixed(value, decimals);
    return style.dropBoundedZero ? text.replace(/^(\u2212?)0\./, '$1.') : text;
  };
  /**
   * Three decimals; more when rounding would put p on the other side of
   * alpha than the decision (p = .0496 must not print as .050).
   */
  const p = (value: number, alpha?: number): FormattedP => {
    if (value < 0.001) return {relation: '<', text: bounded(0.001, 3)};
    if (value > 0.999) return {relation: '>', text: bounded(0.999, 3)};
    let decimals = 3;
    while (alpha !== undefined && decimals < 6 && Math.sign(value - alpha) !== Math.sign(Number(value.toFixed(decimals)) - alpha)) {
      decimals++;
    }
    return {relation: '=', text: bounded(value, decimals)};
  };
  return {
    style,
    fixed,
    bounded,
    p,
    pClause: (value, alpha, name = 'p') => {
      const {relation, text} = p(value, alpha);
      const [adjective, letter] = name.includes(' ') ? [name.slice(0, name.lastIndexOf(' ') + 1), name.slice(name.lastIndexOf(' ') + 1)] : ['', name];
      return `${adjective}${symbol(letter)} ${relation} ${text}`;
    },
    alpha: (alpha) => bounded(alpha, 6).replace(/(\.\d*?)0+$/, '$1').replace(/\.$/, ''),
    interval: (ci, decimals) => `[${fixed(ci[0], decimals)}, ${fixed(ci[1], decimals)}]`,
    boundedInterval: (ci, decimals) => `[${bounded(ci[0], decimals)}, ${bounded(ci[1], decimals)}]`,
  };
}

const standard = numberFormat();

/** Fixed decimals in the default style. */
export function formatFixed(value: number, decimals: number): string {
  return standard.fixed(value, decimals);
}

/** A value bounded by 1 in magnitude, without its leading zero (`.45`). */
export function formatUnitBounded(value: number, decimals: number): string {
  return standard.bounded(value, decimals);
}

export function formatP(p: number, alpha?: number): FormattedP {
  return standard.p(p, alpha);
}

export function pClause(p: number, alpha?: number, name = 'p'): string {
  return standard.pClause(p, alpha, name);
}

/** Degrees of freedom: integers as such, fractional (Welch) to one decimal. */
export function formatDf(df: number, format: NumberFormat = standard): string {
  return Number.isInteger(df) ? format.fixed(df, 0) : format.fixed(df, 1);
}

/**
 * Decimals that show an interval of this width to two significant digits:
 * the interval's width, not the estimate's size, says how many digits carry
 * information (a mean of 31.4 MPa ± 2 needs one decimal, ± 0.02 three).
 */
export function decimalsForWidth(width: number): number {
  if (!(width > 0) || !Number.isFinite(width)) return 2;
  return Math.min(6, Math.max(0, Math.ceil(-Math.log10(width)) + 1));
}

/** Decimals the data were recorded with (at most 6). */
export function recordedDecimals(values: ArrayLike<number>): number {
  let decimals = 0;
  for (let i = 0; i < values.length && decimals < 6; i++) {
    const text = String(values[i]);
    if (text.includes('e')) return 6;
    const dot = text.indexOf('.');
    if (dot >= 0) decimals = Math.max(decimals, text.length - dot - 1);
  }
  return Math.min(decimals, 6);
}

/** Power as a whole percentage; never 100% (power below 1 must not read as certainty). */
export function formatPercent(proportion: number): string {
  const percent = Math.round(proportion * 100);
  return percent >= 100 && proportion < 1 ? '>99%' : `${percent}%`;
}

export function formatInterval(ci: readonly [number, number], decimals: number): string {
  return standard.interval(ci, decimals);
}
