import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {chiSquareCdf, chiSquareQuantile, chiSquareSf} from '../../src/distributions/chi-square.js';
import {fCdf, fQuantile, fSf, fUpperQuantile} from '../../src/distributions/fisher-f.js';
import {studentTTwoSidedP} from '../../src/distributions/student-t.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';

/** Digits required: 12 at ordinary arguments, 9 in far tails (issue 3). */
const digitsFor = (ref: number): number => (ref > 1e-30 ? 12 : 9);

describe('fCdf / fSf against mpmath', () => {
  // mpmath 1.3.0 at 50 digits: betainc(df1/2, df2/2, 0, w) and
  // betainc(df2/2, df1/2, 0, 1 - w), w = df1 x/(df1 x + df2) from the double x,
  // computed for this test. The last row, beyond mpmath's betainc, is the
  // equivalent binomial sum I_w(a, b) = P(Bin(a+b-1, w) ≥ a) at 50 digits,
  // which agrees with betainc at (4, 34) to all 22 digits. [df1, df2, x, cdf, sf]
  const table: [number, number, number, number, number][] = [
    [3, 7.5, 1e-8, 1.515039257109522411035e-12, 0.9999999999984849607429],
    [0.5, 0.5, 1e-8, 0.00539352600649026760548, 0.9946064739935097323945],
    [2.7, 14.3, 1.7, 0.7862137107491077776292, 0.2137862892508922223708],
    [10, 3, 1e10, 0.9999999999999985172979, 1.482702079322930562282e-15],
    [5, 1000, 100, 1, 1.471403496378965548845e-85],
    [30, 30, 1e10, 1, 7.755875978186598781822e-143],
    [200, 500, 30, 1, 1.43066179516861025645e-193],
    [1, 1e4, 1000, 1, 2.875852632270794597545e-209],
    [1000, 1000, 10, 1, 6.684184020185371884248e-243],
    [1000, 1000, 0.1, 6.684184020185523750836e-243, 1],
    [1e5, 1e6, 1.01, 0.9832307086928402735942, 0.01676929130715972640582],
  ];

  it.each(table)('df = (%d, %d), x = %d', (df1, df2, x, cdf, sf) => {
    expect(lre(fCdf(x, df1, df2), cdf)).toBeGreaterThanOrEqual(digitsFor(cdf));
    expect(lre(fSf(x, df1, df2), sf)).toBeGreaterThanOrEqual(digitsFor(sf));
  });

  it('reaches 12.9 digits everywhere in the table (measured: 12.9 to 15.9)', () => {
    const worst = Math.min(
      ...table.flatMap(([d1, d2, x, cdf, sf]) => [lre(fCdf(x, d1, d2), cdf), lre(fSf(x, d1, d2), sf)]),
    );
    expect(worst).toBeGreaterThanOrEqual(12.9);
  });
});

describe('p-values of published ANOVAs, from F and its df', () => {
  // The mpmath 1.3.0 values (50 digits, computed for this test) confirm the
  // scipy/statsmodels ones in shared/reference/examples/*.json to 13+ digits.
  it('classic one-way ANOVA (integer df)', () => {
    const plant = example<{scipy: {F: number; p_value: number}}>('anova_oneway--r-datasets-plantgrowth.json').scipy;
    expect(lre(fSf(plant.F, 2, 27), plant.p_value)).toBeGreaterThanOrEqual(13);
    expect(lre(fSf(plant.F, 2, 27), 0.01590995832562291293507)).toBeGreaterThanOrEqual(14); // mpmath
    const mussel = example<{scipy: {F: number; p_value: number}}>('anova_oneway--scipy-doc-mcdonald-mussel.json').scipy;
    expect(lre(fSf(mussel.F, 4, 34), mussel.p_value)).toBeGreaterThanOrEqual(13);
    expect(lre(fSf(mussel.F, 4, 34), 0.000281224231453454906509)).toBeGreaterThanOrEqual(14); // mpmath
    const nist = example<{scipy: {F: number; p_value: number}}>('anova_oneway--nist-ehandbook-7433.json').scipy;
    expect(lre(fSf(nist.F, 2, 12), nist.p_value)).toBeGreaterThanOrEqual(13);
    expect(lre(fSf(nist.F, 2, 12), 0.003248222600859301570013)).toBeGreaterThanOrEqual(14); // mpmath
  });

  it('Welch ANOVA (non-integer df2)', () => {
    type Welch = {scipy: {F: number; df1: number; df2: number; p_value: number}};
    const sleep = example<Welch>('anova_welch--r-oneway-sleep.json').scipy;
    expect(lre(fSf(sleep.F, sleep.df1, sleep.df2), sleep.p_value)).toBeGreaterThanOrEqual(13);
    expect(lre(fSf(sleep.F, sleep.df1, sleep.df2), 0.07939414018735819460665)).toBeGreaterThanOrEqual(14); // mpmath
    const plant = example<Welch>('anova_welch--r-plantgrowth.json').scipy;
    expect(lre(fSf(plant.F, plant.df1, plant.df2), plant.p_value)).toBeGreaterThanOrEqual(13);
    expect(lre(fSf(plant.F, plant.df1, plant.df2), 0.01739282149016992710827)).toBeGreaterThanOrEqual(14); // mpmath
    const toy = example<Welch & {published: {p_value: number}}>('anova_welch--scipy-tests-r-oneway-toy.json');
    // mpmath: 0.574838941286302071011; R prints 15 significant digits
    expect(lre(fSf(toy.scipy.F, toy.scipy.df1, toy.scipy.df2), 0.574838941286302071011)).toBeGreaterThanOrEqual(14);
    expect(lre(fSf(toy.scipy.F, toy.scipy.df1, toy.scipy.df2), toy.published.p_value)).toBeGreaterThanOrEqual(13);
  });

  it('F(1, ν) at t² is the two-sided t p-value', () => {
    // common practice, no source: T² ~ F(1, ν)
    const t = -1.8608134674868526; // Welch t of anova_welch--r-oneway-sleep.json (statsmodels)
    const df = 17.776473516178495;
    expect(lre(fSf(t * t, 1, df), studentTTwoSidedP(t, df))).toBeGreaterThanOrEqual(13);
  });
});

describe('infinite df', () => {
  it('df2 = Infinity is χ²(df1)/df1, df1 = Infinity is df2/χ²(df2)', () => {
    // common practice, no source
    expect(fSf(2.5, 3, Infinity)).toBe(chiSquareSf(7.5, 3));
    expect(fCdf(2.5, 3, Infinity)).toBe(chiSquareCdf(7.5, 3));
    expect(fSf(0.5, Infinity, 8)).toBe(chiSquareCdf(16, 8));
    expect(fQuantile(0.95, 3, Infinity)).toBe(chiSquareQuantile(0.95, 3) / 3);
    expect(fSf(0.5, Infinity, Infinity)).toBe(1);
    expect(fSf(2, Infinity, Infinity)).toBe(0);
  });

  it('stays accurate at df2 = 1e9, where it differs from the limit by 1e-8', () => {
    // mpmath 1.3.0 at 40 digits: quad of the F(3, 1e9) density from 2.5 to ∞, computed for this test
    expect(lre(fSf(2.5, 3, 1e9), 0.0575584525989343925707)).toBeGreaterThanOrEqual(14);
    expect(lre(fSf(2.5, 3, 1e9), fSf(2.5, 3, Infinity))).toBeLessThan(9);
  });
});

describe('quantiles', () => {
  // mpmath 1.3.0 at 50 digits: roots in log x of the betainc tail (the last
  // one of the binomial sum above), computed for this test. [df1, df2, p, upper?, x]
  const table: [number, number, number, boolean, number][] = [
    [2, 17.128418616644137, 0.05, true, 3.586511877171649941502],
    [4, 34, 0.05, true, 2.649894014462377492659],
    [1, 10, 0.01, true, 10.04428927339659288224],
    [7, 38.61, 0.025, false, 0.2317657490303637847563],
    [2.7, 14.3, 0.3, false, 0.4533367012411226979726],
    [30, 30, 1e-300, true, 335718590027985012132.4],
    [4, 100, 1e-300, false, 7.001400420140049105371e-151],
    [1e5, 1e6, 0.05, true, 1.007730690338556375103],
  ];

  it.each(table)('df = (%d, %d), p = %d (upper: %s)', (df1, df2, p, upper, x) => {
    const q = upper ? fUpperQuantile(p, df1, df2) : fQuantile(p, df1, df2);
    // measured 13.2 to 15.9
    expect(lre(q, x)).toBeGreaterThanOrEqual(13);
  });

  it('uses the upper tail above ½ and handles the ends', () => {
    expect(fQuantile(0.95, 4, 34)).toBe(fUpperQuantile(1 - 0.95, 4, 34));
    expect(fQuantile(0, 4, 34)).toBe(0);
    expect(fQuantile(1, 4, 34)).toBe(Infinity);
    expect(fUpperQuantile(0, 4, 34)).toBe(Infinity);
    // The true value, about 1e600, is beyond the largest double.
    expect(fUpperQuantile(1e-300, 1, 1)).toBe(Infinity);
  });
});

describe('invalid input and edges', () => {
  it('returns NaN for invalid df, x or p', () => {
    for (const df of [0, -2, NaN]) {
      expect(fCdf(1, df, 5)).toBeNaN();
      expect(fSf(1, 5, df)).toBeNaN();
      expect(fQuantile(0.5, df, 5)).toBeNaN();
      expect(fUpperQuantile(0.5, 5, df)).toBeNaN();
    }
    expect(fSf(NaN, 2, 3)).toBeNaN();
    expect(fQuantile(1.1, 2, 3)).toBeNaN();
  });

  it('is 0 and 1 at the ends of the support', () => {
    expect(fCdf(0, 2, 3)).toBe(0);
    expect(fSf(-1, 2, 3)).toBe(1);
    expect(fSf(Infinity, 2, 3)).toBe(0);
  });

  it('keeps the leading term where w or 1 - w underflows', () => {
    // A&S 26.5.4 leading terms, exact to O(x) here: P(F ≤ x) ≈ (d1 x/d2)^(d1/2)/((d1/2) B)
    // and P(F > x) ≈ (d2/(d1 x))^(d2/2)/((d2/2) B); B(1, 1) = 1 and B(½, ½) = π.
    expect(lre(fCdf(1e-300, 2, 2), 1e-300)).toBeGreaterThanOrEqual(14);
    expect(lre(fSf(1e300, 2, 2), 1e-300)).toBeGreaterThanOrEqual(14);
    expect(lre(fSf(1e300, 1, 1), (2 / Math.PI) * 1e-150)).toBeGreaterThanOrEqual(13);
  });
});

describe('properties (fast-check)', () => {
  const df = fc.oneof(fc.double({min: 0.2, max: 60, noNaN: true}), fc.double({min: 60, max: 1e5, noNaN: true}));
  const x = fc.double({min: 1e-3, max: 1e3, noNaN: true});

  it('cdf + sf = 1', () => {
    // The incomplete beta's continued fraction keeps ~14.5 digits at df near 0.2.
    fc.assert(fc.property(x, df, df, (v, a, b) => Math.abs(fCdf(v, a, b) + fSf(v, a, b) - 1) <= 4e-15));
  });

  it('cdf is non-decreasing and sf non-increasing in x', () => {
    fc.assert(
      fc.property(x, x, df, df, (u, v, a, b) => {
        const [lo, hi] = u <= v ? [u, v] : [v, u];
        // Up to rounding: x values an ulp apart may differ by less than an ulp of the result.
        const slack = 1 + 1e-15;
        return fCdf(lo, a, b) <= fCdf(hi, a, b) * slack && fSf(lo, a, b) * slack >= fSf(hi, a, b);
      }),
    );
  });

  it('quantile(cdf(x)) = x and upperQuantile(sf(x)) = x', () => {
    fc.assert(
      fc.property(x, df, df, (v, a, b) => {
        const p = fCdf(v, a, b);
        const q = fSf(v, a, b);
        const back = p <= 0.5 ? fQuantile(p, a, b) : fUpperQuantile(q, a, b);
        // Subnormal tails (below 2.2e-308) carry too few digits to invert.
        return Math.min(p, q) < 1e-300 || lre(back, v) >= 11;
      }),
    );
  });
});
