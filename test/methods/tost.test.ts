import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {MethodError} from '../../src/methods/method-error.js';
import {tost} from '../../src/methods/tost.js';
import {welchT} from '../../src/methods/welch-t.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {intervalDigits, intervalFloor, options, pDigits, sample} from './helpers.js';

interface Welch {
  df: number;
  mean_difference: number;
  ci: [number, number];
  p_lower_bound_test: number;
  p_upper_bound_test: number;
  p_tost: number;
  t_lower: number;
  t_upper: number;
}
interface Ncss {
  data: {yield_A: number[]; yield_B: number[]};
  published: {welch: Omit<Welch, 'p_tost' | 't_lower' | 't_upper'>};
  scipy: {welch: Welch};
}
interface TestDetail {
  t: number;
  df: number;
  p: number;
}

const reference = example<Ncss>('tost_equivalence--ncss-two-sample-yield.json');
// The source reports A − B; stet reports second − first, so A is second.
const design = {kind: 'two-group', first: sample('B', reference.data.yield_B), second: sample('A', reference.data.yield_A)} as const;

describe('TOST (two one-sided Welch t tests)', () => {
  it('reproduces NCSS “Two-Sample T-Test for Equivalence” (Welch, ±110, α = 0.025)', () => {
    const result = tost.compute(design, options({alpha: 0.025, smallestEffect: 110}));
    const expected = reference.scipy.welch; // statsmodels 0.13.5 ttost_ind(usevar='unequal') in the example file
    const lower = result.details!.lower_test as TestDetail;
    const upper = result.details!.upper_test as TestDetail;
    expect(lre(result.df as number, expected.df)).toBeGreaterThanOrEqual(13);
    expect(lre(result.estimate!.value, expected.mean_difference)).toBeGreaterThanOrEqual(13);
    expect(lre(lower.t, expected.t_lower)).toBeGreaterThanOrEqual(13);
    expect(lre(upper.t, expected.t_upper)).toBeGreaterThanOrEqual(13);
    expect(lre(lower.p, expected.p_lower_bound_test)).toBeGreaterThanOrEqual(pDigits);
    expect(lre(upper.p, expected.p_upper_bound_test)).toBeGreaterThanOrEqual(pDigits);
    expect(lre(result.p, expected.p_tost)).toBeGreaterThanOrEqual(pDigits);
    // The binding test is the lower one; its t is the statistic.
    expect(result.statistic).toEqual({name: 't', value: lower.t});
    // 1 − 2α = 0.95 here, so both intervals are NCSS's 95% interval.
    expect(result.estimate!.level).toBe(0.95);
    expect(intervalDigits(result.estimate!.ci, expected.ci, lre)).toBeGreaterThanOrEqual(intervalFloor);
    expect(intervalDigits(result.details!.ci_confidence as [number, number], expected.ci, lre)).toBeGreaterThanOrEqual(intervalFloor);
    // NCSS as asserted by TOSTER: df 19.169, CI [-120.27336, 104.04259], p 0.03628 / 0.02002.
    const published = reference.published.welch;
    expect((result.df as number).toFixed(3)).toBe(published.df.toFixed(3));
    expect(result.estimate!.ci.map((v) => v.toFixed(5))).toEqual(published.ci.map((v) => v.toFixed(5)));
    expect([lower.p.toFixed(5), upper.p.toFixed(5)]).toEqual([published.p_lower_bound_test.toFixed(5), published.p_upper_bound_test.toFixed(5)]);
    // Not equivalent at α = 0.025 (example notes): max p 0.028… > 0.025 and the interval crosses −110.
    expect(result.p).toBeGreaterThan(0.025);
    expect(result.details!.bounds).toEqual([-110, 110]);
  });

  it('shows the 1 − 2α interval as the estimate and the block’s confidence beside it (α = 0.05)', () => {
    const result = tost.compute(design, options({alpha: 0.05, smallestEffect: 110}));
    expect(result.estimate!.level).toBeCloseTo(0.9, 15);
    // mpmath 1.3.0 at 40 digits, Welch interval from exact rational means and variances:
    // 90%: [-100.78715063708876198, 84.556381406319531215]; 95%: [-120.27336355358111103, 104.04259432281188026].
    expect(intervalDigits(result.estimate!.ci, [-100.78715063708876198, 84.556381406319531215], lre)).toBeGreaterThanOrEqual(13);
    expect(intervalDigits(result.details!.ci_confidence as [number, number], [-120.27336355358111103, 104.04259432281188026], lre)).toBeGreaterThanOrEqual(13);
    // Same data, mpmath: p_L = 0.036279216696992641754, p_U = 0.020016015097403857773.
    expect(lre((result.details!.lower_test as TestDetail).p, 0.036279216696992641754)).toBeGreaterThanOrEqual(13);
    expect(lre((result.details!.upper_test as TestDetail).p, 0.020016015097403857773)).toBeGreaterThanOrEqual(13);
    // Equivalent at 0.05: the 90% interval lies inside ±110.
    expect(result.p).toBeLessThan(0.05);
  });

  it('reports Hedges’ g exactly as welch-t does', () => {
    const result = tost.compute(design, options({smallestEffect: 110}));
    expect(result.effect).toEqual(welchT.compute(design, options()).effect);
  });

  it('refuses a missing or non-positive margin, one-sided alternatives and too few values', () => {
    expect(() => tost.compute(design, options())).toThrow(MethodError);
    expect(() => tost.compute(design, options({smallestEffect: -5}))).toThrow(MethodError);
    expect(() => tost.compute(design, options({smallestEffect: 5, alternative: 'greater'}))).toThrow(MethodError);
    const tiny = {kind: 'two-group', first: sample('a', [1]), second: sample('b', [1, 2])} as const;
    expect(() => tost.compute(tiny, options({smallestEffect: 5}))).toThrow(MethodError);
    const flat = {kind: 'two-group', first: sample('a', [1, 1]), second: sample('b', [2, 2])} as const;
    expect(() => tost.compute(flat, options({smallestEffect: 5}))).toThrow(MethodError);
  });

  it('p in [0, 1]; p < α exactly when the 1 − 2α interval lies inside the margin; symmetric in the groups', () => {
    const group = fc.array(fc.integer({min: -100, max: 100}), {minLength: 2, maxLength: 15});
    fc.assert(
      fc.property(group, group, fc.integer({min: 1, max: 200}), fc.constantFrom(0.01, 0.05, 0.1), (x, y, delta, alpha) => {
        if (new Set(x).size < 2 && new Set(y).size < 2) return;
        const forward = {kind: 'two-group', first: sample('x', x), second: sample('y', y)} as const;
        const result = tost.compute(forward, options({smallestEffect: delta, alpha}));
        expect(result.p).toBeGreaterThanOrEqual(0);
        expect(result.p).toBeLessThanOrEqual(1);
        const [lo, hi] = result.estimate!.ci;
        // Skip ties within rounding of the boundary.
        if (Math.abs(result.p - alpha) > 1e-9) expect(result.p < alpha).toBe(lo > -delta && hi < delta);
        const backward = tost.compute({kind: 'two-group', first: forward.second, second: forward.first}, options({smallestEffect: delta, alpha}));
        expect(Math.abs(backward.p - result.p)).toBeLessThanOrEqual(1e-12);
        expect(backward.estimate!.value).toBe(-result.estimate!.value);
      }),
      // Each run inverts the noncentral t twice for Hedges' g; 60 runs keep this under a second.
      {numRuns: 60},
    );
  });
});
