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

/** A decimal exactly as written: (-1)^negative × digits × 10^-scale. */
interface ExactDecimal {
  readonly negative: boolean;
  /** Significant digits, no leading or trailing zeros; '' for zero. */
  readonly digits: string;
  readonly scale: number;
  /** |value| < 10^top (and ≥ 10^(top-1)); -Infinity for zero. */
  readonly top: number;
}

/**
 * `text − offsetText`, both decimal numbers that `parseDecimal` accepts,
 * computed exactly and rounded once to the nearest double (ties to even).
 * Data columns are centred with it: `1000000000000.4 − 1000000000000.3` is
 * exactly 0.1 here, while the difference of the two parsed doubles is
 * 0.0999755859375 (NIST StRD SmLs07–09).
 *
 * Both texts become integer × 10^-scale (BigInt) and are subtracted on a
 * common scale; the quotient by 10^scale is then rounded by integer
 * division with remainder (round half to even, subnormals included), since
 * a float division is a single rounding only when both operands are exact
 * doubles (integer < 2^53, scale ≤ 22 — taken as the fast path). An operand
 * far below the other's last digit and below 1e-1075 (every rounding
 * boundary of a double is a multiple of 2^-1075, hence of 10^-1075) is
 * replaced by a one-digit stand-in on the same side, which rounds alike,
 * so exponents such as `1e-99999` cost nothing. The result is +0 when the
 * difference rounds to zero. Throws a plain Error (programmer misuse) on
 * text that is not such a number.
 */
export function exactOffsetDifference(text: string, offsetText: string, decimal: '.' | ','): number {
  const a = exactDecimal(text, decimal);
  const b = cachedOffset(offsetText, decimal);
  if (a.top <= -1100 && b.top <= -1100) return 0; // |a − b| < 2e-1100, far below half the least subnormal
  const [x, y] = a.top >= b.top ? [a, standIn(b, a)] : [standIn(a, b), b];
  const scale = Math.max(x.scale, y.scale);
  const shiftX = scale - x.scale;
  const shiftY = scale - y.scale;
  if (Math.abs(scale) <= 22 && x.digits.length + shiftX <= 15 && y.digits.length + shiftY <= 15) {
    // Integers below 10^15 < 2^53: exact in doubles, one rounding in the last step.
    const difference = signedNumber(x) * POWERS_OF_TEN[shiftX]! - signedNumber(y) * POWERS_OF_TEN[shiftY]!;
    return (scale >= 0 ? difference / POWERS_OF_TEN[scale]! : difference * POWERS_OF_TEN[-scale]!) + 0;
  }
  const numerator = signedBigInt(x) * 10n ** BigInt(shiftX) - signedBigInt(y) * 10n ** BigInt(shiftY);
  // A BigInt converts to the nearest double (ECMA-262 §6.1.6.1, "the Number value for x").
  if (scale <= 0) return Number(numerator * 10n ** BigInt(-scale)) + 0;
  if (scale <= 22 && numerator <= SAFE && numerator >= -SAFE) return Number(numerator) / POWERS_OF_TEN[scale]! + 0;
  return roundQuotient(numerator, 10n ** BigInt(scale));
}

const POWERS_OF_TEN = Array.from({length: 23}, (_, k) => Number(`1e${k}`)); // 10^0..10^22, all exact
const SAFE = 2n ** 53n;
const CAPTURE = {
  '.': /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/,
  ',': /^([+-]?)(\d*)(?:,(\d*))?(?:[eE]([+-]?\d+))?$/,
} as const;

let lastOffset: {text: string; decimal: string; parsed: ExactDecimal} | undefined;

/** Columns subtract one offset from every cell: parse it once. */
function cachedOffset(text: string, decimal: '.' | ','): ExactDecimal {
  if (lastOffset?.text !== text || lastOffset.decimal !== decimal) lastOffset = {text, decimal, parsed: exactDecimal(text, decimal)};
  return lastOffset.parsed;
}

function exactDecimal(text: string, decimal: '.' | ','): ExactDecimal {
  const match = CAPTURE[decimal].exec(text);
  const [, sign = '', whole = '', fraction = '', exponent = '0'] = match ?? [];
  if (!match || whole.length + fraction.length === 0) {
    throw new Error(`exactOffsetDifference: ${JSON.stringify(text)} is not a decimal number`);
  }
  const all = whole + fraction;
  let first = 0;
  let end = all.length;
  while (first < end && all.charCodeAt(first) === 48) first++;
  while (end > first && all.charCodeAt(end - 1) === 48) end--;
  if (first === end) return {negative: false, digits: '', scale: 0, top: -Infinity};
  const digits = all.slice(first, end);
  const scale = fraction.length - Number(exponent) - (all.length - end);
  const top = digits.length - scale;
  // Beyond 1e309 no double is finite; refusing it also bounds the powers of ten below.
  if (top > 309) throw new Error(`exactOffsetDifference: ${JSON.stringify(text)} overflows a double`);
  return {negative: sign === '-', digits, scale, top};
}

/**
 * `x` itself, or when |x| < 10^-S with S = max(other.scale, 1075) + 1, the
 * stand-in 10^-(S+1) of the same sign. `other` and every rounding boundary
 * lie on the grid of multiples of 10^-(S-1), so other − x and other − stand-in
 * fall strictly between the same two neighbouring grid points and round alike.
 */
function standIn(x: ExactDecimal, other: ExactDecimal): ExactDecimal {
  const s = Math.max(other.digits === '' ? 0 : other.scale, 1075) + 1;
  if (x.digits === '' || x.top > -s) return x;
  return {negative: x.negative, digits: '1', scale: s + 1, top: -s};
}

function signedNumber(x: ExactDecimal): number {
  const magnitude = x.digits === '' ? 0 : Number(x.digits);
  return x.negative ? -magnitude : magnitude;
}

function signedBigInt(x: ExactDecimal): bigint {
  const magnitude = x.digits === '' ? 0n : BigInt(x.digits);
  return x.negative ? -magnitude : magnitude;
}

/**
 * numerator / denominator (denominator > 0) rounded to the nearest double,
 * ties to even: the quotient is taken in units of the result's last place,
 * 2^max(e − 52, −1074) with e = ⌊log2 |q|⌋, and rounded from the remainder.
 */
function roundQuotient(numerator: bigint, denominator: bigint): number {
  if (numerator === 0n) return 0;
  const magnitude = numerator < 0n ? -numerator : numerator;
  let e = bitLength(magnitude) - bitLength(denominator); // ⌊log2 q⌋ is e or e − 1
  if (e >= 0 ? magnitude < denominator << BigInt(e) : magnitude << BigInt(-e) < denominator) e -= 1;
  const ulp = Math.max(e - 52, -1074);
  const scaledNumerator = ulp < 0 ? magnitude << BigInt(-ulp) : magnitude;
  const scaledDenominator = ulp > 0 ? denominator << BigInt(ulp) : denominator;
  let units = scaledNumerator / scaledDenominator;
  const twiceRemainder = (scaledNumerator % scaledDenominator) * 2n;
  if (twiceRemainder > scaledDenominator || (twiceRemainder === scaledDenominator && (units & 1n) === 1n)) units += 1n;
  // units ≤ 2^53 is exact, and scaling by a power of two is exact down to 2^-1074 (or overflows to ±Infinity, as rounding should).
  const result = Number(units) * 2 ** ulp;
  return (numerator < 0n ? -result : result) + 0;
}

/** Bits of n > 0, from its double when that is finite (then off by at most one). */
function bitLength(n: bigint): number {
  const approximate = Number(n);
  if (!Number.isFinite(approximate)) return n.toString(2).length;
  const bits = Math.floor(Math.log2(approximate)) + 1;
  if (n >= 1n << BigInt(bits)) return bits + 1;
  return n < 1n << BigInt(bits - 1) ? bits - 1 : bits;
}
