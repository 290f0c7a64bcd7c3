/**
 * Number conventions of the default reporting style (common in the social
 * and life sciences): no leading zero for quantities bounded by 1 (p,
 * correlations), a true minus sign, thousands separators from 10,000, and
 * `p < .001` rather than `p = .000`.
 */
const minus = '\u2212';

/** Fixed decimals with a true minus sign and grouping from 10,000. */
export function formatFixed(value: number, decimals: number): string {
  if (Number.isNaN(value)) return 'NaN';
  if (value === Infinity) return '\u221e';
  if (value === -Infinity) return `${minus}\u221e`;
  const rounded = Math.abs(value).toFixed(decimals);
  const negative = value < 0 && Number(rounded) !== 0;
  const [whole = '', fraction] = rounded.split('.');
  const grouped = whole.length > 4 ? whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',') : whole;
  return `${negative ? minus : ''}${grouped}${fraction === undefined ? '' : `.${fraction}`}`;
}

/** A value bounded by 1 in magnitude, without its leading zero (`.45`). */
export function formatUnitBounded(value: number, decimals: number): string {
  return formatFixed(value, decimals).replace(/^(\u2212?)0\./, '$1.');
}

export interface FormattedP {
  readonly relation: '=' | '<' | '>';
  readonly text: string;
}

/**
 * Three decimals; more when rounding would put p on the other side of
 * alpha than the decision (p = .0496 must not print as .050).
 */
export function formatP(p: number, alpha?: number): FormattedP {
  if (p < 0.001) return {relation: '<', text: '.001'};
  if (p > 0.999) return {relation: '>', text: '.999'};
  let decimals = 3;
  while (alpha !== undefined && decimals < 6 && Math.sign(p - alpha) !== Math.sign(Number(p.toFixed(decimals)) - alpha)) {
    decimals++;
  }
  return {relation: '=', text: formatUnitBounded(p, decimals)};
}

export function pClause(p: number, alpha?: number, symbol = 'p'): string {
  const {relation, text} = formatP(p, alpha);
  return `${symbol} ${relation} ${text}`;
}

/** Degrees of freedom: integers as such, fractional (Welch) to one decimal. */
export function formatDf(df: number): string {
  return Number.isInteger(df) ? String(df) : formatFixed(df, 1);
}

/** Decimals that show an interval of this width to two significant digits. */
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

export function formatPercent(proportion: number): string {
  return `${Math.round(proportion * 100)}%`;
}

export function formatInterval(ci: readonly [number, number], decimals: number): string {
  return `[${formatFixed(ci[0], decimals)}, ${formatFixed(ci[1], decimals)}]`;
}
