import {studentizedRangeQuantile, studentizedRangeSf} from '../../distributions/studentized-range.js';
import {MethodError} from '../method-error.js';
import {accurateMean, sampleVariance} from '../shared/summarize.js';
import type {PosthocComparison, Sample} from '../types.js';
import {checkGroups, pairs} from './pairs.js';

/**
 * The Games–Howell procedure: all pairs of k groups without assuming equal
 * variances or sizes (Games & Howell 1976, "Pairwise multiple comparison
 * procedures with unequal n's and/or variances: a Monte Carlo study",
 * J. Educational Statistics 1:113-125). Each pair has its own Welch
 * standard error se = √(s_a²/n_a + s_b²/n_b) and Welch–Satterthwaite df
 *
 *   ν = (v_a + v_b)² / (v_a²/(n_a-1) + v_b²/(n_b-1)),  v = s²/n,
 *
 * and is referred to the studentized range for k means on ν df:
 * q = √2 |ȳ_b - ȳ_a| / se, p = P(Q_{k,ν} > q), simultaneous interval
 * (ȳ_b - ȳ_a) ± q_{conf; k, ν} · se / √2. `statistic` is q ≥ 0; the
 * direction is in `estimate` (b - a). ν is not an integer, and small
 * groups give small ν, where the studentized range needs care
 * (studentized-range.ts is accurate for any real ν > 0). Checked against
 * the formula evaluated with scipy's studentized range (11-15 digits) and,
 * for k = 2, against Welch's t test (test/methods/posthoc/games-howell.test.ts).
 */
export function gamesHowell(samples: readonly Sample[], confidence: number): PosthocComparison[] {
  checkGroups(samples, confidence, 2, 'The Games–Howell procedure');
  const k = samples.length;
  const n = samples.map((s) => s.values.length);
  const means = samples.map((s) => accurateMean(s.values));
  const v = samples.map((s, i) => sampleVariance(s.values, means[i]) / n[i]!);
  const critical = new Map<number, number>(); // one quantile per distinct df
  return pairs(k).map(([i, j]) => {
    const [va, vb] = [v[i]!, v[j]!];
    if (!(va + vb > 0)) {
      throw new MethodError(
        `The Games–Howell procedure needs variation within groups, but groups ${samples[i]!.label} ` +
          `and ${samples[j]!.label} are both constant.`,
        'Check the data; two constant groups have no standard error to compare them with.',
      );
    }
    const difference = means[j]! - means[i]!;
    const se = Math.sqrt(va + vb);
    const df = (va + vb) ** 2 / (va ** 2 / (n[i]! - 1) + vb ** 2 / (n[j]! - 1));
    let qCritical = critical.get(df);
    if (qCritical === undefined) {
      qCritical = studentizedRangeQuantile(confidence, k, df);
      critical.set(df, qCritical);
    }
    const half = (qCritical * se) / Math.SQRT2;
    const q = (Math.SQRT2 * Math.abs(difference)) / se;
    return {
      a: samples[i]!.label,
      b: samples[j]!.label,
      estimate: difference,
      ci: [difference - half, difference + half],
      statistic: q,
      p_adjusted: studentizedRangeSf(q, k, df),
    };
  });
}
