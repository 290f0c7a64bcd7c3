import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {chiSquareCdf, chiSquareSf} from '../../src/distributions/chi-square.js';
import {
  noncentralChiSquareCdf,
  noncentralChiSquareNcpForCdf,
  noncentralChiSquareNcpForSf,
  noncentralChiSquareSf,
} from '../../src/distributions/noncentral-chi-square.js';
import {lre} from '../helpers/lre.js';

/**
 * [x, df, ncp, P(X ≤ x), P(X > x)]: mpmath 1.3.0 at 40 digits, the Poisson
 * mixture Σ_j e^{-λ/2}(λ/2)^j/j! · gammainc(ν/2 + j, ·, regularized) summed
 * from the Poisson mode outwards until the remaining terms fall below 1e-25
 * of each tail. x runs from the mean - 6 sd to the mean + 60 sd, plus deep
 * lower tails at small x. A value of exactly 1.0 is the other tail rounded.
 * scipy 1.17.1 `stats.ncx2` (Boost) was not needed: the series is exact.
 */
const TAILS: readonly (readonly [number, number, number, number, number])[] = [
  [0.0015, 1, 0.5, 0.024063443887639133, 0.9759365561123609],
  [0.474342, 1, 0.5, 0.4112845143690459, 0.5887154856309541],
  [3.5, 1, 0.5, 0.8727620089986423, 0.12723799100135763],
  [17.5, 1, 0.5, 0.9997452041243139, 0.00025479587568612386],
  [121.5, 1, 0.5, 1.0, 2.9953894330092983e-25],
  [0.031, 1, 30, 4.966531168584404e-08, 0.9999999503346884],
  [19.9546, 1, 30, 0.1562073132698432, 0.8437926867301568],
  [42.0454, 1, 30, 0.8430366647463653, 0.15696333525363465],
  [119.363, 1, 30, 0.9999999745463427, 2.5453657343195152e-08],
  [693.722, 1, 30, 1.0, 6.008050921114804e-97],
  [4152.43, 1, 5000, 1.789921954538586e-10, 0.9999999998210078],
  [4859.57, 1, 5000, 0.15864025283211078, 0.8413597471678892],
  [5142.43, 1, 5000, 0.841359328789486, 0.1586406712105139],
  [6132.43, 1, 5000, 0.9999999999999851, 1.490350265976459e-14],
  [0.004, 3.5, 0.5, 9.148966238212733e-06, 0.9999908510337618],
  [1.0, 3.5, 0.5, 0.11018546913729928, 0.8898145308627007],
  [7.0, 3.5, 0.5, 0.8555789753133417, 0.14442102468665832],
  [28.0, 3.5, 0.5, 0.9999718566583272, 2.8143341672773097e-05],
  [184.0, 3.5, 0.5, 1.0, 1.5501939166301525e-36],
  [0.0335, 3.5, 30, 1.6059995336362106e-10, 0.9999999998394],
  [22.2306, 3.5, 30, 0.15631687636696046, 0.8436831236330395],
  [44.7694, 3.5, 30, 0.8429720161447394, 0.15702798385526057],
  [123.655, 3.5, 30, 0.9999999793967466, 2.060325346669985e-08],
  [709.666, 3.5, 30, 1.0, 7.681286347172087e-99],
  [4154.82, 3.5, 5000, 1.7902964903013613e-10, 0.9999999998209703],
  [4862.05, 3.5, 5000, 0.15863622312538359, 0.8413637768746164],
  [5144.95, 3.5, 5000, 0.8413632461835867, 0.15863675381641323],
  [6135.07, 3.5, 5000, 0.9999999999999851, 1.4896033747337062e-14],
  [0.0105, 10, 0.5, 2.577725806823561e-14, 0.9999999999999742],
  [5.80958, 10, 0.5, 0.14687195258442656, 0.8531280474155735],
  [15.1904, 10, 0.5, 0.8474120737129918, 0.15258792628700826],
  [48.0233, 10, 0.5, 0.9999984838707349, 1.5161292651744061e-06],
  [291.925, 10, 0.5, 1.0, 1.1808589597722818e-54],
  [0.04, 10, 30, 8.432232420232585e-18, 1.0],
  [28.1678, 10, 30, 0.15656894224382925, 0.8434310577561708],
  [51.8322, 10, 30, 0.8428244751710375, 0.15717552482896252],
  [134.657, 10, 30, 0.9999999876536331, 1.2346366948168426e-08],
  [749.93, 10, 30, 1.0, 1.4675241858167474e-103],
  [4161.05, 10, 5000, 1.7926918640022154e-10, 0.9999999998207308],
  [4868.51, 10, 5000, 0.1586465483117811, 0.8413534516882188],
  [5151.49, 10, 5000, 0.8413532089481155, 0.15864679105188453],
  [6141.94, 10, 5000, 0.9999999999999851, 1.487218756160848e-14],
  [310.574, 500, 0.5, 1.6085947856088022e-12, 0.9999999999983914],
  [468.846, 500, 0.5, 0.15848938903196147, 0.8415106109680386],
  [532.154, 500, 0.5, 0.8414963159233172, 0.15850368407668283],
  [753.735, 500, 0.5, 0.9999999999983885, 1.6114582531174675e-12],
  [2399.76, 500, 0.5, 1.0, 1.0118932596240133e-244],
  [329.202, 500, 30, 1.663946103634782e-12, 0.9999999999983361],
  [496.534, 500, 30, 0.15849215342602693, 0.841507846573973],
  [563.466, 500, 30, 0.8414937952638692, 0.1585062047361308],
  [797.731, 500, 30, 0.9999999999984371, 1.5628666847606358e-12],
  [2537.98, 500, 30, 1.0, 3.2946044272017255e-246],
  [4630.52, 500, 5000, 1.9324463403729628e-10, 0.9999999998067554],
  [5355.09, 500, 5000, 0.15864995566531745, 0.8413500443346825],
  [5644.91, 500, 5000, 0.8413498968216058, 0.1586501031783942],
  [6659.31, 500, 5000, 0.9999999999999867, 1.3367448170952797e-14],
  [0.001, 3, 100, 1.637951125662375e-27, 1.0],
  [0.5, 10, 1000, 7.792393348237756e-218, 1.0],
  [1e-10, 2, 5, 4.1042499313488495e-12, 0.9999999999958957],
  [0.0001, 1, 40, 1.645631805319478e-11, 0.9999999999835437],
  [20, 50, 600, 7.753883764546846e-109, 1.0],
  [1e-30, 7, 3, 1.695543903160981e-108, 1.0],
];

/** [x, df, tail, target, ncp with that tail equal to target]: mpmath 1.3.0, bisection of the series above at 40 digits. */
const ROOTS: readonly (readonly [number, number, 'cdf' | 'sf', number, number])[] = [
  [2.5, 2, 'cdf', 0.025, 11.01938813366975],
  [500, 10, 'sf', 1e-10, 248.40226656019342],
  [500, 10, 'cdf', 1e-10, 814.7761799148875],
  [7.3, 4, 'sf', 0.3, 1.9528460327110266],
  [7.3, 4, 'cdf', 0.8, 0.8809712805598632],
  [84.05606871861963, 3, 'sf', 0.005, 41.76773416269359],
];

describe('noncentral chi-square distribution', () => {
  it('matches the 40-digit series for both tails, far tails down to 1e-246 included', () => {
    for (const [x, df, ncp, cdf, sf] of TAILS) {
      const label = `χ²(${x}; ${df}, ${ncp})`;
      // Measured: at least 12.9 digits (13.3 above 1e-240, where the central incomplete gamma sets the floor).
      expect(lre(noncentralChiSquareCdf(x, df, ncp), cdf), label).toBeGreaterThanOrEqual(12.5);
      expect(lre(noncentralChiSquareSf(x, df, ncp), sf), label).toBeGreaterThanOrEqual(12.5);
    }
  });

  it('reduces to the central distribution at ncp = 0 and handles the edges', () => {
    expect(noncentralChiSquareSf(7.3, 4, 0)).toBe(chiSquareSf(7.3, 4));
    expect(noncentralChiSquareCdf(7.3, 4, 0)).toBe(chiSquareCdf(7.3, 4));
    expect(noncentralChiSquareCdf(0, 3, 5)).toBe(0);
    expect(noncentralChiSquareSf(0, 3, 5)).toBe(1);
    expect(noncentralChiSquareSf(Infinity, 3, 5)).toBe(0);
    expect(noncentralChiSquareCdf(4, 3, Infinity)).toBe(0);
    expect(Number.isNaN(noncentralChiSquareSf(4, 0, 5))).toBe(true);
    expect(Number.isNaN(noncentralChiSquareSf(4, 3, -1))).toBe(true);
    expect(Number.isNaN(noncentralChiSquareCdf(NaN, 3, 1))).toBe(true);
  });

  it('finds the ncp at which a tail takes a given value, to 12 digits', () => {
    for (const [x, df, tail, target, ncp] of ROOTS) {
      const found = tail === 'cdf' ? noncentralChiSquareNcpForCdf(x, df, target) : noncentralChiSquareNcpForSf(x, df, target);
      expect(lre(found, ncp), `${tail}(${x}; ${df}) = ${target}`).toBeGreaterThanOrEqual(12);
    }
  });

  it('gives the boundary 0 when no ncp reaches the target, and ∞ at tail 0', () => {
    // The central survival at 2.5 on 2 df is 0.2865 ≥ 0.025: no λ ≥ 0 lowers it to 0.025.
    expect(noncentralChiSquareNcpForSf(2.5, 2, 0.025)).toBe(0);
    expect(noncentralChiSquareNcpForCdf(0.01, 2, 0.025)).toBe(0);
    expect(noncentralChiSquareNcpForCdf(3, 2, 0)).toBe(Infinity);
    expect(noncentralChiSquareNcpForSf(3, 2, 1)).toBe(Infinity);
    expect(Number.isNaN(noncentralChiSquareNcpForSf(0, 2, 0.5))).toBe(true);
    expect(Number.isNaN(noncentralChiSquareNcpForSf(3, 2, 1.5))).toBe(true);
  });

  it('has tails summing to 1, monotone in ncp (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({min: 0.01, max: 300, noNaN: true}),
        fc.double({min: 0.5, max: 60, noNaN: true}),
        fc.double({min: 0, max: 200, noNaN: true}),
        (x, df, ncp) => {
          const cdf = noncentralChiSquareCdf(x, df, ncp);
          const sf = noncentralChiSquareSf(x, df, ncp);
          expect(Math.abs(cdf + sf - 1)).toBeLessThan(1e-14);
          expect(noncentralChiSquareSf(x, df, ncp + 1)).toBeGreaterThanOrEqual(sf * (1 - 1e-13));
        },
      ),
      {numRuns: 200},
    );
  });
});
