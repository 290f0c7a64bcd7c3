import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {MethodError} from '../../../src/methods/method-error.js';
import {shapiroWilk, shapiroWilkCoefficients, shapiroWilkPValue} from '../../../src/methods/shared/shapiro-wilk-core.js';
import {lre} from '../../helpers/lre.js';
import {example} from '../../helpers/reference.js';

/**
 * Deterministic data both languages reproduce bit for bit: the Park–Miller
 * generator s ← 16807·s mod (2³¹ − 1) (exact in doubles), u = s/(2³¹ − 1),
 * and only correctly rounded operations on u. In Python:
 *   u = [(s := 16807*s % M) / M for _ in range(n)]
 *   uniform: u; cubed: u*u*u; sum4: ((u[4i]+u[4i+1])+u[4i+2])+u[4i+3].
 */
const M = 2147483647;
function uniforms(seed: number, n: number): number[] {
  const out: number[] = [];
  let s = seed;
  for (let i = 0; i < n; i++) {
    s = (16807 * s) % M;
    out.push(s / M);
  }
  return out;
}
type Kind = 'uniform' | 'cubed' | 'sum4';
function data(kind: Kind, n: number, seed: number): Float64Array {
  if (kind === 'uniform') return Float64Array.from(uniforms(seed, n));
  if (kind === 'cubed') return Float64Array.from(uniforms(seed, n), (u) => u * u * u);
  const u = uniforms(seed, 4 * n);
  return Float64Array.from({length: n}, (_, i) => u[4 * i]! + u[4 * i + 1]! + u[4 * i + 2]! + u[4 * i + 3]!);
}

interface Case {
  kind: Kind;
  n: number;
  seed: number;
  /** mpmath 1.3.0 at 40 digits: the AS R94 formulas (Royston 1992; 1995) evaluated exactly, in an independent Python implementation. */
  exact: {w: number; oneMinusW: number; p: number};
  /** scipy 1.17.1: stats.shapiro(x). */
  scipy: {w: number; p: number};
}

const cases: Case[] = [
  {kind: 'uniform', n: 3, seed: 1, exact: {w: 0.87593523614205408551, oneMinusW: 0.12406476385794591449, p: 0.31254441297379448113}, scipy: {w: 0.875935236142054, p: 0.3125444129737944}},
  {kind: 'cubed', n: 3, seed: 7, exact: {w: 0.77322457786207100583, oneMinusW: 0.22677542213792899417, p: 0.052062493247775611349}, scipy: {w: 0.7732245778620709, p: 0.05206249324777523}},
  {kind: 'cubed', n: 4, seed: 2, exact: {w: 0.75409008112125347209, oneMinusW: 0.24590991887874652791, p: 0.04215282290185067035}, scipy: {w: 0.7540900809624717, p: 0.04215282275984018}},
  {kind: 'sum4', n: 5, seed: 3, exact: {w: 0.86400466007529081778, oneMinusW: 0.13599533992470918222, p: 0.24298642786552379817}, scipy: {w: 0.864004660112144, p: 0.24298642800109022}},
  {kind: 'cubed', n: 11, seed: 4, exact: {w: 0.87381781205524649542, oneMinusW: 0.12618218794475350458, p: 0.086775160177205164696}, scipy: {w: 0.8738178119725319, p: 0.08677515996896092}},
  {kind: 'uniform', n: 20, seed: 5, exact: {w: 0.94499162087057455221, oneMinusW: 0.055008379129425447791, p: 0.29737707620291413506}, scipy: {w: 0.9449916209814676, p: 0.29737707760926324}},
  {kind: 'sum4', n: 50, seed: 6, exact: {w: 0.98052519635611187994, oneMinusW: 0.019474803643888120057, p: 0.57431692166343926321}, scipy: {w: 0.9805251963072731, p: 0.5743169195705495}},
  {kind: 'uniform', n: 500, seed: 8, exact: {w: 0.95005620590495158593, oneMinusW: 0.04994379409504841407, p: 5.9159537022545442836e-12}, scipy: {w: 0.9500562067156713, p: 5.915955300758121e-12}},
  {kind: 'sum4', n: 5000, seed: 9, exact: {w: 0.99806739542360789753, oneMinusW: 0.0019326045763921024672, p: 6.9897381222061281744e-6}, scipy: {w: 0.9980673951801525, p: 6.9897275990837885e-6}},
  {kind: 'cubed', n: 5000, seed: 10, exact: {w: 0.82801466342542852717, oneMinusW: 0.17198533657457147283, p: 9.0070675597022380547e-59}, scipy: {w: 0.8280146629679189, p: 9.007066542322365e-59}},
];

describe('shapiroWilk (AS R94)', () => {
  it('evaluates the AS R94 formulas to 12+ digits in W, 1 − W and p (n = 3 … 5000)', () => {
    for (const c of cases) {
      const label = `${c.kind} n=${c.n}`;
      const result = shapiroWilk(data(c.kind, c.n, c.seed));
      expect(lre(result.w, c.exact.w), label).toBeGreaterThanOrEqual(14);
      expect(lre(1 - result.w, c.exact.oneMinusW), label).toBeGreaterThanOrEqual(12);
      // p carries the digits of ln(1 − W) times the slope of the normal tail.
      expect(lre(result.p, c.exact.p), label).toBeGreaterThanOrEqual(12);
    }
  });

  it('agrees with scipy to the digits scipy’s coefficients carry', () => {
    // scipy 1.17.1's coefficients differ from Φ⁻¹ evaluated exactly by up to
    // 1.5e-7 relative at n = 5000 and 5e-9 at n = 4 (measured with
    // scipy.stats._morestats.swilk against mpmath), which caps W at about 7
    // digits and p at about 5 (n = 5000, where p is most sensitive).
    for (const c of cases) {
      const label = `${c.kind} n=${c.n}`;
      const result = shapiroWilk(data(c.kind, c.n, c.seed));
      expect(lre(result.w, c.scipy.w), label).toBeGreaterThanOrEqual(c.n === 3 ? 14 : 8.5);
      expect(lre(result.p, c.scipy.p), label).toBeGreaterThanOrEqual(c.n === 3 ? 14 : 5.5);
    }
  });

  it('computes p from W as scipy does, to 10+ digits, once scipy’s own W is fed in', () => {
    // Isolates the significance formulas from the coefficients. 1 − W from
    // scipy's double keeps about 13 digits at W = 0.998.
    for (const c of cases.filter((x) => x.n > 3)) {
      expect(lre(shapiroWilkPValue(c.n, 1 - c.scipy.w), c.scipy.p), `${c.kind} n=${c.n}`).toBeGreaterThanOrEqual(10);
    }
  });

  it('builds the coefficients of Royston 1992 (outermost pair corrected; n = 4, 5 only the last)', () => {
    // mpmath 1.3.0 at 40 digits, same independent implementation as above.
    const expected: Record<number, number[]> = {
      4: [0.68726428590847098523, 0.16633641006923123433],
      5: [0.66463926040335807145, 0.24136000814235398015],
      6: [0.64297123011818427792, 0.28071248546350643218, 0.088252465944072117515],
      11: [0.56002532825501257252, 0.33149867637979487773, 0.22601146129756570347],
      5000: [0.054910585028747890912, 0.048791121572967481021, 0.046346012074213177918],
    };
    for (const [n, upper] of Object.entries(expected)) {
      const a = shapiroWilkCoefficients(Number(n));
      upper.forEach((value, j) => {
        // 13: φ is a ratio of differences, which costs the small middle coefficients a digit.
        expect(lre(a[a.length - 1 - j]!, value), `n=${n} a[${j}]`).toBeGreaterThanOrEqual(13);
        expect(a[j]).toBe(-a[a.length - 1 - j]!);
      });
      expect(lre(a.reduce((s, v) => s + v * v, 0), 1)).toBeGreaterThanOrEqual(14);
    }
  });

  it('reproduces Shapiro & Wilk 1965, Example 1 (weights of 11 men)', () => {
    const reference = example<{data: {weights_lb: number[]}}>('shapiro_wilk--shapiro-wilk-1965-example1.json');
    const result = shapiroWilk(Float64Array.from(reference.data.weights_lb));
    // Shapiro & Wilk 1965, Biometrika 52, p. 606 (as quoted by a secondary source): W = 0.79, p < 0.01.
    expect(result.w.toFixed(2)).toBe('0.79');
    expect(result.p).toBeLessThan(0.01);
    // mpmath 1.3.0 at 40 digits, AS R94 formulas: W = 0.78881469483538743383, p = 0.0067038140565030117498.
    expect(lre(result.w, 0.78881469483538743383)).toBeGreaterThanOrEqual(14);
    expect(lre(result.p, 0.0067038140565030117498)).toBeGreaterThanOrEqual(12);
    // scipy 1.17.1: stats.shapiro(weights) = (0.7888146948631716, 0.006703814061898823).
    expect(lre(result.w, 0.7888146948631716)).toBeGreaterThanOrEqual(9);
    expect(lre(result.p, 0.006703814061898823)).toBeGreaterThanOrEqual(8);
  });

  it('gives the exact n = 3 limits: p = 0 at a tie, p = 1 for equal gaps', () => {
    // Shapiro & Wilk 1965: for n = 3, W ranges over [3/4, 1] with p = (6/π)(asin √W − asin √¾).
    expect(shapiroWilk(Float64Array.of(0, 0, 1))).toEqual({w: 0.75, p: 0});
    expect(shapiroWilk(Float64Array.of(1, 2, 3))).toEqual({w: 1, p: 1});
  });

  it('refuses fewer than 3 and more than 5000 values; a constant sample has no W', () => {
    expect(() => shapiroWilk(Float64Array.of(1, 2))).toThrow(MethodError);
    expect(() => shapiroWilk(new Float64Array(5001).map((_, i) => i))).toThrow(MethodError);
    expect(shapiroWilk(Float64Array.of(4, 4, 4, 4))).toEqual({w: NaN, p: NaN});
  });

  it('keeps W in (0, 1] and p in [0, 1], unchanged by order, shift and scale', () => {
    // Multiples of 1/16 so that shifting by 3 and scaling by a power of two are exact.
    const values = fc.array(fc.integer({min: -1e6, max: 1e6}).map((v) => v / 16), {minLength: 3, maxLength: 60});
    fc.assert(
      fc.property(values, fc.integer({min: -4, max: 8}).map((e) => 2 ** e), (xs, scale) => {
        if (new Set(xs).size < 2) return;
        const x = Float64Array.from(xs);
        const {w, p} = shapiroWilk(x);
        expect(w).toBeGreaterThan(0);
        expect(w).toBeLessThanOrEqual(1);
        expect(p).toBeGreaterThanOrEqual(0);
        expect(p).toBeLessThanOrEqual(1);
        const moved = shapiroWilk(Float64Array.from([...xs].reverse(), (v) => v * scale + 3));
        expect(Math.abs(moved.w - w)).toBeLessThan(1e-12);
        expect(Math.abs(moved.p - p)).toBeLessThanOrEqual(1e-9 * p);
      }),
    );
  });
});
