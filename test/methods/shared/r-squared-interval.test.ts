import {describe, expect, it} from 'vitest';
import {noncentralFCdf, noncentralFSf} from '../../../src/distributions/noncentral-f.js';
import {EXACT_MAX_LAMBDA, rSquaredInterval} from '../../../src/methods/shared/r-squared-interval.js';
import {lre} from '../../helpers/lre.js';

// mpmath 1.3.0 at 40 digits: λ_L, λ_U solving P(F > F_obs; λ_L) = 0.025 and P(F ≤ F_obs; λ_U) = 0.025
// with the Poisson mixture Σ_j Pois(j; λ/2) I_w(df1/2 + j, df2/2) summed from the mode with an
// mpmath.betainc start (bisection, then mpmath.findroot 'anderson' to 1e-30), mapped
// to λ/(λ + n). F values are the NIST StRD certified F of each file, or round numbers.
const cases = [
  {name: 'Norris (certified F)', f: 5436385.54079785, df1: 1, df2: 34, n: 36, ci: [0.99998863248016760223, 0.99999566739549115246]},
  {name: 'Longley (certified F)', f: 330.285339234588, df1: 6, df2: 9, n: 16, ci: [0.9733487243983444406, 0.99620009511285446804]},
  {name: 'NoInt1 (certified F)', f: 15750.25, df1: 1, df2: 10, n: 11, ci: [0.99785127479529646236, 0.99965927392099255118]},
  {name: 'NoInt2 (certified F)', f: 298.6666666666667, df1: 1, df2: 2, n: 3, ci: [0.68778880083679630135, 0.99730002098854136284]},
  {name: 'F = 3 on (2, 20)', f: 3, df1: 2, df2: 20, n: 23, ci: [0, 0.4543032917567460907]},
  {name: 'F = 0.5 on (3, 40)', f: 0.5, df1: 3, df2: 40, n: 44, ci: [0, 0.13476637982173416898]},
] as const;

describe('R² interval by noncentral-F inversion', () => {
  for (const c of cases) {
    it(`matches mpmath for ${c.name}`, () => {
      const [lower, upper] = rSquaredInterval(c.f, c.df1, c.df2, c.n, 0.95);
      // Measured ≥ 14.5 digits; an upper bound near 1 cannot show more than its ulp allows.
      expect(lre(lower, c.ci[0])).toBeGreaterThanOrEqual(c.ci[0] === 0 ? 15.95 : 14);
      expect(lre(upper, c.ci[1])).toBeGreaterThanOrEqual(14);
    });
  }

  it('gives [0, 0] when even λ = 0 puts F_obs below the lower tail', () => {
    // NIST StRD Wampler5: F = 6.7552445824012241E-03 on (5, 15); P(F ≤ F_obs; 0) ≈ 5e-9 < 0.025
    expect(rSquaredInterval(6.7552445824012241e-3, 5, 15, 21, 0.95)).toEqual([0, 0]);
  });

  it('beyond λ = 1e7 uses the second-order expansion, consistent with the exact series', () => {
    // Consistency with the distributions module's noncentral F (itself checked against mpmath in
    // test/distributions/noncentral-f.test.ts): at the λ behind each bound, recovered from R², the
    // exact tail equals the target. Measured: 0.02499999999452563, 0.02500000000954335 (df2 = 100);
    // 0.0250005354, 0.0250005455 (df2 = 1e5, where the expansion is weakest: λ off by 4e-8).
    for (const [f, df1, df2, digits] of [[5e7, 1, 100, 8.5], [1.5e7, 2, 1e5, 4]] as const) {
      const n = df1 + df2 + 1;
      const [lower, upper] = rSquaredInterval(f, df1, df2, n, 0.95);
      const lambda = (r2: number) => (n * r2) / (1 - r2);
      expect(lambda(lower)).toBeGreaterThan(EXACT_MAX_LAMBDA);
      expect(lre(noncentralFSf(f, df1, df2, lambda(lower)), 0.025)).toBeGreaterThanOrEqual(digits);
      expect(lre(noncentralFCdf(f, df1, df2, lambda(upper)), 0.025)).toBeGreaterThanOrEqual(digits);
    }
  });
});
