import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {chiSquare} from '../../src/methods/chi-square.js';
import {MethodError} from '../../src/methods/method-error.js';
import {twoProportion} from '../../src/methods/two-proportion.js';
import type {ContingencyDesign, MethodOptions} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {intervalDigits, options, pDigits} from './helpers.js';

const opts = (overrides: Partial<MethodOptions> = {}): MethodOptions =>
  options({correction: 'none', intercept: true, posthoc: undefined, ...overrides});

/** successes/trials per group, first group first; rows are `no`, `yes`. */
function groups(x1: number, n1: number, x2: number, n2: number, columns = ['A', 'B']): ContingencyDesign {
  return {kind: 'contingency', rows: ['no', 'yes'], columns, counts: [[n1 - x1, n2 - x2], [x1, x2]], success: 'yes'};
}

interface Details {
  proportions: Record<string, number>;
  risk_ratio: {value: number; ci: [number, number] | null};
  odds_ratio: {value: number; ci: [number, number]};
  sample_odds_ratio: number;
  sensitivity_baseline?: number;
}

describe('two-proportion z test', () => {
  it('matches the statsmodels docstring example (5/83 against 12/99, pooled)', () => {
    const reference = example<{published: {p_value: number}; scipy: {z: number; p_value: number; chi2_uncorrected: number}}>(
      'proportion_z_two_sample--statsmodels-doc.json',
    );
    const result = twoProportion.compute(groups(5, 83, 12, 99), opts());
    // statsmodels 0.13 proportions_ztest([5, 12], [83, 99]) reports first - second; stet reports second - first
    expect(lre(result.statistic.value, -reference.scipy.z)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(pDigits);
    expect(lre(result.statistic.value ** 2, reference.scipy.chi2_uncorrected)).toBeGreaterThanOrEqual(13);
    expect(Number(result.p.toFixed(3))).toBe(reference.published.p_value);
    expect(result.estimate!.name).toBe('difference in proportions of yes (B - A)');
    expect(result.estimate!.value).toBe(12 / 99 - 5 / 83);
    // Newcombe (1998) method 10 in mpmath 1.3.0 at 40 digits, from the formula (statsmodels is not installed here)
    expect(intervalDigits(result.estimate!.ci, [-0.02790995466528636, 0.1468826409787541], lre)).toBeGreaterThanOrEqual(13);
    expect((result.details as unknown as Details).proportions).toEqual({A: 5 / 83, B: 12 / 99});
  });

  it('matches the intervals printed by contingencytables for Perondi et al. (2004) (Fagerland et al. 2017, ch. 4)', () => {
    // High vs standard dose of epinephrine: 7/34 vs 1/34 survived; the book's estimate 0.1765 is high - standard.
    const result = twoProportion.compute(groups(1, 34, 7, 34, ['standard', 'high']), opts());
    // Newcombe_hybrid_score_CI_2x2: estimate = 0.1765 (95% CI 0.0189 to 0.3404)
    expect(result.estimate!.value.toFixed(4)).toBe('0.1765');
    expect(result.estimate!.ci.map((b) => b.toFixed(4))).toEqual(['0.0189', '0.3404']);
    // mpmath 1.3.0 at 40 digits, Newcombe's formula
    expect(lre(result.estimate!.ci[0], 0.018921443885773017)).toBeGreaterThanOrEqual(13);
    expect(lre(result.estimate!.ci[1], 0.3403686870327074)).toBeGreaterThanOrEqual(13);
    const details = result.details as unknown as Details;
    // Katz_log_CI_2x2: estimate = 7.0000 (95% CI 0.9096 to 53.8695); mpmath 1.3.0 at 40 digits
    expect(details.risk_ratio.value).toBe(7);
    expect(details.risk_ratio.ci!.map((b) => b.toFixed(4))).toEqual(['0.9096', '53.8695']);
    expect(lre(details.risk_ratio.ci![0], 0.9096055118420769)).toBeGreaterThanOrEqual(13);
    expect(lre(details.risk_ratio.ci![1], 53.86950646414645)).toBeGreaterThanOrEqual(13);
    // Conditional MLE and exact interval: mpmath 1.3.0 at 40 digits for the mirrored table [[1, 7], [33, 27]]
    // (estimate 0.1200574779850709, CI 0.0025189297433549935 to 1.027460280659663), inverted
    expect(lre(details.odds_ratio.value, 1 / 0.1200574779850709)).toBeGreaterThanOrEqual(12);
    expect(lre(details.odds_ratio.ci[0], 1 / 1.027460280659663)).toBeGreaterThanOrEqual(12);
    expect(lre(details.odds_ratio.ci[1], 1 / 0.0025189297433549935)).toBeGreaterThanOrEqual(12);
    expect(details.sample_odds_ratio).toBe((7 * 33) / (27 * 1));
    expect(result.warnings![0]).toMatchObject({kind: 'small-expected', alternative: 'fisher-exact'});
  });

  it('reports Cohen’s h with the arcsine interval', () => {
    const result = twoProportion.compute(groups(5, 83, 12, 99), opts());
    const h = 2 * Math.asin(Math.sqrt(12 / 99)) - 2 * Math.asin(Math.sqrt(5 / 83));
    const half = 1.959963984540054 * Math.sqrt(1 / 83 + 1 / 99); // z(0.975): mpmath 1.3.0
    expect(result.effect!.name).toBe('cohens-h');
    expect(result.effect!.value).toBe(h);
    expect(intervalDigits(result.effect!.ci!, [h - half, h + half], lre)).toBeGreaterThanOrEqual(14);
  });

  it('reports sensitivity: R power.prop.test(n = 50, p1 = .5, p2 = .75) and the 80% detectable difference', () => {
    const design = groups(25, 50, 30, 50);
    const result = twoProportion.compute(design, opts({smallestEffect: 0.25}));
    // R ?power.prop.test prints power = 0.740 (one tail); both tails, mpmath 1.3.0 at 40 digits: 0.740167193453611
    expect(result.sensitivity!.power_at_smallest_effect!.toFixed(3)).toBe('0.740');
    expect(lre(result.sensitivity!.power_at_smallest_effect!, 0.740167193453611)).toBeGreaterThanOrEqual(13);
    expect((result.details as unknown as Details).sensitivity_baseline).toBe(0.5);
    // Consistency, not a reference value: the power at the detectable difference is 80%.
    const mde = result.sensitivity!.min_detectable_effect_80;
    const atMde = twoProportion.compute(design, opts({smallestEffect: mde})).sensitivity!.power_at_smallest_effect!;
    expect(lre(atMde, 0.8)).toBeGreaterThanOrEqual(12);
    // mpmath 1.3.0 at 40 digits: bisection of the two-tailed power formula at 0.8 from p1 = 0.5, n = 50 per group
    expect(lre(mde, 0.2668300498289294)).toBeGreaterThanOrEqual(12);
  });

  it('omits the power at an impossible smallest effect and refuses malformed ones', () => {
    const result = twoProportion.compute(groups(45, 50, 48, 50), opts({smallestEffect: 0.2, alternative: 'greater'}));
    expect(result.sensitivity?.power_at_smallest_effect ?? null).toBeNull();
    expect(result.warnings).toContainEqual(expect.objectContaining({kind: 'smallest-effect-out-of-range', bound: 1}));
    expect(() => twoProportion.compute(groups(5, 50, 8, 50), opts({smallestEffect: 1.5}))).toThrow(MethodError);
  });

  it('refuses designs it cannot compute', () => {
    const three: ContingencyDesign = {kind: 'contingency', rows: ['no', 'yes'], columns: ['a', 'b', 'c'], counts: [[1, 2, 3], [4, 5, 6]], success: 'yes'};
    expect(() => twoProportion.compute(three, opts())).toThrow(/compares two groups/);
    expect(() => twoProportion.compute(groups(0, 10, 0, 12), opts())).toThrow(MethodError);
    expect(() => twoProportion.compute(groups(0, 0, 3, 12), opts())).toThrow(/no observations/);
  });

  it('agrees with the uncorrected chi-square test (z² = X²), with p in [0, 1] and one-sided halves (fast-check)', () => {
    const group = fc.integer({min: 1, max: 120}).chain((n) => fc.tuple(fc.integer({min: 0, max: n}), fc.constant(n)));
    fc.assert(
      fc.property(group, group, ([x1, n1], [x2, n2]) => {
        fc.pre(x1 + x2 > 0 && x1 + x2 < n1 + n2);
        const design = groups(x1, n1, x2, n2);
        const z = twoProportion.compute(design, opts());
        const chi = chiSquare.compute(design, opts());
        expect(z.p).toBeGreaterThanOrEqual(0);
        expect(z.p).toBeLessThanOrEqual(1);
        if (chi.statistic.value > 1e-12) expect(lre(z.statistic.value ** 2, chi.statistic.value)).toBeGreaterThanOrEqual(11);
        const greater = twoProportion.compute(design, opts({alternative: 'greater'})).p;
        const less = twoProportion.compute(design, opts({alternative: 'less'})).p;
        expect(lre(z.p, Math.min(1, 2 * Math.min(greater, less)))).toBeGreaterThanOrEqual(13);
        expect(z.estimate!.ci[0]).toBeLessThanOrEqual(z.estimate!.value);
        expect(z.estimate!.ci[1]).toBeGreaterThanOrEqual(z.estimate!.value);
      }),
      {numRuns: 150},
    );
  });
});
