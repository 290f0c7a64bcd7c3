import {describe, expect, it} from 'vitest';
import {regressionBand} from '../../src/charts/regression-band.js';
import {linearRegression} from '../../src/methods/linear-regression.js';
import type {BivariateDesign, MethodOptions} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';

// Invented data (water–cement ratio against strength).
const x = Float64Array.from([0.4, 0.45, 0.5, 0.55, 0.6, 0.65, 0.7, 0.48, 0.52, 0.58]);
const y = Float64Array.from([41.2, 39.8, 36.5, 35.1, 31.9, 30.2, 27.4, 38.0, 36.9, 32.8]);
const design: BivariateDesign = {kind: 'bivariate', x: [{label: 'wc', values: x}], y: {label: 'strength', values: y}};
const options = (intercept: boolean): MethodOptions => ({
  alternative: 'two-sided', confidence: 0.95, alpha: 0.05, mu: 0, smallestEffect: undefined, posthoc: undefined, correction: 'none', intercept,
});

interface Details {
  coefficients: {estimate: number}[];
  residual_sd: number;
  anova_table: {residual: {df: number}};
}

/** The band through our regression code, as the chart draws it, at x = 0.40, 0.55, 0.70. */
function band(intercept: boolean) {
  const details = linearRegression.compute(design, options(intercept)).details as unknown as Details;
  const [b0, b1] = intercept ? [details.coefficients[0]!.estimate, details.coefficients[1]!.estimate] : [0, details.coefficients[0]!.estimate];
  const points = regressionBand({
    x, intercept: b0, slope: b1, residualSd: details.residual_sd, residualDf: details.anova_table.residual.df,
    confidence: 0.95, hasIntercept: intercept, steps: 3,
  });
  return points;
}

describe('regressionBand', () => {
  it('matches the t-based confidence band of the mean response', () => {
    // scipy 1.17.1 / numpy: fit = [1, x0]·b, se = s·sqrt([1, x0](XᵀX)⁻¹[1, x0]ᵀ), ± stats.t.ppf(0.975, 8)·se
    const expected = [
      [0.4, 41.72451121900011, 41.012921411197674, 42.43610102680254],
      [0.55, 34.64984910116782, 34.27788057438887, 35.02181762794677],
      [0.7, 27.57518698333554, 26.81221604597173, 28.338157920699352],
    ];
    const points = band(true);
    expect(points).toHaveLength(3);
    points.forEach((p, i) => {
      const [x0, fit, lower, upper] = expected[i]!;
      expect(lre(p.x, x0!)).toBeGreaterThanOrEqual(14);
      expect(lre(p.fit, fit!)).toBeGreaterThanOrEqual(12);
      expect(lre(p.lower, lower!)).toBeGreaterThanOrEqual(12);
      expect(lre(p.upper, upper!)).toBeGreaterThanOrEqual(12);
    });
  });

  it('matches the band through the origin', () => {
    // scipy 1.17.1 / numpy: fit = b·x0, se = s·|x0|/sqrt(Σx²), ± stats.t.ppf(0.975, 9)·se
    const points = band(false);
    expect(lre(points[0]!.lower, 19.362893117824516)).toBeGreaterThanOrEqual(12);
    expect(lre(points[0]!.upper, 29.923846062920685)).toBeGreaterThanOrEqual(12);
    expect(lre(points[2]!.lower, 33.8850629561929)).toBeGreaterThanOrEqual(12);
    expect(lre(points[2]!.upper, 52.36673061011119)).toBeGreaterThanOrEqual(12);
  });

  it('is narrowest at the mean of x', () => {
    const points = regressionBand({x, intercept: 0, slope: 1, residualSd: 1, residualDf: 8, confidence: 0.95, hasIntercept: true, steps: 41});
    const widths = points.map((p) => p.upper - p.lower);
    const narrowest = points[widths.indexOf(Math.min(...widths))]!.x;
    const mean = x.reduce((a, b) => a + b, 0) / x.length;
    expect(Math.abs(narrowest - mean)).toBeLessThanOrEqual((0.7 - 0.4) / 40);
  });
});
