import {fSf} from '../distributions/fisher-f.js';
import {studentTQuantile} from '../distributions/student-t.js';
import {MethodError} from './method-error.js';
import {qrLeastSquares, sumOfSquares} from './shared/qr-least-squares.js';
import {rSquaredInterval} from './shared/r-squared-interval.js';
import {accurateMean} from './shared/summarize.js';
import {tInference, tPValue} from './shared/t-inference.js';
import type {BivariateDesign, MethodDefinition, MethodOptions, Sample} from './types.js';

/** SSE/SST below which the fit is exact up to rounding (residual SD under 1e-12 of y's spread). */
const EXACT_FIT = 1e-24;

/**
 * Ordinary least squares regression of y on one or more predictors, with or
 * without an intercept, solved by Householder QR (shared/qr-least-squares.ts).
 *
 * With an intercept the predictors and y are centred on compensated means
 * first; the slopes come from the centred QR, the intercept from
 * ȳ − Σ b_j x̄_j, and its variance σ²(1/n + ‖R⁻ᵀx̄‖²) from the same R. The
 * F test is of all slopes, on [p, n − p − 1] df, with R² = 1 − SSE/SST. Without
 * an intercept (`intercept: false`) the F test is of all p coefficients on
 * [p, n − p] df and R² is uncentred, 1 − SSE/Σy², as R's lm and the NIST
 * StRD NoInt files define it. Adjusted R² = 1 − (1 − R²)(n − k)/(n − p − k),
 * k = 1 with intercept, 0 without (R's summary.lm).
 *
 * Result: `details.coefficients` [{term, estimate, se, t, p, ci}] with
 * two-sided t tests and intervals on the residual df (terms `(intercept)` and
 * the x labels), `r_squared`, `adjusted_r_squared`, `residual_sd` and the
 * ANOVA table. The block's estimate is the first predictor's slope; its
 * effect is R² with the noncentral-F interval (shared/r-squared-interval.ts).
 * A one-sided alternative is about the direction of the first slope: the
 * block then reports that slope's t test instead of the F test, which has no
 * direction.
 *
 * Accuracy with float64 input, smallest LRE over the certified coefficients
 * (test/methods/linear-regression.test.ts): NIST StRD Norris 12.8, NoInt1
 * 14.7, NoInt2 15.3, Longley 13.6, Pontius 13.2. Filip is refused as
 * collinear at R's default tolerance, and exact fits (Wampler1–2) as having
 * no error variance.
 */
export const linearRegression: MethodDefinition<BivariateDesign> = {
  id: 'linear-regression',
  title: 'linear regression',
  design: 'bivariate',
  question: 'association',
  compute(design, options) {
    const {x, y} = design;
    const n = y.values.length;
    const p = x.length;
    if (p === 0 || x.some((column) => column.values.length !== n)) {
      throw new Error(`linear-regression: expected predictors with ${n} values each`);
    }
    const k = options.intercept ? 1 : 0;
    const residualDf = n - p - k;
    if (residualDf < 1) {
      throw new MethodError(
        `Linear regression with ${p} predictor${p > 1 ? 's' : ''}${k ? ' and an intercept' : ''} needs at least ${p + k + 1} complete rows, but the data have ${n}.`,
        'Collect more rows, use fewer predictors, or check the where filter and missing values.',
      );
    }
    const fit = fitModel(x, y, options.intercept);
    const sse = sumOfSquares(fit.residuals);
    // An exact fit leaves only rounding, residuals of order ε‖y‖, so SSE/SST ≈ nε² ≈ 1e-30.
    if (!(sse > EXACT_FIT * fit.total)) {
      throw new MethodError(
        `The predictors fit ${y.label} exactly (the residuals are rounding error), so there is no error variance to test against.`,
        'Check that y is not computed from the predictors.',
      );
    }
    const sigma = Math.sqrt(sse / residualDf);
    const tQuantile = -studentTQuantile((1 - options.confidence) / 2, residualDf);
    const coefficients = fit.terms.map((term, i) => {
      const estimate = fit.estimates[i]!;
      const se = sigma * fit.unscaledSe[i]!;
      const t = estimate / se;
      return {term, estimate, se, t, p: tPValue(t, residualDf, 'two-sided'), ci: [estimate - tQuantile * se, estimate + tQuantile * se]};
    });
    const ssr = fit.explained;
    const rSquared = 1 - sse / fit.total;
    const f = ssr / p / (sse / residualDf);
    const slope = coefficients[k]!;
    const slopeTest = tInference({
      estimate: slope.estimate,
      se: slope.se,
      df: residualDf,
      nullValue: 0,
      alternative: options.alternative,
      confidence: options.confidence,
    });
    const oneSided = options.alternative !== 'two-sided';
    return {
      statistic: oneSided ? {name: 't', value: slopeTest.t} : {name: 'F', value: f},
      df: oneSided ? residualDf : [p, residualDf],
      p: oneSided ? slopeTest.p : fSf(f, p, residualDf),
      estimate: {name: `slope of ${y.label} on ${x[0]!.label}`, value: slope.estimate, ci: slopeTest.ci, level: options.confidence},
      effect: {name: 'r-squared', value: rSquared, ci: rSquaredInterval(f, p, residualDf, n, options.confidence)},
      variant: variant(options),
      details: {
        coefficients,
        r_squared: rSquared,
        adjusted_r_squared: 1 - ((sse / fit.total) * (n - k)) / residualDf,
        residual_sd: sigma,
        anova_table: {
          regression: {ss: ssr, df: p, ms: ssr / p},
          residual: {ss: sse, df: residualDf, ms: sse / residualDf},
        },
      },
    };
  },
};

function variant(options: MethodOptions): string {
  const test = options.alternative === 'two-sided' ? 'F test' : 'one-sided t test of the first slope';
  return options.intercept ? test : `${test}, no intercept (uncentred R²)`;
}

interface Fit {
  readonly terms: readonly string[];
  readonly estimates: readonly number[];
  /** Standard errors divided by the residual SD. */
  readonly unscaledSe: readonly number[];
  readonly residuals: Float64Array;
  /** Regression sum of squares (centred with an intercept). */
  readonly explained: number;
  /** SST (centred with an intercept, Σy² without). */
  readonly total: number;
}

function fitModel(x: readonly Sample[], y: Sample, intercept: boolean): Fit {
  const n = y.values.length;
  const means = intercept ? x.map((column) => accurateMean(column.values)) : x.map(() => 0);
  const yMean = intercept ? accurateMean(y.values) : 0;
  const columns = x.map((column, j) => column.values.map((value) => value - means[j]!));
  const response = y.values.map((value) => value - yMean);
  const total = sumOfSquares(response);
  if (!(total > 0)) {
    throw new MethodError(
      `${y.label} is ${intercept ? 'constant' : 'zero in every row'}, so there is nothing for the predictors to explain.`,
      'Check the column and the where filter.',
    );
  }
  const qr = qrLeastSquares(columns, response);
  if (qr.kind === 'collinear') throw collinear(x, qr.column, intercept);
  const rowNorm = (row: Float64Array) => Math.sqrt(sumOfSquares(row));
  const slopeSe = qr.rInverse.map(rowNorm);
  const slopes = Array.from(qr.coefficients);
  if (!intercept) {
    return {terms: x.map((c) => c.label), estimates: slopes, unscaledSe: slopeSe, residuals: qr.residuals, explained: qr.explainedSumOfSquares, total};
  }
  // Var(b0)/σ² = 1/n + x̄'(X_cᵀX_c)⁻¹x̄ = 1/n + ‖R⁻ᵀx̄‖², and R⁻ᵀx̄ = column sums of R⁻¹ weighted by x̄.
  const w = new Float64Array(x.length);
  qr.rInverse.forEach((row, i) => row.forEach((value, j) => (w[j] = w[j]! + value * means[i]!)));
  const b0 = yMean - slopes.reduce((sum, b, j) => sum + b * means[j]!, 0);
  return {
    terms: ['(intercept)', ...x.map((c) => c.label)],
    estimates: [b0, ...slopes],
    unscaledSe: [Math.sqrt(1 / n + sumOfSquares(w)), ...slopeSe],
    residuals: qr.residuals,
    explained: qr.explainedSumOfSquares,
    total,
  };
}

function collinear(x: readonly Sample[], column: number, intercept: boolean): MethodError {
  const {label, values} = x[column]!;
  const hint = 'Remove one of the collinear predictors, or centre or rescale a polynomial or time term.';
  if (intercept && values.every((value) => value === values[0])) {
    return new MethodError(`Predictor ${label} is constant, so its slope cannot be estimated beside the intercept.`, hint);
  }
  if (!intercept && values.every((value) => value === 0)) {
    return new MethodError(`Predictor ${label} is zero in every row, so its slope cannot be estimated.`, hint);
  }
  const others = column > 0 ? `the predictors before it${intercept ? ' and the intercept' : ''}` : 'the intercept';
  return new MethodError(
    `Predictor ${label} is (almost) a linear combination of ${others}, so the coefficients cannot be told apart.`,
    hint,
  );
}
