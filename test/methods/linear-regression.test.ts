import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {linearRegression} from '../../src/methods/linear-regression.js';
import {MethodError} from '../../src/methods/method-error.js';
import {pearson} from '../../src/methods/pearson.js';
import type {BivariateDesign, MethodOutcome} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {intervalDigits, options, sample} from './helpers.js';
import {nistRegression} from './nist-regression.js';

interface Coefficient {
  term: string;
  estimate: number;
  se: number;
  t: number;
  p: number;
  ci: [number, number];
}

interface Details {
  coefficients: Coefficient[];
  r_squared: number;
  adjusted_r_squared: number;
  residual_sd: number;
  anova_table: {regression: {ss: number; df: number; ms: number}; residual: {ss: number; df: number; ms: number}};
}

const details = (result: MethodOutcome) => result.details as unknown as Details;

function fitNist(name: string) {
  const file = nistRegression(name);
  const result = linearRegression.compute(file.design, options({intercept: file.intercept}));
  return {result, d: details(result), certified: file.certified};
}

/** The smallest LRE over every certified coefficient (or SE). */
function coefficientDigits(d: Details, certified: ReturnType<typeof fitNist>['certified'], field: 'estimate' | 'se') {
  return Math.min(...d.coefficients.map((c, i) => lre(c[field], certified.parameters[i]![field === 'se' ? 'sd' : 'estimate'])));
}

/**
 * NIST StRD linear regression, certified values (500-digit arithmetic on the
 * exact decimals). The data are read as float64 here, as the data stage
 * reads them today. Floors are the measured LREs rounded down to half a digit:
 *   file      coefficients  SEs   residual SD  R²    F
 *   Norris    12.8          13.8  13.8         15.5  13.5
 *   NoInt1    14.7          15.9  15.0         15.7  14.9
 *   NoInt2    15.3          15.8  15.5         15.9  14.8
 *   Longley   13.6          14.6  14.6         15.5  14.2
 *   Pontius   13.2          13.5  13.5         15.9  13.2
 * The targets are ≥ 12 digits for Norris and NoInt and ≥ 11 for Longley.
 */
const floors = {
  Norris: {estimate: 12.5, se: 13.5, sd: 13.5, r2: 15, f: 13},
  NoInt1: {estimate: 14.5, se: 15.5, sd: 14.5, r2: 15, f: 14.5},
  NoInt2: {estimate: 15, se: 15.5, sd: 15, r2: 15.5, f: 14.5},
  Longley: {estimate: 13.5, se: 14.5, sd: 14.5, r2: 15, f: 14},
  Pontius: {estimate: 13, se: 13, sd: 13, r2: 15.5, f: 13},
} as const;

describe('linear regression against NIST StRD', () => {
  for (const [name, floor] of Object.entries(floors)) {
    it(`${name}: certified coefficients, SEs, residual SD, R², ANOVA table and F (NIST StRD ${name}.dat)`, () => {
      const {result, d, certified} = fitNist(name);
      expect(d.coefficients.length).toBe(certified.parameters.length);
      expect(coefficientDigits(d, certified, 'estimate')).toBeGreaterThanOrEqual(floor.estimate);
      expect(coefficientDigits(d, certified, 'se')).toBeGreaterThanOrEqual(floor.se);
      expect(lre(d.residual_sd, certified.residual_sd)).toBeGreaterThanOrEqual(floor.sd);
      expect(lre(d.r_squared, certified.r_squared)).toBeGreaterThanOrEqual(floor.r2);
      expect(lre(result.statistic.value, certified.anova.regression.f!)).toBeGreaterThanOrEqual(floor.f);
      expect(lre(d.anova_table.regression.ss, certified.anova.regression.ss)).toBeGreaterThanOrEqual(floor.f);
      expect(lre(d.anova_table.residual.ss, certified.anova.residual.ss)).toBeGreaterThanOrEqual(floor.f);
      expect(lre(d.anova_table.residual.ms, certified.anova.residual.ms)).toBeGreaterThanOrEqual(floor.f);
      expect(result.statistic.name).toBe('F');
      expect(result.df).toEqual(certified.df);
      expect(d.anova_table.regression.df).toBe(certified.df[0]);
      expect(d.anova_table.residual.df).toBe(certified.df[1]);
    });
  }

  it('Longley: t, p and 95% interval of every coefficient, and the F test’s p', () => {
    const {result, d} = fitNist('Longley');
    // mpmath 1.3.0 at 40 digits from the NIST StRD Longley certified estimates and SDs:
    // t = B/sd, p = 2 P(T_9 > |t|), ci = B ± t_{.975,9}·sd
    const expected = [
      {term: '(intercept)', t: -3.9108029181543386785, p: 0.0035604036637262312784, ci: [-5496529.4832747647134, -1467987.7859168752866]},
      {term: 'x1', t: 0.17737602822999872489, p: 0.86314083280921441653, ci: [-177.02903529849360612, 207.15277984124020612]},
      {term: 'x2', t: -1.0695163172210467346, p: 0.31268106109271148194, ci: [-0.11158110241390132772, 0.039942743828719327717]},
      {term: 'x3', t: -4.1364273559407268093, p: 0.0025350917341112259214, ci: [-3.1250666419735842152, -0.91539296566007578478]},
      {term: 'x4', t: -4.8219853104454573225, p: 0.00094436676416179776444, ci: [-1.5179487001723644898, -0.54850503417481551016]},
      {term: 'x5', t: -0.22605114466420403699, p: 0.82621179576364676471, ci: [-0.56251721450721782366, 0.46030900320005642366]},
      {term: 'x6', t: 4.0158898127097812315, p: 0.0030368033416303079157, ci: [798.78751527841880512, 2859.5154139486811949]},
    ] as const;
    expected.forEach((e, i) => {
      const c = d.coefficients[i]!;
      expect(c.term).toBe(e.term);
      expect(lre(c.t, e.t), e.term).toBeGreaterThanOrEqual(13);
      expect(lre(c.p, e.p), e.term).toBeGreaterThanOrEqual(12.5);
      expect(intervalDigits(c.ci, e.ci, lre), e.term).toBeGreaterThanOrEqual(13);
    });
    // mpmath 1.3.0 at 40 digits: P(F_{6,9} > 330.285339234588), the certified F
    expect(lre(result.p, 4.9840305287248091259e-10)).toBeGreaterThanOrEqual(12);
    // mpmath 1.3.0 at 40 digits: 1 − (SSE/SST)(n − 1)/(n − p − 1) from the certified sums of squares
    expect(lre(d.adjusted_r_squared, 0.99246500762882599464)).toBeGreaterThanOrEqual(14);
    // mpmath 1.3.0 at 40 digits: noncentral-F inversion at the certified F (test/methods/shared/r-squared-interval.test.ts)
    expect(result.effect!.name).toBe('r-squared');
    expect(lre(result.effect!.ci![0], 0.9733487243983444406)).toBeGreaterThanOrEqual(13);
    expect(lre(result.effect!.ci![1], 0.99620009511285446804)).toBeGreaterThanOrEqual(13);
    // the estimate is the first predictor's slope, with its two-sided interval
    expect(result.estimate).toEqual({name: 'slope of y on x1', value: d.coefficients[1]!.estimate, ci: d.coefficients[1]!.ci, level: 0.95});
  });

  it('Norris: the slope’s p-value of 4.7e-90 (as far as the certified digits of t carry it)', () => {
    const {result, d} = fitNist('Norris');
    // mpmath 1.3.0 at 40 digits from the certified B1/sd(B1) = 2331.6057858904440686 on 34 df. The
    // tail's condition number t·f(t)/F(t) ≈ t² ≈ 5.4e6 turns the 13.8 digits of t into about 7 of p.
    expect(lre(d.coefficients[1]!.p, 4.6540408524731410414e-90)).toBeGreaterThanOrEqual(6.5);
    expect(lre(result.p, 4.6540408524723450942e-90)).toBeGreaterThanOrEqual(6.5);
    // scipy 1.10 linregress p in shared/reference/examples/linear_regression--nist-strd-norris.json
    const scipy = example<{scipy: {p_value_slope: number}}>('linear_regression--nist-strd-norris.json').scipy;
    expect(lre(d.coefficients[1]!.p, scipy.p_value_slope)).toBeGreaterThanOrEqual(6.5);
    // mpmath 1.3.0 at 40 digits: the intercept's t = -1.1267290749860781334, p and interval
    const b0 = d.coefficients[0]!;
    expect(b0.term).toBe('(intercept)');
    expect(lre(b0.p, 0.26774674233320223732)).toBeGreaterThanOrEqual(12);
    expect(intervalDigits(b0.ci, [-0.73546665210159137269, 0.21082050455353337269], lre)).toBeGreaterThanOrEqual(12);
    // mpmath 1.3.0 at 40 digits from the certified sums of squares
    expect(lre(d.adjusted_r_squared, 0.99999356193911501107)).toBeGreaterThanOrEqual(14);
    // mpmath 1.3.0 at 40 digits: noncentral-F inversion at the certified F
    expect(lre(result.effect!.ci![0], 0.99998863248016760223)).toBeGreaterThanOrEqual(13);
    expect(lre(result.effect!.ci![1], 0.99999566739549115246)).toBeGreaterThanOrEqual(13);
  });

  it('Norris: a one-sided alternative tests the first slope with t on the residual df', () => {
    const {design} = nistRegression('Norris');
    const result = linearRegression.compute(design, options({alternative: 'greater'}));
    expect(result.statistic.name).toBe('t');
    expect(result.df).toBe(34);
    // mpmath 1.3.0 at 40 digits: P(T_34 > 2331.6057858904440686), conditioned as above
    expect(lre(result.p, 2.3270204262365705207e-90)).toBeGreaterThanOrEqual(6.5);
    expect(result.estimate!.ci[1]).toBe(Infinity);
    expect(result.variant).toBe('one-sided t test of the first slope');
    const less = linearRegression.compute(design, options({alternative: 'less'}));
    expect(less.p).toBe(1);
    expect(less.estimate!.ci[0]).toBe(-Infinity);
  });

  it('NoInt1, NoInt2: no intercept, uncentred R², F on [p, n − p] df', () => {
    for (const [name, p, pGreater, ci, adjusted] of [
      // mpmath 1.3.0 at 40 digits from the NIST StRD certified B1, sd(B1) and sums of squares
      ['NoInt1', 2.5316281865828849585e-17, 1.2658140932914424792e-17, [2.0375514239341149868, 2.1112089066444050132], 0.99930204152852905307],
      ['NoInt2', 0.0033314917690361670012, 0.0016657458845180835006, [0.54620534638439586562, 0.90834010816105813438], 0.99002217294900220075],
    ] as const) {
      const {result, d} = fitNist(name);
      expect(d.coefficients.map((c) => c.term)).toEqual(['x']);
      expect(result.variant).toBe('F test, no intercept (uncentred R²)');
      expect(lre(d.coefficients[0]!.p, p), name).toBeGreaterThanOrEqual(12);
      expect(lre(result.p, p), name).toBeGreaterThanOrEqual(12);
      expect(intervalDigits(d.coefficients[0]!.ci, ci, lre), name).toBeGreaterThanOrEqual(13);
      expect(lre(d.adjusted_r_squared, adjusted), name).toBeGreaterThanOrEqual(14);
      const greater = linearRegression.compute(nistRegression(name).design, options({intercept: false, alternative: 'greater'}));
      expect(lre(greater.p, pGreater), name).toBeGreaterThanOrEqual(12);
    }
  });

  it('Filip: refuses the degree-10 polynomial as collinear at R’s default tolerance', () => {
    // NIST StRD Filip.dat is "higher difficulty"; R's lm (dqrdc2, tol 1e-7) drops x^10 likewise.
    const {design} = nistRegression('Filip');
    expect(() => linearRegression.compute(design, options())).toThrow(MethodError);
    expect(() => linearRegression.compute(design, options())).toThrow(/x\^10 is \(almost\) a linear combination/);
  });
});

describe('linear regression: consistency, errors and properties', () => {
  const judges = example<{data: {CONT: number[]; INTG: number[]}}>('pearson_correlation--r-cortest-usjudgeratings.json').data;
  const simple: BivariateDesign = {kind: 'bivariate', x: [sample('CONT', judges.CONT)], y: sample('INTG', judges.INTG)};

  it('with one predictor, R² = r², t² = F and the slope’s p equals Pearson’s', () => {
    // Algebraic identities of simple regression (common practice, no source).
    const fit = linearRegression.compute(simple, options());
    const r = pearson.compute(simple, options());
    expect(lre(details(fit).r_squared, r.estimate!.value ** 2)).toBeGreaterThanOrEqual(13);
    expect(lre(details(fit).coefficients[1]!.t, r.statistic.value)).toBeGreaterThanOrEqual(13);
    expect(lre(details(fit).coefficients[1]!.t ** 2, fit.statistic.value)).toBeGreaterThanOrEqual(13);
    expect(lre(fit.p, r.p)).toBeGreaterThanOrEqual(12);
    expect(fit.effect!.name).toBe('r-squared');
  });

  it('names data problems with a MethodError', () => {
    const x = [1, 2, 3, 4, 5, 6];
    const y = [2.1, 3.9, 6.2, 7.8, 10.1, 12.2];
    const fit = (xs: number[][], ys: number[], intercept = true) =>
      linearRegression.compute({kind: 'bivariate', x: xs.map((v, i) => sample(`x${i + 1}`, v)), y: sample('y', ys)}, options({intercept}));
    expect(() => fit([x, x.map((v) => v * v), x.map((v) => v ** 3), x.map((v) => v ** 4), x.map((v) => v ** 5)], y)).toThrow(/needs at least 7 complete rows/);
    expect(() => fit([[3, 3, 3, 3, 3, 3]], y)).toThrow(/x1 is constant/);
    expect(() => fit([[0, 0, 0, 0, 0, 0]], y, false)).toThrow(/x1 is zero in every row/);
    expect(() => fit([x, x.map((v) => 2 * v + 1)], y)).toThrow(/x2 is \(almost\) a linear combination of the predictors before it and the intercept/);
    expect(() => fit([x], [5, 5, 5, 5, 5, 5])).toThrow(/y is constant/);
    expect(() => fit([x], x.map((v) => 3 * v - 1))).toThrow(/fit y exactly/);
  });

  // Values on a grid of 1/16 (exact in binary) make ties, constant columns and collinearity common.
  const value = fc.integer({min: -1600, max: 1600}).map((k) => k / 16);
  const data = fc
    .integer({min: 4, max: 30})
    .chain((n) =>
      fc.tuple(
        fc.array(fc.array(value, {minLength: n, maxLength: n}), {minLength: 1, maxLength: 3}),
        fc.array(value, {minLength: n, maxLength: n}),
      ),
    );

  it('p in [0, 1], R² and its interval in [0, 1], and coefficients invariant under shuffling rows', () => {
    fc.assert(
      fc.property(data, fc.infiniteStream(fc.nat()), fc.boolean(), ([xs, y], seeds, intercept) => {
        const design: BivariateDesign = {kind: 'bivariate', x: xs.map((v, i) => sample(`x${i}`, v)), y: sample('y', y)};
        let result: MethodOutcome;
        try {
          result = linearRegression.compute(design, options({intercept}));
        } catch (error) {
          // Random data may be collinear, constant or too short: that must be a MethodError.
          expect(error).toBeInstanceOf(MethodError);
          return;
        }
        const d = details(result);
        expect(result.p).toBeGreaterThanOrEqual(0);
        expect(result.p).toBeLessThanOrEqual(1);
        for (const c of d.coefficients) {
          expect(c.p).toBeGreaterThanOrEqual(0);
          expect(c.p).toBeLessThanOrEqual(1);
        }
        expect(d.r_squared).toBeGreaterThanOrEqual(0);
        expect(d.r_squared).toBeLessThanOrEqual(1);
        const [lower, upper] = result.effect!.ci!;
        expect(lower).toBeGreaterThanOrEqual(0);
        expect(upper).toBeGreaterThanOrEqual(lower);
        expect(upper).toBeLessThanOrEqual(1);
        const order = y.map((_, i) => ({i, key: seeds.next().value as number})).sort((a, b) => a.key - b.key);
        const shuffled = linearRegression.compute(
          {kind: 'bivariate', x: xs.map((v, i) => sample(`x${i}`, order.map((o) => v[o.i]!))), y: sample('y', order.map((o) => y[o.i]!))},
          options({intercept}),
        );
        details(shuffled).coefficients.forEach((c, i) => {
          const base = d.coefficients[i]!;
          // Sums in another order round differently; scaled by the SE, the change is tiny.
          expect(Math.abs(c.estimate - base.estimate)).toBeLessThanOrEqual(1e-9 * (base.se + Math.abs(base.estimate)));
        });
      }),
      {numRuns: 200},
    );
  });
});
