import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {
  chiSquareCdf,
  chiSquareQuantile,
  chiSquareSf,
  chiSquareUpperQuantile,
} from '../../src/distributions/chi-square.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';

/** Digits required: 12 at ordinary arguments, 9 in far tails (issue 3). */
const digitsFor = (ref: number): number => (ref > 1e-30 ? 12 : 9);

describe('chiSquareCdf / chiSquareSf against mpmath', () => {
  // mpmath 1.3.0 at 60 digits: P(df/2, x/2) and Q(df/2, x/2) by the power series
  // and Legendre's continued fraction, cross-checked with mpmath.gammainc
  // where it converges; computed for this test. [df, x, cdf, sf]
  const table: [number, number, number, number][] = [
    [0.01, 1e-5, 0.9434944264187164007031, 0.05650557358128359929692],
    [0.1, 9.044, 0.9998872150559224938211, 0.0001127849440775061788644],
    [0.5, 0.25, 0.6401572060830841110013, 0.3598427939169158889987],
    [1, 3.841458820694124, 0.9499999999999999425646, 0.05000000000000005743537],
    [1, 100, 1, 1.523970604832105213195e-23],
    [2.5, 0.7, 0.1965347363668799277001, 0.8034652636331200722999],
    [3, 0.001, 0.000008407919058046159322835, 0.9999915920809419538407],
    [3, 7.814727903251178, 0.9499999999999999623677, 0.05000000000000003763229],
    [4.5, 1350, 1, 2.159867635816923376345e-290],
    [10, 1000, 1, 1.870290720915949695839e-208],
    [30, 0.3, 2.909467667707348621024e-25, 1],
    [100, 120, 0.9155933189063081703773, 0.08440668109369182962266],
    [1000, 1100, 0.9853855918737048059548, 0.01461440812629519404515],
    [1000, 105.6, 2.229245850005101743805e-296, 1],
    [1e4, 1e4, 0.5018806340338173553481, 0.4981193659661826446519],
    [1e5, 113400, 1, 1.008025973580355918559e-181],
    [1e6, 1005000, 0.9997923219905329699711, 0.0002076780094670300289223],
    [1e7, 1e7, 0.5000594708039378376786, 0.4999405291960621623214],
  ];

  it.each(table)('df = %d, x = %d', (df, x, cdf, sf) => {
    expect(lre(chiSquareCdf(x, df), cdf)).toBeGreaterThanOrEqual(digitsFor(cdf));
    expect(lre(chiSquareSf(x, df), sf)).toBeGreaterThanOrEqual(digitsFor(sf));
  });

  it('reaches 12.7 digits everywhere in the table (measured: 12.7 to 15.9)', () => {
    const worst = Math.min(
      ...table.flatMap(([df, x, cdf, sf]) => [lre(chiSquareCdf(x, df), cdf), lre(chiSquareSf(x, df), sf)]),
    );
    expect(worst).toBeGreaterThanOrEqual(12.7);
  });
});

describe('closed forms', () => {
  it('df = 2: sf = exp(-x/2), cdf = -expm1(-x/2), down to 1e-300', () => {
    // common practice, no source: the χ²(2) is the exponential with mean 2.
    // The sf is exp(-D) with D = x/2; D's rounding caps it at 13 digits at 1e-300.
    for (const x of [1e-12, 0.01, 1, 5.991464547107979, 40, 200, 1381.551055796427]) {
      expect(lre(chiSquareSf(x, 2), Math.exp(-x / 2))).toBeGreaterThanOrEqual(13);
      expect(lre(chiSquareCdf(x, 2), -Math.expm1(-x / 2))).toBeGreaterThanOrEqual(13);
    }
  });

  it('df = 4: sf = exp(-x/2)(1 + x/2)', () => {
    // common practice, no source (Poisson–gamma relation, A&S 26.4.21)
    for (const x of [0.5, 9.487729036781154, 100, 1000]) {
      expect(lre(chiSquareSf(x, 4), Math.exp(-x / 2) * (1 + x / 2))).toBeGreaterThanOrEqual(13);
    }
  });
});

describe('p-values of published chi-square tests, from their statistic and df', () => {
  type Gof = {scipy: Record<string, {X_squared: number; p_value: number}>};
  it('reproduces scipy and R to 13 digits', () => {
    // scipy 1.10 recomputations in shared/reference/examples/*.json
    const given = example<Gof>('chisq_gof--r-chisq-given-probabilities.json').scipy;
    expect(lre(chiSquareSf(given.case_a!.X_squared, 4), given.case_a!.p_value)).toBeGreaterThanOrEqual(13);
    expect(lre(chiSquareSf(given.case_b!.X_squared, 4), given.case_b!.p_value)).toBeGreaterThanOrEqual(13);
    const uniform = example<{scipy: {X_squared: number; p_value: number}}>(
      'chisq_gof--r-chisq-uniform-20-15-25.json',
    ).scipy;
    expect(lre(chiSquareSf(uniform.X_squared, 2), uniform.p_value)).toBeGreaterThanOrEqual(13);
    const doc = example<Gof>('chisq_gof--scipy-doc-chisquare.json').scipy;
    expect(lre(chiSquareSf(doc.case_1!.X_squared, 5), doc.case_1!.p_value)).toBeGreaterThanOrEqual(13);
    expect(lre(chiSquareSf(doc.case_3_ddof1!.X_squared, 4), doc.case_3_ddof1!.p_value)).toBeGreaterThanOrEqual(13);
    const agresti = example<{scipy: {X_squared: number; df: number; p_value: number}}>(
      'chisq_independence--r-chisq-agresti2007-p39.json',
    ).scipy;
    expect(lre(chiSquareSf(agresti.X_squared, agresti.df), agresti.p_value)).toBeGreaterThanOrEqual(13);
    const yates = example<{scipy: {X_squared_yates: number; p_value: number}; published: {p_value: number}}>(
      'chisq_independence_2x2_yates--r-chisq-example.json',
    );
    expect(lre(chiSquareSf(yates.scipy.X_squared_yates, 1), yates.scipy.p_value)).toBeGreaterThanOrEqual(13);
    // R prints 7 significant digits
    expect(lre(chiSquareSf(yates.scipy.X_squared_yates, 1), yates.published.p_value)).toBeGreaterThanOrEqual(6.5);
  });
});

describe('quantiles', () => {
  // mpmath 1.3.0 at 50 digits: roots of log P or log Q in log x, computed for
  // this test. [df, p, upper tail?, x]
  const table: [number, number, boolean, number][] = [
    [1, 0.05, true, 3.841458820694125865283],
    [3, 0.05, true, 7.814727903251179831409],
    [5, 0.025, false, 0.8312116134866624386668],
    [5, 0.025, true, 12.83250199403002808284],
    [2, 1e-300, true, 1381.551055796427410361],
    [3, 1e-300, true, 1388.336773854685773202],
    [30, 1e-300, false, 1.2846849499559522216e-19],
    [0.5, 1e-10, false, 1.349939578622346220963e-40],
    [1, 1e-20, false, 1.570796326794896446925e-40],
    [1e6, 0.01, true, 1003292.893686412616041],
    [1e7, 0.5, false, 9999999.333333341234568],
  ];

  it.each(table)('df = %d, p = %d (upper: %s)', (df, p, upper, x) => {
    const q = upper ? chiSquareUpperQuantile(p, df) : chiSquareQuantile(p, df);
    // measured 13.3 to 15.9
    expect(lre(q, x)).toBeGreaterThanOrEqual(13);
  });

  it('uses the upper tail above ½ and handles the ends', () => {
    expect(chiSquareQuantile(0.95, 3)).toBe(chiSquareUpperQuantile(1 - 0.95, 3));
    expect(chiSquareQuantile(0, 3)).toBe(0);
    expect(chiSquareQuantile(1, 3)).toBe(Infinity);
    expect(chiSquareUpperQuantile(0, 3)).toBe(Infinity);
    expect(chiSquareUpperQuantile(1, 3)).toBe(0);
    // The true quantile, π/2·1e-600, is below the smallest double.
    expect(chiSquareQuantile(1e-300, 1)).toBe(0);
  });
});

describe('invalid input and edges', () => {
  it('returns NaN for invalid df, x or p', () => {
    for (const df of [0, -1, NaN, Infinity]) {
      expect(chiSquareCdf(1, df)).toBeNaN();
      expect(chiSquareSf(1, df)).toBeNaN();
      expect(chiSquareQuantile(0.5, df)).toBeNaN();
    }
    expect(chiSquareCdf(NaN, 3)).toBeNaN();
    expect(chiSquareQuantile(-0.1, 3)).toBeNaN();
    expect(chiSquareUpperQuantile(1.5, 3)).toBeNaN();
  });

  it('is 0 and 1 at the ends of the support', () => {
    expect(chiSquareCdf(0, 3)).toBe(0);
    expect(chiSquareSf(-2, 3)).toBe(1);
    expect(chiSquareCdf(Infinity, 3)).toBe(1);
    expect(chiSquareSf(Infinity, 3)).toBe(0);
  });
});

describe('properties (fast-check)', () => {
  const df = fc.oneof(fc.double({min: 0.05, max: 50, noNaN: true}), fc.double({min: 50, max: 1e6, noNaN: true}));
  const ratio = fc.double({min: 1e-4, max: 20, noNaN: true});

  it('cdf + sf = 1', () => {
    // Both sides share the prefactor, which carries up to ~10 ulps for df near 4 (Stirling's error recurrence).
    fc.assert(fc.property(df, ratio, (k, r) => Math.abs(chiSquareCdf(r * k, k) + chiSquareSf(r * k, k) - 1) <= 4e-15));
  });

  it('cdf is non-decreasing and sf non-increasing in x', () => {
    fc.assert(
      fc.property(df, ratio, ratio, (k, r1, r2) => {
        const [a, b] = r1 <= r2 ? [r1 * k, r2 * k] : [r2 * k, r1 * k];
        // Up to rounding: x values an ulp apart may differ by less than an ulp of the result.
        const slack = 1 + 1e-15;
        return chiSquareCdf(a, k) <= chiSquareCdf(b, k) * slack && chiSquareSf(a, k) * slack >= chiSquareSf(b, k);
      }),
    );
  });

  it('quantile(cdf(x)) = x and upperQuantile(sf(x)) = x', () => {
    fc.assert(
      fc.property(df, ratio, (k, r) => {
        const x = r * k;
        const p = chiSquareCdf(x, k);
        const q = chiSquareSf(x, k);
        // The relative error of x is that of p divided by the elasticity x f/p.
        const back = p <= 0.5 ? chiSquareQuantile(p, k) : chiSquareUpperQuantile(q, k);
        // Subnormal tails (below 2.2e-308) carry too few digits to invert.
        return Math.min(p, q) < 1e-300 || lre(back, x) >= 11;
      }),
    );
  });
});
