import {describe, expect, it} from 'vitest';
import {normalSf} from '../../src/distributions/normal.js';
import {noncentralTQuadrature} from '../../src/distributions/noncentral-t-quadrature.js';
import {noncentralTSeries} from '../../src/distributions/noncentral-t-series.js';
import {studentTSf} from '../../src/distributions/student-t.js';
import {lre} from '../helpers/lre.js';

describe('noncentralTQuadrature (t ≥ 0)', () => {
  const oppositeTail = (t: number, df: number, d: number) => noncentralTQuadrature(t, df, -d, true);
  it('is Φc(d) at t = 0', () => {
    // P(T > 0) = P(Z > d): common practice, no source
    expect(oppositeTail(0, 7, 3)).toBe(normalSf(3));
  });

  it('integrates to the central t at d = 0 (normalizing constant and range)', () => {
    // Cauchy: P(T > 3) = atan(1/3)/π (closed form); other df against the beta form.
    expect(lre(oppositeTail(3, 1, 0), Math.atan(1 / 3) / Math.PI)).toBeGreaterThanOrEqual(14.5);
    for (const [t, df] of [[0.4, 0.7], [2.5, 18.3], [4, 1e6]] as const) {
      expect(lre(oppositeTail(t, df, 0), studentTSf(t, df))).toBeGreaterThanOrEqual(14);
    }
  });

  it('keeps relative precision in far tails, for small and huge df', () => {
    // mpmath 1.3.0 at 50 digits (quadrature of the mixture over log S), computed for this test.
    // At ν = 1e6 the integrand exp(-α(e^{2u}-1-2u)) has α = 5e5: an ulp of u moves the
    // exponent by ~1e-14 at the range ends, so ~13.5 digits is the double-precision limit.
    expect(lre(oppositeTail(2, 1e6, 30), 5.4577591767275256901e-225)).toBeGreaterThanOrEqual(13);
    expect(lre(oppositeTail(0.5, 0.7, 3), 0.00058917604070650064924)).toBeGreaterThanOrEqual(14);
  });

  it('agrees with the series on either tail for positive ncp', () => {
    for (const [t, df, ncp] of [[2.5, 18, 1.3], [31, 10, 30], [190, 1e4, 180]] as const) {
      for (const upper of [false, true]) {
        const series = noncentralTSeries(t, df, ncp, upper);
        // At ncp 180 (λ = 16200) the sf is 1e-9 and the series keeps 13.2 digits
        // (the quadrature 14.5, against mpmath 1.3.0 at 50 digits).
        expect(lre(noncentralTQuadrature(t, df, ncp, upper), series)).toBeGreaterThanOrEqual(13);
      }
    }
    // mpmath 1.3.0 at 50 digits, computed for this test
    expect(lre(noncentralTQuadrature(190, 1e4, 180, true), 1.0531557555621065586e-9)).toBeGreaterThanOrEqual(14);
  });

  it('handles ncp in the thousands (where the series would need millions of terms)', () => {
    const start = performance.now();
    const lower = noncentralTQuadrature(1000, 1e4, 990, false);
    const upper = noncentralTQuadrature(1000, 1e4, 990, true);
    expect(performance.now() - start).toBeLessThan(1000); // generous: guards against a hang, not a benchmark
    expect(Math.abs(lower + upper - 1)).toBeLessThan(1e-14);
  });
});
