import {describe, expect, it} from 'vitest';
import {normalCdf} from '../../src/distributions/normal.js';
import {noncentralTSeries} from '../../src/distributions/noncentral-t-series.js';
import {studentTCdf, studentTSf} from '../../src/distributions/student-t.js';
import {lre} from '../helpers/lre.js';

describe('noncentralTSeries (t > 0, ncp > 0)', () => {
  it('sums to the central t as ncp → 0', () => {
    // The shift is about φ(0)·ncp = 4e-11 at ncp = 1e-10.
    expect(Math.abs(noncentralTSeries(1.7, 6, 1e-10, false) - studentTCdf(1.7, 6))).toBeLessThan(1e-10);
    expect(Math.abs(noncentralTSeries(1.7, 6, 1e-10, true) - studentTSf(1.7, 6))).toBeLessThan(1e-10);
  });

  it('is right where AS 243 from j = 0 underflows (jstat returns 1.9e-40 here)', () => {
    // mpmath 1.3.0 at 40 digits (quadrature of the mixture integral), computed for this test
    expect(lre(noncentralTSeries(31, 10, 30, true), 0.501831147745095489361972)).toBeGreaterThanOrEqual(15);
    expect(lre(noncentralTSeries(31, 10, 30, false), 0.498168852254904510638028)).toBeGreaterThanOrEqual(15);
  });

  it('sums each tail directly: lower and upper add to 1 (to a few ulps of 1)', () => {
    for (const [t, df, ncp] of [[2, 5, 1], [40, 10, 40], [0.3, 1e6, 2]] as const) {
      const total = noncentralTSeries(t, df, ncp, false) + noncentralTSeries(t, df, ncp, true);
      expect(Math.abs(total - 1)).toBeLessThan(1e-15);
    }
  });

  it('handles ncp = 100 (λ = 5000) without underflow, quickly', () => {
    const start = performance.now();
    const value = noncentralTSeries(100, 1e4, 100, false);
    expect(performance.now() - start).toBeLessThan(1000); // generous: guards against a hang, not a benchmark
    // mpmath 1.3.0 at 50 digits, computed for this test
    expect(lre(value, 0.49909518477584513873)).toBeGreaterThanOrEqual(13.5);
    // and near the normal approximation N(δ, 1 + t²/(2ν)) (A&S 26.7.10)
    expect(Math.abs(value - normalCdf((100 * (1 - 1 / 4e4) - 100) / Math.sqrt(1.5)))).toBeLessThan(1e-3);
  });
});
