import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {normalCdf, normalPdf} from '../../src/distributions/normal.js';
import {studentTCdf, studentTQuantile, studentTSf, studentTTwoSidedP} from '../../src/distributions/student-t.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';

interface TScipy {
  t: number;
  df: number;
  p_value: number;
  conf_int: [number, number];
}

const mtcars = example<{scipy: TScipy & {means: [number, number]}}>(
  't_test_welch--r-ttest-mtcars-mpg-by-am.json',
).scipy;
const sleep = example<{scipy: TScipy & {mean: number}}>('t_test_one_sample--r-ttest-sleep-extra.json').scipy;
const paired = example<{scipy: TScipy}>('t_test_paired--r-ttest-sleep-student1908.json').scipy;
const welch = example<{scipy: {x_vs_y: TScipy}}>('t_test_welch--r-ttest-1to10-vs-7to20.json').scipy.x_vs_y;
const tost = example<{
  scipy: {
    pooled: {df: number; SE: number; mean_difference: number; ci: [number, number]} & Record<string, number>;
  };
}>('tost_equivalence--ncss-two-sample-yield.json').scipy.pooled;

describe('studentTCdf / studentTSf: p-values of published t tests', () => {
  it('reproduces scipy two-sided p-values (integer and Welch df)', () => {
    // scipy 1.10 recomputations in shared/reference/examples/*.json
    expect(lre(studentTTwoSidedP(mtcars.t, mtcars.df), mtcars.p_value)).toBeGreaterThanOrEqual(14);
    expect(lre(2 * studentTCdf(mtcars.t, mtcars.df), mtcars.p_value)).toBeGreaterThanOrEqual(14);
    expect(lre(2 * studentTSf(sleep.t, sleep.df), sleep.p_value)).toBeGreaterThanOrEqual(14);
    expect(lre(2 * studentTCdf(paired.t, paired.df), paired.p_value)).toBeGreaterThanOrEqual(14);
    expect(lre(studentTTwoSidedP(welch.t, welch.df), welch.p_value)).toBeGreaterThanOrEqual(14);
  });

  it('reproduces statsmodels one-sided TOST p-values', () => {
    // statsmodels 0.13 ttost_ind in tost_equivalence--ncss-two-sample-yield.json
    expect(lre(studentTSf(tost.t_lower as number, tost.df), tost.p_lower_bound_test as number)).toBeGreaterThanOrEqual(
      14,
    );
    expect(lre(studentTCdf(tost.t_upper as number, tost.df), tost.p_upper_bound_test as number)).toBeGreaterThanOrEqual(
      14,
    );
  });

  it('agrees with a 80-digit mpmath value for the mtcars p-value', () => {
    // mpmath 1.3.0: 2·½ I_{ν/(ν+t²)}(ν/2, ½) at 80 digits, computed for this test
    expect(lre(studentTTwoSidedP(mtcars.t, mtcars.df), 0.001373638333071035898)).toBeGreaterThanOrEqual(15);
  });

  it('keeps the far tail: t = -40, df = 10 and df = 1000', () => {
    // mpmath 1.3.0 incomplete beta at 80 digits, computed for this test
    expect(lre(studentTCdf(-40, 10), 1.1404288715428773225e-12)).toBeGreaterThanOrEqual(15);
    // The condition number t·f/F ≈ 600 here limits any double evaluation to ~13.2 digits.
    expect(lre(studentTCdf(-40, 1000), 5.2394260775866804698e-210)).toBeGreaterThanOrEqual(13);
    expect(studentTSf(40, 10)).toBe(studentTCdf(-40, 10));
  });

  it('matches the Cauchy closed form at df = 1', () => {
    // cdf = ½ + atan(t)/π, and atan(1/|t|)/π for the lower tail: common practice, no source
    for (const t of [-1e10, -40, -3, -0.5]) {
      expect(lre(studentTCdf(t, 1), Math.atan(1 / -t) / Math.PI)).toBeGreaterThanOrEqual(15);
    }
    expect(lre(studentTCdf(2, 1), 0.5 + Math.atan(2) / Math.PI)).toBeGreaterThanOrEqual(15);
    // mpmath 1.3.0 at 80 digits: near the centre Boost's upper I(½,½) would lose 2.5 digits
    expect(lre(studentTCdf(-0.001, 1), 0.49968169021991944105)).toBeGreaterThanOrEqual(15);
  });

  it('matches the closed form at df = 2', () => {
    // cdf(-a) = ½(1 - a/√(2+a²)) = 1/(√(2+a²)(√(2+a²)+a)): common practice, no source
    for (const a of [0.3, 2, 40, 1e6]) {
      const r = Math.sqrt(2 + a * a);
      expect(lre(studentTCdf(-a, 2), 1 / (r * (r + a)))).toBeGreaterThanOrEqual(14.5);
    }
  });

  it('approaches the normal for large df', () => {
    // First-order expansion F_ν(t) = Φ(t) - φ(t)(t³+t)/(4ν) + O(ν⁻²) (A&S 26.7.5 inverted)
    for (const t of [-4, -1.5, 0.7, 3]) {
      const expansion = normalCdf(t) - (normalPdf(t) * (t ** 3 + t)) / (4 * 1e6);
      expect(Math.abs(studentTCdf(t, 1e6) - expansion)).toBeLessThan(1e-11);
      expect(lre(studentTCdf(t, 1e20), normalCdf(t))).toBeGreaterThanOrEqual(14.5);
    }
    // mpmath 1.3.0 at 80 digits, computed for this test
    expect(lre(studentTSf(5, 1e6), 2.8669989354453707845e-7)).toBeGreaterThanOrEqual(14.5);
    expect(studentTCdf(1.3, Infinity)).toBe(normalCdf(1.3));
  });

  it('returns NaN for invalid input rather than false', () => {
    expect(studentTCdf(2, -1)).toBeNaN();
    expect(studentTCdf(2, 0)).toBeNaN();
    expect(studentTCdf(NaN, 3)).toBeNaN();
    expect(studentTSf(1, NaN)).toBeNaN();
    expect(studentTTwoSidedP(1, -2)).toBeNaN();
    expect(studentTCdf(-Infinity, 3)).toBe(0);
    expect(studentTSf(-Infinity, 3)).toBe(1);
  });
});

describe('studentTQuantile', () => {
  it('reproduces the t quantiles implied by published confidence intervals', () => {
    // scipy 1.10 / statsmodels 0.13 recomputations: CI half-width / SE = t_{0.975, df}.
    // Re-deriving SE from the rounded means and t costs digits: for mtcars the
    // exact quantile (mpmath, below) agrees with the derived value to 13.5 only.
    const halfWidth = (ci: [number, number]) => (ci[1] - ci[0]) / 2;
    const mtcarsSe = (mtcars.means[0] - mtcars.means[1]) / mtcars.t;
    expect(lre(studentTQuantile(0.975, mtcars.df), halfWidth(mtcars.conf_int) / mtcarsSe)).toBeGreaterThanOrEqual(13);
    expect(lre(studentTQuantile(0.975, sleep.df), halfWidth(sleep.conf_int) / (sleep.mean / sleep.t))).toBeGreaterThanOrEqual(
      13,
    );
    // Here SE is given, so the derivation keeps 15 digits.
    expect(lre(studentTQuantile(0.975, tost.df), halfWidth(tost.ci) / tost.SE)).toBeGreaterThanOrEqual(14.5);
  });

  it('matches mpmath in the tails and at the centre', () => {
    // mpmath 1.3.0: roots of the 80-digit cdf, computed for this test
    expect(lre(studentTQuantile(0.025, mtcars.df), -2.0981960308491606984)).toBeGreaterThanOrEqual(15);
    expect(lre(studentTQuantile(0.025, 27), -2.0518305164802855562)).toBeGreaterThanOrEqual(15);
    expect(lre(studentTQuantile(1e-20, mtcars.df), -46.16006904556747215)).toBeGreaterThanOrEqual(15);
    expect(lre(studentTQuantile(1e-300, 10), -2.564525718948197828e30)).toBeGreaterThanOrEqual(15);
    // Boost's ibeta_inv alone returns garbage here (a relative error of 1)
    expect(lre(studentTQuantile(0.4999999, 1000), -2.5072550100059751664e-7)).toBeGreaterThanOrEqual(14.5);
  });

  it('is exact in closed forms (df = 1, 2) and symmetric', () => {
    // Cauchy: Q(p) = tan(π(p - ½)) = -1/tan(πp): common practice, no source
    expect(lre(studentTQuantile(0.1, 1), -1 / Math.tan(Math.PI * 0.1))).toBeGreaterThanOrEqual(14.5);
    // df = 2: Q(p) = (2p - 1)/√(2p(1-p)): common practice, no source
    expect(lre(studentTQuantile(0.2, 2), -0.6 / Math.sqrt(0.32))).toBeGreaterThanOrEqual(15);
    // 1 - 0.75 = 0.25 exactly, so the reflection is exact
    expect(studentTQuantile(0.75, 7.5)).toBe(-studentTQuantile(0.25, 7.5));
  });

  it('falls back to the normal at df = Infinity and handles the ends', () => {
    // mpmath 1.3.0 root of ncdf(x) = 0.975 at 60 digits
    expect(lre(studentTQuantile(0.975, Infinity), 1.9599639845400542355)).toBeGreaterThanOrEqual(15);
    expect(studentTQuantile(0, 5)).toBe(-Infinity);
    expect(studentTQuantile(1, 5)).toBe(Infinity);
    expect(studentTQuantile(0.5, 5)).toBe(0);
    expect(studentTQuantile(1.2, 5)).toBeNaN();
    expect(studentTQuantile(0.3, -5)).toBeNaN();
    // Boost's inverse returns 0 at ν = 1e20; this stays within 1e-15 of the normal.
    expect(lre(studentTQuantile(0.025, 1e20), -1.9599639845400542355)).toBeGreaterThanOrEqual(15);
  });
});

describe('Student t properties (fast-check)', () => {
  const df = fc.oneof(fc.double({min: 0.5, max: 50, noNaN: true}), fc.double({min: 50, max: 1e7, noNaN: true}));
  const t = fc.double({min: -60, max: 60, noNaN: true});

  it('cdf is within [0, 1] and non-decreasing in t', () => {
    fc.assert(
      fc.property(t, t, df, (a, b, nu) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        const p = studentTCdf(lo, nu);
        return p >= 0 && p <= 1 && p <= studentTCdf(hi, nu);
      }),
    );
  });

  it('cdf + sf = 1 to 1e-15', () => {
    fc.assert(fc.property(t, df, (x, nu) => Math.abs(studentTCdf(x, nu) + studentTSf(x, nu) - 1) <= 1e-15));
  });

  it('quantile(cdf(t)) = t on the lower tail', () => {
    fc.assert(
      fc.property(fc.double({min: -60, max: 0, noNaN: true}), df, (x, nu) => {
        const p = studentTCdf(x, nu);
        if (p < 1e-300) return true;
        const back = studentTQuantile(p, nu);
        // Near the median p holds only absolute precision (see normal.test.ts).
        return lre(back, x) >= 13.5 || Math.abs(back - x) <= 1e-15;
      }),
    );
  });
});
