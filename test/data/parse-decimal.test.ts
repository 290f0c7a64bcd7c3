import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {exactOffsetDifference, parseDecimal} from '../../src/data/parse-decimal.js';

describe('parseDecimal', () => {
  it('accepts plain decimal notation with a dot', () => {
    // Expected values are the same literals read by the JavaScript parser (common practice, no source).
    const cases: Array<[string, number]> = [
      ['0', 0], ['-1.5', -1.5], ['1e3', 1000], ['+2', 2], ['.5', 0.5], ['1.', 1], ['-2.5E-3', -0.0025], ['007', 7],
    ];
    for (const [text, value] of cases) expect(parseDecimal(text, '.')).toBe(value);
  });

  it('accepts a decimal comma only under decimal ","', () => {
    expect(parseDecimal('1,5', ',')).toBe(1.5);
    expect(parseDecimal('-,25', ',')).toBe(-0.25);
    expect(parseDecimal('1,5', '.')).toBeUndefined();
    expect(parseDecimal('1.5', ',')).toBeUndefined();
  });

  it('rejects thousands separators, hex, infinities, NaN, text, blanks and overflow', () => {
    for (const text of ['1,000', '1,000.5', '1 000', '0x10', 'Infinity', '-Infinity', 'NaN', 'abc', '', ' ', ' 1', '1e', '.', '-', '1e400', '12,1O', '1_000', '٣']) {
      expect(parseDecimal(text, '.')).toBeUndefined();
    }
    expect(parseDecimal('1.000,5', ',')).toBeUndefined();
  });

  it('rounds long literals to the nearest double as the JavaScript parser does', () => {
    // 0.1 + 2^-56-ish digits; Number() is the reference (common practice, no source).
    expect(parseDecimal('0.10000000000000000555111512312578270211815834045410156250001', '.')).toBe(0.1);
  });
});

/** The exact value of a decimal text, numerator / 10^scale with scale ≥ 0: the test's own BigInt reading. */
function exactValue(text: string): {numerator: bigint; scale: number} {
  const [, sign, whole, fraction, exponent] = /^([+-]?)(\d*)[.,]?(\d*)(?:[eE]([+-]?\d+))?$/.exec(text)!;
  const digits = BigInt(whole! + fraction! || '0') * (sign === '-' ? -1n : 1n);
  const scale = fraction!.length - Number(exponent ?? 0);
  return scale >= 0 ? {numerator: digits, scale} : {numerator: digits * 10n ** BigInt(-scale), scale: 0};
}

function exactDifference(a: string, b: string): {numerator: bigint; scale: number} {
  const [x, y] = [exactValue(a), exactValue(b)];
  const scale = Math.max(x.scale, y.scale);
  return {numerator: x.numerator * 10n ** BigInt(scale - x.scale) - y.numerator * 10n ** BigInt(scale - y.scale), scale};
}

/** The bits of a double as a signed 64-bit integer, and back. */
const view = new DataView(new ArrayBuffer(8));
function nextUp(x: number): number {
  if (x === 0) return Number.MIN_VALUE;
  view.setFloat64(0, x);
  view.setBigInt64(0, view.getBigInt64(0) + (x > 0 ? 1n : -1n));
  return view.getFloat64(0);
}
const nextDown = (x: number) => -nextUp(-x);

/** |q − numerator/10^scale| × 10^scale × 2^1074, exactly (q a finite double, so q × 2^1074 is an integer). */
function distance(q: number, numerator: bigint, scale: number): bigint {
  view.setFloat64(0, Math.abs(q));
  const bits = view.getBigUint64(0);
  const biased = Number(bits >> 52n);
  const fraction = bits & ((1n << 52n) - 1n);
  const units = (biased === 0 ? fraction : fraction | (1n << 52n)) << BigInt(Math.max(biased - 1, 0)); // q / 2^-1074
  const d = numerator * (1n << 1074n) - (q < 0 ? -units : units) * 10n ** BigInt(scale);
  return d < 0n ? -d : d;
}

/** Whether x is the double nearest numerator/10^scale, ties to the even significand (IEEE 754 round to nearest). */
function isNearest(x: number, numerator: bigint, scale: number): boolean {
  const here = distance(x, numerator, scale);
  const neighbours = [nextUp(x), nextDown(x)].filter(Number.isFinite).map((q) => distance(q, numerator, scale));
  if (neighbours.some((d) => d < here)) return false;
  view.setFloat64(0, x);
  return !neighbours.some((d) => d === here) || (view.getBigUint64(0) & 1n) === 0n;
}

describe('exactOffsetDifference', () => {
  // Expected values: the decimal difference worked by hand, then the nearest
  // double, written as the literal JavaScript reads to that double (common practice, no source).
  it('subtracts decimals exactly before rounding (NIST StRD SmLs07 and NumAcc4 data)', () => {
    expect(exactOffsetDifference('1000000000000.4', '1000000000000.3', '.')).toBe(0.1);
    expect(1000000000000.4 - 1000000000000.3).toBe(0.0999755859375); // the doubles alone
    expect(exactOffsetDifference('10000000.1', '10000000.2', '.')).toBe(-0.1);
    expect(exactOffsetDifference('10000000.2', '10000000.2', '.')).toBe(0);
    expect(Object.is(exactOffsetDifference('-0.5', '-0.5', '.'), 0)).toBe(true); // +0, never -0
  });

  it('reads signs, exponents and a decimal comma', () => {
    expect(exactOffsetDifference('1e3', '2.5E+2', '.')).toBe(750);
    expect(exactOffsetDifference('-1.5e-3', '+2', '.')).toBe(-2.0015);
    expect(exactOffsetDifference('.5', '1.', '.')).toBe(-0.5);
    expect(exactOffsetDifference('1,25', '-0,75', ',')).toBe(2);
    expect(exactOffsetDifference('-,5e1', '0', ',')).toBe(-5);
    expect(exactOffsetDifference('12345678901234567890e-10', '0.0000000001', '.')).toBe(1234567890.1234567889);
    expect(exactOffsetDifference('1e308', '-1e308', '.')).toBe(Infinity); // beyond the largest double: overflow, as rounding should
  });

  it('rounds long fractions once, ties to even', () => {
    // Exact decimal expansions of 0.1's double, of 1 + 2^-53 and of 1 + 3·2^-53 (Python decimal at 2000 digits).
    const tenth = '0.1000000000000000055511151231257827021181583404541015625';
    expect(exactOffsetDifference(tenth, '0', '.')).toBe(0.1);
    expect(exactOffsetDifference('1' + tenth.slice(1), '1', '.')).toBe(0.1);
    const tieDown = '1.00000000000000011102230246251565404236316680908203125'; // halfway between 1 and 1 + 2^-52
    const tieUp = '1.00000000000000033306690738754696212708950042724609375'; // halfway between 1 + 2^-52 and 1 + 2^-51
    expect(exactOffsetDifference(tieDown, '0', '.')).toBe(1);
    expect(exactOffsetDifference(tieUp, '0', '.')).toBe(1 + 2 ** -51);
    expect(exactOffsetDifference('1' + tieDown, '10', '.')).toBe(1);
    expect(exactOffsetDifference(tieDown + '1', '0', '.')).toBe(1 + 2 ** -52);
    // A digit far below the last place decides a tie, whatever its exponent.
    expect(exactOffsetDifference(tieDown, '1e-99999', '.')).toBe(1);
    expect(exactOffsetDifference(tieDown, '-1e-99999', '.')).toBe(1 + 2 ** -52);
    expect(exactOffsetDifference('1e-99999', '3e-99999', '.')).toBe(0);
    expect(exactOffsetDifference('5', '1e-99999', '.')).toBe(5);
  });

  it('rounds into the subnormal range once', () => {
    expect(exactOffsetDifference('1e-320', '0', '.')).toBe(1e-320);
    expect(exactOffsetDifference('3e-320', '2e-320', '.')).toBe(1e-320);
    const halfLeast = exactValue('2.4703282292062327208828439643411068618252990130716238221279284125033775363510437593264991818081799618989828234772285886546332835517796989819938739800539093906315035659515570226392290858392449105184435931802849936536152500319370457678249219365623669863658480757001585769269903706311928279558551332927834338409351978015531246597263579574622766465272827220056374006485499977096599470454020828166226237857393450736339007967761930577506740176324673600968951340535537458516661134223766678604162159680461914467291840300530057530849048765391711386591646239524912623653881879636239373280423891018672348497668235089863388587925628302755995657524455507255189313690836254779186948667994968324049705821028513185451396213837722826145437693412532098591327667236328125E-324');
    const text = `${halfLeast.numerator}e-${halfLeast.scale}`; // 2^-1075 (Python decimal), halfway between 0 and 2^-1074
    expect(exactOffsetDifference(text, '0', '.')).toBe(0);
    expect(exactOffsetDifference(`${halfLeast.numerator}1e-${halfLeast.scale + 1}`, '0', '.')).toBe(Number.MIN_VALUE);
  });

  it('refuses text that is not a finite decimal number (a programmer error)', () => {
    expect(() => exactOffsetDifference('1,5', '0', '.')).toThrow(/not a decimal number/);
    expect(() => exactOffsetDifference('1', 'NaN', '.')).toThrow(/not a decimal number/);
    expect(() => exactOffsetDifference('1e400', '1e400', '.')).toThrow(/overflows/);
  });

  it('equals plain double subtraction when that is exact', () => {
    // Multiples of 2^-10 below 2^42: the texts are exact decimals of doubles and so is their difference.
    const dyadic = fc.integer({min: -(2 ** 51), max: 2 ** 51}).map((k) => {
      const n = BigInt(k) * 5n ** 10n; // k / 2^10 = k·5^10 / 10^10
      const magnitude = (n < 0n ? -n : n).toString().padStart(11, '0');
      return {value: k / 1024, text: `${n < 0n ? '-' : ''}${magnitude.slice(0, -10)}.${magnitude.slice(-10)}`};
    });
    fc.assert(
      fc.property(dyadic, dyadic, (a, b) => {
        expect(exactOffsetDifference(a.text, b.text, '.')).toBe(a.value - b.value + 0);
      }),
      {numRuns: 1000},
    );
  });

  it('returns the double nearest the exact difference (checked in BigInt arithmetic)', () => {
    const digits = (min: number, max: number) =>
      fc.array(fc.integer({min: 0, max: 9}), {minLength: min, maxLength: max}).map((d) => d.join(''));
    const exponent = fc.option(fc.tuple(fc.constantFrom('e', 'E'), fc.integer({min: -340, max: 280})).map(([e, k]) => `${e}${k}`), {nil: undefined});
    const sign = fc.constantFrom('', '+', '-');
    const anyText = fc
      .tuple(sign, digits(0, 22), digits(0, 30), exponent)
      .filter(([, whole, fraction]) => whole.length + fraction.length > 0)
      .map(([s, whole, fraction, e]) => `${s}${whole}${fraction === '' ? '' : '.' + fraction}${e ?? ''}`);
    // Pairs sharing their leading digits: the cancellation the offset exists for.
    const closePair = fc
      .tuple(sign, digits(1, 16), digits(0, 20), digits(0, 25), digits(0, 25), exponent)
      .map(([s, whole, shared, tailA, tailB, e]) => [`${s}${whole}.${shared}${tailA}${e ?? ''}`, `${s}${whole}.${shared}${tailB}${e ?? ''}`] as const);
    const pair = fc.oneof(fc.tuple(anyText, anyText), closePair);
    fc.assert(
      fc.property(pair, fc.boolean(), ([a, b], comma) => {
        const decimal = comma ? ',' : '.';
        const result = exactOffsetDifference(comma ? a.replace('.', ',') : a, comma ? b.replace('.', ',') : b, decimal);
        const {numerator, scale} = exactDifference(a, b);
        expect(isNearest(result, numerator, scale), `${a} - ${b} gave ${result}`).toBe(true);
        expect(isNearest(nextUp(result), numerator, scale)).toBe(false); // the check can fail
        expect(Object.is(result, -0)).toBe(false);
      }),
      {numRuns: 3000},
    );
  });
});
