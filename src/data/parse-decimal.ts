/**
 * A plain decimal number in the notation data files use: optional sign,
 * digits with at most one decimal mark (`1.`, `.5` allowed), optional
 * exponent. Thousands separators, hex, `Infinity` and `NaN` are text, so a
 * column holding them stays text instead of being half-converted.
 */
const PATTERN = {
  '.': /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/,
  ',': /^[+-]?(?:\d+(?:,\d*)?|,\d+)(?:[eE][+-]?\d+)?$/,
} as const;

/**
 * The number written in `text` under the decimal mark `decimal`, or undefined
 * when `text` is not such a number or overflows to ±Infinity. No trimming:
 * callers decide which cells may carry surrounding whitespace.
 */
export function parseDecimal(text: string, decimal: '.' | ','): number | undefined {
  if (!PATTERN[decimal].test(text)) return undefined;
  // ECMA-262 StringToNumber rounds to nearest for up to 20 significant digits
  // (beyond that it is implementation-defined; V8 still rounds correctly).
  const value = Number(decimal === ',' ? text.replace(',', '.') : text);
  return Number.isFinite(value) ? value : undefined;
}
