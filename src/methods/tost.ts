import {studentTCdf, studentTQuantile, studentTSf} from '../distributions/student-t.js';
import {MethodError} from './method-error.js';
import {summarize} from './shared/summarize.js';
import {pooledHedgesG, welchStandardError} from './shared/two-group-t.js';
import type {MethodDefinition, TwoGroupDesign} from './types.js';

/**
 * Equivalence of two means by two one-sided tests (TOST; Schuirmann 1987,
 * "A comparison of the two one-sided tests procedure and the power approach
 * for assessing the equivalence of average bioavailability", J.
 * Pharmacokinet. Biopharm. 15(6):657–680), each a Welch t test (Welch 1947)
 * against one end of the equivalence margin ±δ, δ = `smallest-effect`:
 *
 *   lower: H0 Δ ≤ −δ, t_L = (Δ̂ + δ)/se, p_L = P(T > t_L);
 *   upper: H0 Δ ≥ +δ, t_U = (Δ̂ − δ)/se, p_U = P(T < t_U);
 *
 * with Δ = second − first, the Welch–Satterthwaite df, and p = max(p_L, p_U).
 * Equivalence is shown at level α exactly when the 1 − 2α interval lies
 * inside (−δ, δ) (Schuirmann 1987), so that interval is the estimate’s;
 * the interval at the block's confidence is in `details.ci_confidence`.
 * The reported statistic is the t of the binding (larger-p) test. Hedges' g
 * is computed as in `welch-t` (pooled standardizer, two-sided interval at
 * the block's confidence).
 *
 * @example NCSS yield data, δ = 110, α = 0.025: t(19.169) = 1.9002, p = 0.03628.
 */
export const tost: MethodDefinition<TwoGroupDesign> = {
  id: 'tost',
  title: 'two one-sided tests (TOST)',
  design: 'two-group',
  question: 'equivalence',
  needsSmallestEffect: true,
  compute({first, second}, options) {
    const delta = validMargin(options.smallestEffect);
    if (options.alternative !== 'two-sided') {
      throw new MethodError(
        `the equivalence test is two-sided by construction; \`alternative: ${options.alternative}\` does not apply`,
        'Remove `alternative` from the block; a one-sided margin is a non-inferiority test, which stet does not offer.',
      );
    }
    if (!(options.alpha > 0 && options.alpha < 0.5)) {
      throw new MethodError(`the equivalence test needs alpha below 0.5 (its interval has level 1 − 2α); alpha is ${options.alpha}`, 'Declare a smaller `alpha`.');
    }
    const a = summarize(first.values);
    const b = summarize(second.values);
    for (const [label, s] of [[first.label, a], [second.label, b]] as const) {
      if (s.n < 2) throw new MethodError(`the equivalence test needs at least two values per group; "${label}" has ${s.n}`, 'Check `where`, the levels and missing values in the data.');
    }
    const {se, df} = welchStandardError(a, b);
    if (!(se > 0)) throw new MethodError('both groups are constant, so their difference has no standard error', 'Check the data: equivalence cannot be tested without variation.');
    const difference = b.mean - a.mean;
    const tLower = (difference + delta) / se;
    const tUpper = (difference - delta) / se;
    const lower = {t: tLower, df, p: studentTSf(tLower, df)};
    const upper = {t: tUpper, df, p: studentTCdf(tUpper, df)};
    const binding = lower.p >= upper.p ? lower : upper;
    const interval = (tail: number): [number, number] => {
      // −t_{tail} rather than t_{1−tail}: a small tail keeps its digits.
      const half = -studentTQuantile(tail, df) * se;
      return [difference - half, difference + half];
    };
    return {
      statistic: {name: 't', value: binding.t},
      df,
      p: binding.p,
      estimate: {
        name: `difference in means (${second.label} - ${first.label})`,
        value: difference,
        ci: interval(options.alpha),
        level: 1 - 2 * options.alpha,
      },
      effect: pooledHedgesG(a, b, 'two-sided', options.confidence),
      variant: 'two one-sided Welch t tests',
      details: {
        bounds: [-delta, delta],
        lower_test: lower,
        upper_test: upper,
        ci_confidence: interval((1 - options.confidence) / 2),
      },
    };
  },
};

function validMargin(smallestEffect: number | undefined): number {
  if (smallestEffect === undefined || !(smallestEffect > 0) || !Number.isFinite(smallestEffect)) {
    throw new MethodError(
      `the equivalence test needs a positive \`smallest-effect\` (the margin ±δ); got ${String(smallestEffect)}`,
      'Declare `smallest-effect:` as the largest difference, in the outcome’s units, that still counts as equivalent.',
    );
  }
  return smallestEffect;
}
