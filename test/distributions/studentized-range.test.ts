import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {
  studentizedRangeCdf,
  studentizedRangeQuantile,
  studentizedRangeSf,
} from '../../src/distributions/studentized-range.js';
import {studentTQuantile, studentTTwoSidedP} from '../../src/distributions/student-t.js';
import {lre} from '../helpers/lre.js';

/**
 * mpmath 1.3.0 references were computed on this machine for these tests by
 * the double integral P(Q > q) = ∫ f_ν(s) P(W > qs) ds, with
 * P(W > w) = k ∫ φ(x)[Φ(x)^{k-1} - (Φ(x) - Φ(x-w))^{k-1}] dx evaluated by
 * mp.quad (Gauss-Legendre with its own error estimate) on subintervals
 * around the peaks, at the working precision given (20-200 digits, enough
 * for the subtraction in the tail); the cdf the same way with
 * P(W ≤ w) = k ∫ φ(x)(Φ(x) - Φ(x-w))^{k-1} dx. Printed to 20 digits.
 */
type Case = readonly [kind: 'sf' | 'cdf', q: number, k: number, df: number, reference: number];

const MPMATH: readonly Case[] = [
  ['sf', 3.877, 3, 10, 0.049987088753254393687], // mpmath 1.3.0 at 20 digits
  ['sf', 4.046, 4, 16, 0.05000630798422588801], // mpmath 1.3.0 at 20 digits
  ['sf', 3.5, 5, 20, 0.13650235157040400905], // mpmath 1.3.0 at 20 digits
  ['cdf', 2, 3, 5, 0.59763756900421953783], // mpmath 1.3.0 at 20 digits
  ['cdf', 1, 4, 30, 0.10651686873078875391], // mpmath 1.3.0 at 20 digits
  ['sf', 6, 10, 2, 0.23716729059124222603], // mpmath 1.3.0 at 20 digits
  ['sf', 50, 3, 10, 2.1394309356799726752e-11], // mpmath 1.3.0 at 40 digits
  ['sf', 40, 3, Infinity, 1.6187596834823702787e-175], // mpmath 1.3.0 at 200 digits
  ['sf', 20, 5, Infinity, 2.0884875837625432497e-44], // mpmath 1.3.0 at 70 digits
  ['cdf', 0.01, 3, Infinity, 0.000027566061907374517925], // mpmath 1.3.0 at 30 digits
  ['cdf', 0.5, 3, 10, 0.066135827849592005112], // mpmath 1.3.0 at 20 digits
  ['sf', 3.314, 3, Infinity, 0.050044140406110222291], // mpmath 1.3.0 at 20 digits
  ['sf', 4.474, 10, Infinity, 0.050013241593053213652], // mpmath 1.3.0 at 20 digits
  ['sf', 3.2, 4, 12.7, 0.15895257881436436445], // mpmath 1.3.0 at 20 digits (non-integer df)
  ['sf', 5, 20, 60, 0.07853608560868466317], // mpmath 1.3.0 at 20 digits
  ['sf', 4.5, 6, 12.7, 0.064217212557356839588], // mpmath 1.3.0 at 25 digits
  ['sf', 4, 3, 100, 0.015470722723226106003], // mpmath 1.3.0 at 25 digits
  ['cdf', 0.05, 5, 10, 4.2445524223704015417e-7], // mpmath 1.3.0 at 30 digits
  // mpmath 1.3.0 at 25 digits, outer subintervals ≤ 3σ wide up to 12σ (wider ones
  // missed the narrow peak at this df: 0.0638769576110… was off in the 9th digit)
  ['sf', 3.5, 4, 1e6, 0.063876957670652805241],
];

/** Small df, where jstat's upper tail is wrong (shared/research/library-pitfalls.md). */
const SMALL_DF: readonly Case[] = [
  ['sf', 100.5, 10, 2, 0.00099996719860278027245], // mpmath 1.3.0 at 20 digits
  ['sf', 10.88, 3, 3, 0.0093273046888603999785], // mpmath 1.3.0 at 20 digits
  ['sf', 12, 10, 4, 0.010844278383983161415], // mpmath 1.3.0 at 20 digits
  ['sf', 7.5, 8, 5, 0.029660879105094367055], // mpmath 1.3.0 at 25 digits
  ['sf', 30, 5, 1, 0.061771810961221559103], // mpmath 1.3.0 at 20 digits
  ['sf', 10, 3, 1, 0.13382638577257702971], // mpmath 1.3.0 at 20 digits
  ['sf', 3, 3, 1, 0.41033295547761836124], // mpmath 1.3.0 at 20 digits
  ['cdf', 0.3, 4, 1, 0.0051234390588545015295], // mpmath 1.3.0 at 20 digits
  ['sf', 2, 2, 1.5, 0.32941568781058987453], // mpmath 1.3.0 at 20 digits
  ['sf', 2.5, 2, 7, 0.12042857334609431848], // mpmath 1.3.0 at 20 digits
];

function value([kind, q, k, df]: Case): number {
  return kind === 'sf' ? studentizedRangeSf(q, k, df) : studentizedRangeCdf(q, k, df);
}

describe('studentizedRangeSf / studentizedRangeCdf', () => {
  it('agrees with mpmath double integration to 14 digits, tails included', () => {
    // Measured: at least 14.5 digits at every point (15+ at most).
    for (const c of MPMATH) expect(lre(value(c), c[4]), c.join(' ')).toBeGreaterThanOrEqual(14);
  });

  it('agrees with mpmath at small df (1 to 5), 14 digits', () => {
    // Measured: at least 14.9 digits.
    for (const c of SMALL_DF) expect(lre(value(c), c[4]), c.join(' ')).toBeGreaterThanOrEqual(14);
  });

  it('keeps digits in the far lower tail: P(Q ≤ q) ∝ q^(k-1) as q → 0', () => {
    // The leading term of the lower tail is a power of q, so the ratio of two
    // tiny cdfs is a power of 10 (the correction is O(q²) relative).
    expect(lre(studentizedRangeCdf(1e-10, 3, 10) / studentizedRangeCdf(1e-50, 3, 10), 1e80)).toBeGreaterThanOrEqual(13);
    const ratio = studentizedRangeCdf(1e-20, 5, Infinity) / studentizedRangeCdf(1e-60, 5, Infinity);
    expect(lre(ratio, 1e160)).toBeGreaterThanOrEqual(13);
  });

  it('keeps digits in the far upper tail (q^-ν), down to 1e-299', () => {
    // mpmath 1.3.0 at 25 digits: as q → ∞, P(Q > q) = α^α E[W^ν] q^-ν / Γ(α+1), α = ν/2
    // (the chi density's leading term; the next term is O(q^-2) relative,
    // below 1e-18 here), with E[W^ν] = ν ∫ w^(ν-1) P(W > w) dw by quadrature.
    expect(lre(studentizedRangeSf(1e100, 3, 3), 1.286499722035565578e-299)).toBeGreaterThanOrEqual(13);
    expect(lre(studentizedRangeSf(1e10, 3, 20), 5.4588862268405323022e-185)).toBeGreaterThanOrEqual(13);
  });

  it('reduces to Student’s t for k = 2: P(Q > q) = P(|T| > q/√2)', () => {
    // The range of two normals is |Z1 - Z2| = √2|Z|. The t tail is accurate to
    // 15 digits (student-t.test.ts); the far-tail floor is conditioning: the
    // rounding of q/√2 alone moves the tail by (q²/2)·1e-16 relative.
    for (const df of [0.5, 1, 1.5, 2, 3, 7, 10, 30, 100, 1e4, 1e8]) {
      for (const q of [0.01, 0.5, 2, 5, 20, 1e3]) {
        const reference = studentTTwoSidedP(q / Math.SQRT2, df);
        if (reference < 1e-300) continue;
        expect(lre(studentizedRangeSf(q, 2, df), reference), `${q} ${df}`).toBeGreaterThanOrEqual(13);
      }
    }
  });

  it('agrees with scipy 1.17.1 stats.studentized_range within scipy’s stated tolerance', () => {
    // scipy integrates the cdf with nquad(epsabs=1e-11, epsrel=1e-12) and takes
    // sf = 1 - cdf, so its values carry ~1e-11 absolute error: 9 digits at p ≥ 0.01.
    const scipy: readonly Case[] = [
      ['sf', 2.5, 5, 3.3, 0.5046616393325671], // scipy 1.17.1: stats.studentized_range.sf(2.5, 5, 3.3)
      ['sf', 100.5, 10, 2, 0.0009999671986024028], // scipy 1.17.1: stats.studentized_range.sf(100.5, 10, 2)
      ['sf', 10.88, 3, 3, 0.009327304688860005], // scipy 1.17.1: stats.studentized_range.sf(10.88, 3, 3)
      ['sf', 3, 3, 1, 0.41033295547761817], // scipy 1.17.1: stats.studentized_range.sf(3, 3, 1)
      ['sf', 4.5, 6, 12.7, 0.06421721255735824], // scipy 1.17.1: stats.studentized_range.sf(4.5, 6, 12.7)
      ['sf', 5.2, 20, 60, 0.054111542502386256], // scipy 1.17.1: stats.studentized_range.sf(5.2, 20, 60)
      ['sf', 7.5, 8, 5, 0.029660879105093962], // scipy 1.17.1: stats.studentized_range.sf(7.5, 8, 5)
      ['cdf', 2.5, 5, 3.3, 0.49533836066743286], // scipy 1.17.1: stats.studentized_range.cdf(2.5, 5, 3.3)
      ['cdf', 6, 10, 2, 0.762832709408758], // scipy 1.17.1: stats.studentized_range.cdf(6, 10, 2)
    ];
    for (const c of scipy) expect(lre(value(c), c[4]), c.join(' ')).toBeGreaterThanOrEqual(9);
  });

  it('handles the edges', () => {
    expect(studentizedRangeSf(0, 3, 10)).toBe(1);
    expect(studentizedRangeCdf(0, 3, 10)).toBe(0);
    expect(studentizedRangeSf(-1, 3, 10)).toBe(1);
    expect(studentizedRangeSf(Infinity, 3, 10)).toBe(0);
    expect(studentizedRangeCdf(Infinity, 3, Infinity)).toBe(1);
    // Beyond the Bonferroni bound k(k-1)Φc(q/√2) the tail underflows.
    expect(studentizedRangeSf(80, 3, Infinity)).toBe(0);
    for (const [k, df] of [[1, 10], [2.5, 10], [3, 0], [3, -1], [3, NaN], [NaN, 10]] as const) {
      expect(studentizedRangeSf(3, k, df)).toBeNaN();
      expect(studentizedRangeCdf(3, k, df)).toBeNaN();
      expect(studentizedRangeQuantile(0.5, k, df)).toBeNaN();
    }
    expect(studentizedRangeSf(NaN, 3, 10)).toBeNaN();
  });

  it('has cdf + sf = 1, both in [0, 1], the sf decreasing in q (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({min: 0.05, max: 30, noNaN: true}),
        fc.integer({min: 2, max: 12}),
        fc.double({min: 1, max: 200, noNaN: true}),
        (q, k, df) => {
          const sf = studentizedRangeSf(q, k, df);
          const cdf = studentizedRangeCdf(q, k, df);
          expect(sf).toBeGreaterThanOrEqual(0);
          expect(cdf).toBeLessThanOrEqual(1);
          expect(Math.abs(sf + cdf - 1)).toBeLessThan(1e-14);
          // Strictly, except where the tail is 1 to the last bit (small q, large k).
          const next = studentizedRangeSf(q * 1.01, k, df);
          if (sf < 1) expect(next).toBeLessThan(sf);
          else expect(next).toBeLessThanOrEqual(sf);
        },
      ),
      {numRuns: 15},
    );
  });
});

describe('studentizedRangeQuantile', () => {
  it('matches published tables of q(0.95; k, ν) to their 3 decimals', () => {
    // Harter 1960 / Pearson & Hartley tables of the studentized range, upper 5% points (from memory)
    const table: readonly [number, number, number][] = [
      [3, 10, 3.877],
      [4, 16, 4.046],
      [3, Infinity, 3.314],
      [10, Infinity, 4.474],
      [2, 1, 17.97],
    ];
    for (const [k, df, q] of table) {
      const decimals = q > 10 ? 2 : 3;
      expect(studentizedRangeQuantile(0.95, k, df).toFixed(decimals), `${k} ${df}`).toBe(q.toFixed(decimals));
    }
  });

  it('agrees with mpmath to 14 digits', () => {
    // mpmath 1.3.0 at 22 digits: the double integral's P(Q > q) at stet's root,
    // then one Newton step (density by finite difference; the step is below
    // 1e-14 relative, so the density's own error does not matter). For p = 0.95
    // the target is 1 - fl(0.95).
    const mpmath: readonly [number, number, number, number][] = [
      [0.95, 3, 10, 3.87677675001318097],
      [0.95, 4, 16, 4.04609306062618394],
      [0.999, 10, 2, 100.498350669890899],
      [0.9, 6, 1.5, 10.8902213948836078],
      [0.95, 3, Infinity, 3.31449315539812051],
      [0.95, 10, Infinity, 4.47412422172590465],
    ];
    // Measured: at least 14.6 digits.
    for (const [p, k, df, q] of mpmath) {
      expect(lre(studentizedRangeQuantile(p, k, df), q), `${p} ${k} ${df}`).toBeGreaterThanOrEqual(14);
    }
  });

  it('is right where jstat’s port is not: q(0.999; 10, 2)', () => {
    // jstat gives 58.85 (shared/research/library-pitfalls.md, which also gives 100.50);
    // scipy 1.17.1: stats.studentized_range.ppf(0.999, 10, 2) = 100.4983506698718
    expect(lre(studentizedRangeQuantile(0.999, 10, 2), 100.4983506698718)).toBeGreaterThanOrEqual(11);
  });

  it('agrees with scipy 1.17.1 ppf', () => {
    // scipy inverts its cdf (absolute error ~1e-11), so its quantiles carry
    // ~1e-11/(q·f(q)) relative error: at least 11 digits at these points.
    const scipy: readonly [number, number, number, number][] = [
      [0.95, 3, 10, 3.876776750013158], // scipy 1.17.1: stats.studentized_range.ppf(0.95, 3, 10)
      [0.95, 4, 16, 4.046093060626182], // scipy 1.17.1: stats.studentized_range.ppf(0.95, 4, 16)
      [0.99, 5, 7.5, 6.798857981089661], // scipy 1.17.1: stats.studentized_range.ppf(0.99, 5, 7.5)
      [0.95, 20, 60, 5.241199792809696], // scipy 1.17.1: stats.studentized_range.ppf(0.95, 20, 60)
      [0.9, 6, 1.5, 10.89022139488361], // scipy 1.17.1: stats.studentized_range.ppf(0.9, 6, 1.5)
    ];
    for (const [p, k, df, q] of scipy) {
      expect(lre(studentizedRangeQuantile(p, k, df), q), `${p} ${k} ${df}`).toBeGreaterThanOrEqual(11);
    }
  });

  it('reduces to Student’s t for k = 2: q(p; 2, ν) = √2 t((1+p)/2; ν)', () => {
    for (const df of [1, 2.5, 10, 1e6, Infinity]) {
      for (const p of [0.05, 0.5, 0.95, 0.999999]) {
        // (1+p)/2 would round; 1-p and p/2 are exact.
        const t = p >= 0.5 ? -studentTQuantile((1 - p) / 2, df) : studentTQuantile(0.5 + p / 2, df);
        const reference = Math.SQRT2 * t;
        expect(lre(studentizedRangeQuantile(p, 2, df), reference), `${p} ${df}`).toBeGreaterThanOrEqual(13);
      }
    }
  });

  it('inverts the tail it solves: sf(q(p)) = 1 - p, cdf(q(p)) = p', () => {
    for (const [p, k, df] of [
      [0.95, 3, 10],
      [0.999, 10, 2],
      [0.5, 4, 20],
      [0.01, 3, 10],
      [1 - 1e-12, 5, 30],
    ] as const) {
      const q = studentizedRangeQuantile(p, k, df);
      const achieved = p >= 0.5 ? studentizedRangeSf(q, k, df) : studentizedRangeCdf(q, k, df);
      expect(lre(achieved, p >= 0.5 ? 1 - p : p), `${p} ${k} ${df}`).toBeGreaterThanOrEqual(12);
    }
  });

  it('handles the edges', () => {
    expect(studentizedRangeQuantile(0, 3, 10)).toBe(0);
    expect(studentizedRangeQuantile(1, 3, 10)).toBe(Infinity);
    expect(studentizedRangeQuantile(-0.1, 3, 10)).toBeNaN();
    expect(studentizedRangeQuantile(1.1, 3, 10)).toBeNaN();
  });
});
