import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {fCdf, fSf} from '../../src/distributions/fisher-f.js';
import {noncentralFCdf, noncentralFNcpForCdf, noncentralFSf} from '../../src/distributions/noncentral-f.js';
import {lre} from '../helpers/lre.js';

/**
 * [f, df1, df2, ncp, P(F' ≤ f), P(F' > f)]: mpmath 1.3.0 at 40 digits, the
 * Poisson mixture Σ_j e^{-λ/2}(λ/2)^j/j! · betainc(ν₁/2+j, ν₂/2, 0, x) for the
 * cdf and betainc(ν₂/2, ν₁/2+j, 0, y) for the survival function (mpmath has
 * no ncf), j over the Poisson mass ± 20 sd; three cases re-run at 60 digits
 * agreed to 20. A value of exactly 1.0 is the other tail rounded.
 * scipy 1.17.1 `stats.ncf` (Boost) agrees with these to at least 13.4
 * digits, except that its `sf` at ncp = 0 returns -0.9498 (the negated cdf)
 * and its cdf is NaN at ncp ≈ 2400 for (21, 8, 180).
 */
const TAILS: readonly (readonly [number, number, number, number, number, number])[] = [
  [3.35, 2, 27, 10, 2.32161920348433179e-1, 0.767838079651566821],
  [1.18, 4, 20, 5, 2.2731412096289114602e-1, 0.77268587903710885398],
  [21, 8, 180, 100, 9.8515904203977067879e-1, 0.014840957960229321206],
  [0.5, 3, 10, 2, 1.5514329671239541502e-1, 0.84485670328760458498],
  [4.0, 1, 18, 0.5, 8.7984356364014869181e-1, 0.12015643635985130819],
  [2.5, 2, 17.128, 7.3, 2.5406293397379295267e-1, 0.74593706602620704733],
  [3.1, 1.5, 5.83, 20, 1.8631420238370274633e-2, 0.98136857976162972537],
  [50, 5, 100, 200, 8.4019061058639390782e-1, 0.15980938941360609218],
  [1.0, 5, 100, 200, 9.2743459997033449496e-34, 1.0],
  [1010, 10, 1000, 10000.0, 5.6809462948089441635e-1, 0.43190537051910558365],
  [700, 10, 1000, 10000.0, 1.5664765949663009316e-14, 0.99999999999998433523],
  [1400, 10, 1000, 10000.0, 9.9999999997750076155e-1, 2.2499238454631185174e-11],
  [200, 3, 50, 5, 1.0, 3.5409260181487875637e-23],
  [0.001, 5, 30, 50, 1.4998578125771947371e-18, 0.9999999999999999985],
  [1e-06, 2, 10, 3, 2.2313022708742319649e-7, 0.99999977686977291258],
  [5000, 2, 10, 3, 9.999999999999737145e-1, 2.6285497166052247815e-14],
  [3.35, 2, 27, 0, 9.4983426792047268661e-1, 0.050165732079527313394],
  [0.2, 200, 10000.0, 50, 1.2244335830645183898e-45, 1.0],
  [1.3, 200, 10000.0, 50, 6.6620040070082990039e-1, 0.33379959929917009961],
  [2.0, 200, 10000.0, 50, 9.9999989045068660033e-1, 1.0954931339966764962e-7],
  [9.0, 1, 10000.0, 1, 9.7718971759413563026e-1, 0.022810282405864369742],
  [30, 1, 10000.0, 1, 9.9999615671972438253e-1, 3.8432802756174695199e-6],
  [0.05, 1, 2, 0.1, 1.4873835532397268837e-1, 0.85126164467602731163],
  [100, 1, 1, 10, 7.5298708414984074547e-1, 0.24701291585015925453],
  [100000.0, 1, 3, 40, 9.9998812001232958569e-1, 0.000011879987670414307492],
  [150, 1, 30, 1500, 1.4769551240248913512e-37, 1.0],
  [150, 1, 30, 3000, 1.0078608243857673693e-87, 1.0],
  [3000, 1, 30, 1500, 9.8893948242356561838e-1, 0.01106051757643438162],
  [1, 4, 12, 1e-08, 5.5505370976951599218e-1, 0.44494629023048400782],
  [10000.0, 3, 100, 5, 1.0, 3.6718124323647062821e-116],
  [1000000.0, 2, 20, 10, 1.0, 2.2050453299722283562e-46],
  [1e-12, 5, 30, 50, 4.6550723858857820468e-41, 1.0],
  [1e-30, 3, 10, 4, 2.0066190588416085437e-46, 1.0],
  [1e-40, 1.5, 8, 2.5, 2.4554642277662729764e-31, 1.0],
  [50000.0, 4, 40, 30, 1.0, 3.1552110496574866373e-63],
  [0.01, 10, 50, 400, 3.0769180350308127496e-95, 1.0],
  [400, 10, 50, 30, 1.0, 1.3274657494605466563e-34],
  [10000000000.0, 2, 40, 5, 1.0, 5.6396168880536673272e-170],
  [1e-60, 7, 20, 3, 2.2936276013218577565e-210, 1.0],
];

/** [f, df1, df2, p, ncp with P(F' ≤ f; ncp) = p]: mpmath 1.3.0 secant root of the series above at 40 digits. */
const ROOTS: readonly (readonly [number, number, number, number, number])[] = [
  [4.846087862380136, 2, 27, 0.975, 0.3000911501789342789],
  [4.846087862380136, 2, 27, 0.025, 25.959340258891299359],
  [7.121019471642447, 4, 34, 0.975, 6.4472591018017022649],
  [7.121019471642447, 4, 34, 0.025, 54.98661704317878969],
  [21.0, 8, 180, 0.975, 105.32607302618239004],
  [21.0, 8, 180, 0.025, 227.35692654860571229],
  [1.5, 3, 12, 0.2, 6.5227196250027569906],
  [6.338028169014073, 1, 18, 0.95, 0.47130035148866496492],
  [6.338028169014073, 1, 18, 0.05, 18.213568947246226547],
  [300.0, 5, 60, 0.5, 1479.6750421692073031],
  [3.0, 2, 5.8298948937673405, 0.1, 14.167068665268933211],
];

describe('noncentral F distribution', () => {
  it('matches the 40-digit series for both tails, far tails down to 1e-210 included', () => {
    for (const [f, df1, df2, ncp, cdf, sf] of TAILS) {
      const label = `F'(${f}; ${df1}, ${df2}, ${ncp})`;
      // Measured: at least 13.4 digits; 13 keeps a small margin.
      expect(lre(noncentralFCdf(f, df1, df2, ncp), cdf), label).toBeGreaterThanOrEqual(13);
      expect(lre(noncentralFSf(f, df1, df2, ncp), sf), label).toBeGreaterThanOrEqual(13);
    }
  });

  it('finds the noncentrality at which the cdf takes a given value', () => {
    for (const [f, df1, df2, p, ncp] of ROOTS) {
      // Measured: at least 15.5 digits.
      expect(lre(noncentralFNcpForCdf(f, df1, df2, p), ncp), `${f}, ${df1}, ${df2}, p = ${p}`).toBeGreaterThanOrEqual(13);
    }
  });

  it('is the central F at ncp = 0', () => {
    for (const [f, df1, df2] of [[3.35, 2, 27], [0.01, 7, 3.5], [80, 1, 200]] as const) {
      expect(lre(noncentralFCdf(f, df1, df2, 0), fCdf(f, df1, df2))).toBeGreaterThanOrEqual(15);
      expect(lre(noncentralFSf(f, df1, df2, 0), fSf(f, df1, df2))).toBeGreaterThanOrEqual(15);
    }
  });

  it('clamps the noncentrality to 0 when even the central cdf is below p', () => {
    // P(F(4, 20) ≤ 1.18) = 0.65 < 0.975: no ncp ≥ 0 reaches 0.975.
    expect(noncentralFNcpForCdf(1.18, 4, 20, 0.975)).toBe(0);
    expect(noncentralFNcpForCdf(1.18, 4, 20, 0)).toBe(Infinity);
    expect(noncentralFNcpForCdf(1.18, 4, 20, 1)).toBe(0);
  });

  it('handles the edges of its domain and rejects invalid input with NaN', () => {
    expect(noncentralFCdf(0, 2, 10, 3)).toBe(0);
    expect(noncentralFSf(-1, 2, 10, 3)).toBe(1);
    expect(noncentralFCdf(Infinity, 2, 10, 3)).toBe(1);
    expect(noncentralFSf(Infinity, 2, 10, 3)).toBe(0);
    expect(noncentralFSf(5, 2, 10, Infinity)).toBe(1);
    for (const value of [
      noncentralFCdf(NaN, 2, 10, 3),
      noncentralFCdf(1, 0, 10, 3),
      noncentralFSf(1, 2, -1, 3),
      noncentralFSf(1, 2, Infinity, 3),
      noncentralFCdf(1, 2, 10, -0.5),
      noncentralFNcpForCdf(1, 2, 10, 1.5),
      noncentralFNcpForCdf(0, 2, 10, 0.5),
    ]) {
      expect(value).toBeNaN();
    }
  });

  it('has tails in [0, 1] that add to 1 and a cdf that falls as ncp grows', () => {
    const arb = fc.tuple(
      fc.double({min: 1e-3, max: 1e3, noNaN: true}),
      fc.double({min: 0.5, max: 50, noNaN: true}),
      fc.double({min: 0.5, max: 500, noNaN: true}),
      fc.double({min: 0, max: 300, noNaN: true}),
    );
    fc.assert(
      fc.property(arb, ([f, df1, df2, ncp]) => {
        const cdf = noncentralFCdf(f, df1, df2, ncp);
        const sf = noncentralFSf(f, df1, df2, ncp);
        expect(cdf).toBeGreaterThanOrEqual(0);
        expect(sf).toBeLessThanOrEqual(1);
        expect(Math.abs(cdf + sf - 1)).toBeLessThan(1e-13);
        expect(noncentralFCdf(f, df1, df2, ncp + 1)).toBeLessThanOrEqual(cdf * (1 + 1e-13));
      }),
      {numRuns: 200},
    );
  });

  it('inverts its own cdf', () => {
    const arb = fc.tuple(
      fc.double({min: 0.05, max: 50, noNaN: true}),
      fc.integer({min: 1, max: 20}),
      fc.double({min: 2, max: 300, noNaN: true}),
      fc.double({min: 0.001, max: 0.999, noNaN: true}),
    );
    fc.assert(
      fc.property(arb, ([f, df1, df2, p]) => {
        const ncp = noncentralFNcpForCdf(f, df1, df2, p);
        if (ncp === 0) expect(noncentralFCdf(f, df1, df2, 0)).toBeLessThanOrEqual(p);
        else expect(lre(noncentralFCdf(f, df1, df2, ncp), p)).toBeGreaterThanOrEqual(11);
      }),
      {numRuns: 100},
    );
  });
});
