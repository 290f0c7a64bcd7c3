import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {findRoot} from '../../../src/distributions/find-root.js';
import {noncentralTSf} from '../../../src/distributions/noncentral-t.js';
import {studentTQuantile} from '../../../src/distributions/student-t.js';
import {tTestNcpForPower, tTestPower} from '../../../src/methods/shared/t-power.js';
import type {Alternative} from '../../../src/methods/types.js';
import {lre} from '../../helpers/lre.js';
import {example} from '../../helpers/reference.js';

interface PowerExample {
  published: {case_1_power: number; case_2_n: number; case_3_n: number};
  scipy: {case_1_power: number; case_1_power_upper_tail_only: number; case_2_n: number; case_3_n: number};
}
const reference = example<PowerExample>('power_t_test--r-power-t-test.json');

/** Two-sample design of ?power.t.test: n per group, delta = sd = 1. */
function twoSamplePower(n: number, alternative: Alternative): number {
  return tTestPower({ncp: Math.sqrt(n / 2), df: 2 * n - 2, alpha: 0.05, alternative});
}

describe('tTestPower against R power.t.test and statsmodels', () => {
  it('reproduces the power at n = 20 per group, delta = sd (case 1)', () => {
    const power = twoSamplePower(20, 'two-sided');
    // statsmodels 0.13 TTestIndPower (both tails) in the reference file; scipy 1.10's nct
    // behind it carries about 10 digits.
    expect(lre(power, reference.scipy.case_1_power)).toBeGreaterThanOrEqual(9.5);
    // mpmath 1.3.0 at 50 digits (quadrature of the mixture integral), computed for this test
    expect(lre(power, 0.868953027723989725)).toBeGreaterThanOrEqual(14.5);
  });

  it('reproduces R, which counts only the upper rejection region (strict = FALSE)', () => {
    const critical = -studentTQuantile(0.025, 38);
    const upperOnly = noncentralTSf(critical, 38, Math.sqrt(10));
    // R stats-Ex.Rout.save prints 0.8689528 (7 significant digits)
    expect(Math.abs(upperOnly - reference.published.case_1_power)).toBeLessThan(0.5e-7);
    // scipy 1.10 nct in the reference file (~10 digits), and mpmath 1.3.0 at 50 digits
    expect(lre(upperOnly, reference.scipy.case_1_power_upper_tail_only)).toBeGreaterThanOrEqual(9.5);
    expect(lre(upperOnly, 0.868952801692127008)).toBeGreaterThanOrEqual(14.5);
  });

  it('solves the n per group for power 0.9, two- and one-sided (cases 2 and 3)', () => {
    const twoSided = findRoot((n) => twoSamplePower(n, 'two-sided') - 0.9, 2, 100);
    const oneSided = findRoot((n) => twoSamplePower(n, 'greater') - 0.9, 2, 100);
    // R solves with uniroot(tol = 1.2e-4), so its printed 22.0211 and 17.84713 hold to that.
    expect(Math.abs(twoSided - reference.published.case_2_n)).toBeLessThan(1.2e-4);
    expect(Math.abs(oneSided - reference.published.case_3_n)).toBeLessThan(1.2e-4);
    // statsmodels solve_power (brentq on its ~10-digit power) in the reference file
    expect(lre(twoSided, reference.scipy.case_2_n)).toBeGreaterThanOrEqual(8);
    expect(lre(oneSided, reference.scipy.case_3_n)).toBeGreaterThanOrEqual(8);
    // mpmath 1.3.0: the root of the 40-digit power in n, computed for this test
    expect(lre(twoSided, 22.021088426378934002)).toBeGreaterThanOrEqual(14);
    expect(lre(oneSided, 17.847120626538358786)).toBeGreaterThanOrEqual(14);
  });

  it('has power alpha at ncp = 0 and is symmetric for two-sided tests', () => {
    for (const alternative of ['two-sided', 'greater', 'less'] as const) {
      expect(lre(tTestPower({ncp: 0, df: 12.5, alpha: 0.05, alternative}), 0.05)).toBeGreaterThanOrEqual(14.5);
    }
    const plus = tTestPower({ncp: 2.2, df: 9, alpha: 0.01, alternative: 'two-sided'});
    expect(lre(tTestPower({ncp: -2.2, df: 9, alpha: 0.01, alternative: 'two-sided'}), plus)).toBeGreaterThanOrEqual(15);
    expect(tTestPower({ncp: -2.2, df: 9, alpha: 0.01, alternative: 'less'})).toBe(
      tTestPower({ncp: 2.2, df: 9, alpha: 0.01, alternative: 'greater'}),
    );
  });

  it('returns NaN for invalid numbers and throws on an unknown alternative', () => {
    expect(tTestPower({ncp: 1, df: 0, alpha: 0.05, alternative: 'greater'})).toBeNaN();
    expect(tTestPower({ncp: 1, df: 5, alpha: 1, alternative: 'greater'})).toBeNaN();
    expect(tTestPower({ncp: NaN, df: 5, alpha: 0.05, alternative: 'greater'})).toBeNaN();
    expect(() => tTestPower({ncp: 1, df: 5, alpha: 0.05, alternative: 'both' as Alternative})).toThrow(/alternative/);
  });
});

describe('tTestNcpForPower', () => {
  it('inverts tTestPower for each alternative', () => {
    for (const alternative of ['two-sided', 'greater'] as const) {
      for (const [power, df] of [[0.8, 38], [0.9, 5.5], [0.999, 100]] as const) {
        const ncp = tTestNcpForPower({power, df, alpha: 0.05, alternative});
        expect(ncp).toBeGreaterThan(0);
        expect(lre(tTestPower({ncp, df, alpha: 0.05, alternative}), power)).toBeGreaterThanOrEqual(14);
      }
    }
    // `less` returns the magnitude; the effect itself points downwards.
    const less = tTestNcpForPower({power: 0.8, df: 38, alpha: 0.05, alternative: 'less'});
    expect(less).toBe(tTestNcpForPower({power: 0.8, df: 38, alpha: 0.05, alternative: 'greater'}));
    expect(lre(tTestPower({ncp: -less, df: 38, alpha: 0.05, alternative: 'less'}), 0.8)).toBeGreaterThanOrEqual(14);
  });

  it('matches the R example: n = 20 per group has power 0.868953 at ncp √10', () => {
    // Inverse of case 1 above: the ncp for that power is √10 (R example design).
    const ncp = tTestNcpForPower({power: 0.868953027723989725, df: 38, alpha: 0.05, alternative: 'two-sided'});
    expect(lre(ncp, Math.sqrt(10))).toBeGreaterThanOrEqual(13);
  });

  it('returns 0 when alpha already reaches the power, NaN for invalid input', () => {
    expect(tTestNcpForPower({power: 0.04, df: 10, alpha: 0.05, alternative: 'two-sided'})).toBe(0);
    expect(tTestNcpForPower({power: 1, df: 10, alpha: 0.05, alternative: 'greater'})).toBeNaN();
    expect(tTestNcpForPower({power: 0.8, df: -1, alpha: 0.05, alternative: 'greater'})).toBeNaN();
  });
});

describe('t-test power properties (fast-check)', () => {
  it('power increases with ncp and stays in [alpha, 1] for ncp ≥ 0', () => {
    fc.assert(
      fc.property(
        fc.double({min: 0, max: 15, noNaN: true}),
        fc.double({min: 0, max: 15, noNaN: true}),
        fc.double({min: 1, max: 500, noNaN: true}),
        fc.constantFrom<Alternative>('two-sided', 'greater'),
        (a, b, df, alternative) => {
          const [lo, hi] = a <= b ? [a, b] : [b, a];
          const pLo = tTestPower({ncp: lo, df, alpha: 0.05, alternative});
          const pHi = tTestPower({ncp: hi, df, alpha: 0.05, alternative});
          return pLo >= 0.05 * (1 - 1e-12) && pHi <= 1 && pLo <= pHi * (1 + 1e-13);
        },
      ),
      {numRuns: 50},
    );
  });
});
