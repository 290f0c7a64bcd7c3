import type {Alternative, EffectSize, MethodOptions, MethodOutcome, TwoGroupDesign} from '../types.js';
import {hedgesG} from './hedges-g.js';
import {pooledSd} from './pooled-sd.js';
import {summarize, type Summary} from './summarize.js';
import {tInference} from './t-inference.js';
import {tSensitivity} from './t-sensitivity.js';

/**
 * Pieces every two-group t test shares (Student's, Welch's, TOST), so the
 * three report the same effect size and the Welch computation lives once.
 */

/** Welch's standard error of m2 − m1 and its Welch–Satterthwaite df (Welch 1947; Satterthwaite 1946). */
export function welchStandardError(a: Summary, b: Summary): {readonly se: number; readonly df: number} {
  const va = a.sd ** 2 / a.n;
  const vb = b.sd ** 2 / b.n;
  return {se: Math.sqrt(va + vb), df: (va + vb) ** 2 / (va ** 2 / (a.n - 1) + vb ** 2 / (b.n - 1))};
}

/**
 * Hedges' g of m2 − m1 with the pooled-SD standardizer; its interval inverts
 * the pooled t on n1 + n2 − 2 df, whichever test the block runs, so the
 * effect size means the same thing in every two-group block.
 */
export function pooledHedgesG(a: Summary, b: Summary, alternative: Alternative, confidence: number): EffectSize {
  const sp = pooledSd(a, b);
  const scale = Math.sqrt(1 / a.n + 1 / b.n);
  const difference = b.mean - a.mean;
  return hedgesG({
    d: difference / sp,
    t: difference / (sp * scale),
    df: a.n + b.n - 2,
    scale,
    alternative,
    confidence,
    standardizer: 'pooled standard deviation',
  });
}

/**
 * A two-group t test of m2 − m1 against 0, given the test's standard error
 * and df (pooled for Student's, Welch's for Welch's): t, p, the difference
 * with its interval, the pooled Hedges' g, and sensitivity on that se and df.
 */
export function twoGroupTOutcome(
  {first, second}: TwoGroupDesign,
  options: MethodOptions,
  standardError: (a: Summary, b: Summary) => {readonly se: number; readonly df: number},
): MethodOutcome {
  const a = summarize(first.values);
  const b = summarize(second.values);
  const {se, df} = standardError(a, b);
  const difference = b.mean - a.mean;
  const {alternative, confidence} = options;
  const inference = tInference({estimate: difference, se, df, nullValue: 0, alternative, confidence});
  return {
    statistic: {name: 't', value: inference.t},
    df,
    p: inference.p,
    estimate: {name: `difference in means (${second.label} - ${first.label})`, value: difference, ci: inference.ci, level: confidence},
    effect: pooledHedgesG(a, b, alternative, confidence),
    sensitivity: tSensitivity({ncpPerUnit: 1 / se, df, alpha: options.alpha, alternative, smallestEffect: options.smallestEffect}),
  };
}
