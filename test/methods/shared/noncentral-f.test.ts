import {describe, expect, it} from 'vitest';
import {NONCENTRAL_F_MAX_LAMBDA, noncentralFTail} from '../../../src/methods/shared/noncentral-f.js';
import {fCdf, fSf} from '../../../src/distributions/fisher-f.js';
import {lre} from '../../helpers/lre.js';

// mpmath 1.3.0 at 40 digits: the Poisson mixture Σ_j Pois(j; λ/2) I_w(df1/2 + j, df2/2) summed
// from the mode with the same recurrences and an mpmath.betainc start (/tmp script, each tail
// separately; the two tails sum to 1 within 1e-33). scipy 1.17.1 stats.ncf, shown for
// comparison, is off by 1.1e-13 relative at λ = 5.4e6.
const cases = [
  {x: 0.9, df1: 5, df2: 15, lambda: 3, cdf: 0.25311489198604530897, sf: 0.74688510801395469103},
  {x: 3, df1: 2, df2: 20, lambda: 10, cdf: 0.19397678546391938354, sf: 0.80602321453608061646},
  {x: 5436385.54079785, df1: 1, df2: 34, lambda: 5436385, cdf: 0.46773874778722318758, sf: 0.53226125221277681242},
  {x: 330.285339234588, df1: 6, df2: 9, lambda: 2000, cdf: 0.42802252888867341799, sf: 0.57197747111132658201},
  {x: 1e-3, df1: 3, df2: 7, lambda: 0.5, cdf: 0.000037496853046275567983, sf: 0.99996250314695372443},
  {x: 50, df1: 4, df2: 30, lambda: 400, cdf: 0.0023966688815481748336, sf: 0.99760333111845182517},
];

describe('noncentral F tails', () => {
  for (const c of cases) {
    it(`matches mpmath at x = ${c.x}, df = (${c.df1}, ${c.df2}), λ = ${c.lambda}`, () => {
      // Measured: ≥ 13.8 digits on every case (the large-λ sum carries ~30k recurrence steps).
      expect(lre(noncentralFTail(c.x, c.df1, c.df2, c.lambda, false), c.cdf)).toBeGreaterThanOrEqual(13.5);
      expect(lre(noncentralFTail(c.x, c.df1, c.df2, c.lambda, true), c.sf)).toBeGreaterThanOrEqual(13.5);
    });
  }

  it('reduces to the central F at λ = 0', () => {
    for (const [x, df1, df2] of [[0.9, 5, 15], [4.2, 1, 3], [1e-4, 2, 50], [80, 6, 9]] as const) {
      expect(lre(noncentralFTail(x, df1, df2, 0, false), fCdf(x, df1, df2))).toBeGreaterThanOrEqual(15);
      expect(lre(noncentralFTail(x, df1, df2, 0, true), fSf(x, df1, df2))).toBeGreaterThanOrEqual(15);
    }
  });

  it('handles the ends of its domain', () => {
    expect(noncentralFTail(0, 2, 3, 5, false)).toBe(0);
    expect(noncentralFTail(0, 2, 3, 5, true)).toBe(1);
    expect(noncentralFTail(Infinity, 2, 3, 5, true)).toBe(0);
    expect(noncentralFTail(1, 2, 3, NONCENTRAL_F_MAX_LAMBDA * 2, true)).toBeNaN();
    expect(noncentralFTail(1, 0, 3, 5, true)).toBeNaN();
  });
});
