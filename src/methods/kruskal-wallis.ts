import {chiSquareSf} from '../distributions/chi-square.js';
import {MethodError} from './method-error.js';
import {medianOf, orderStatisticInterval, pairwiseDifferences} from './shared/hodges-lehmann.js';
import {requireGroups, requireTwoSided} from './shared/k-group-checks.js';
import {midRanks} from './shared/mid-ranks.js';
import {normalCriticalCount, tieSum} from './shared/normal-tails.js';
import {selectKth} from './shared/select-kth.js';
import type {Estimate, KGroupDesign, MethodDefinition, MethodNote, MethodOptions, Sample} from './types.js';

/**
 * The Kruskal–Wallis H test (Kruskal & Wallis 1952, JASA 47:583): all N
 * observations ranked together, tied values given their mean rank,
 *
 *   H = 12/(N(N+1)) Σ nᵢ(R̄ᵢ - (N+1)/2)²,  divided by  1 - Σ(t³-t)/(N³-N)
 *
 * for ties (t values tied at each distinct value),
 * referred to the chi-square distribution on k - 1 df. The centred form of
 * the sum avoids the cancellation of Σ Rᵢ²/nᵢ - 3(N+1). The chi-square
 * approximation is used at every n (the result's `variant` says so); a
 * warning marks groups under 5 observations, where it is rough.
 *
 * Effect: ε² = H/(N - 1) (Tomczak & Tomczak 2014, Trends Sport
 * Sci. 21:19, eq. 2), reported in `details.epsilon_squared` without an
 * interval: no deterministic interval for it is established (the usual one
 * is a bootstrap), and `EffectSize.ci` cannot be empty.
 *
 * Estimate: the Hodges–Lehmann shift between the groups with the highest
 * and lowest mean rank (the median of their pairwise differences), with
 * Moses' interval from the normal approximation (the Mann–Whitney helpers:
 * `normalCriticalCount`, Hollander, Wolfe & Chicken 2014, §4.3) at error
 * rate (1 - confidence)/(k(k-1)/2), Bonferroni over all pairs, since the
 * pair is chosen from the data. With two groups this is the Mann–Whitney
 * interval of its normal branch.
 *
 * @example Hollander & Wolfe (1973, p. 116) mucociliary data: H = 0.7714, df = 2, p = 0.680
 */
export const kruskalWallis: MethodDefinition<KGroupDesign> = {
  id: 'kruskal-wallis',
  title: 'Kruskal–Wallis test',
  design: 'k-group',
  compute({samples}, options) {
    requireTwoSided(options.alternative, 'Kruskal–Wallis test');
    requireGroups(samples, 'Kruskal–Wallis test');
    const {meanRanks, ties, total} = rankGroups(samples);
    const correction = 1 - ties / (total ** 3 - total);
    if (!(correction > 0)) {
      throw new MethodError('Every observation has the same value, so there is nothing to rank.', 'Check the outcome column.');
    }
    const centre = (total + 1) / 2;
    let sum = 0;
    samples.forEach((s, i) => (sum += s.values.length * (meanRanks[i]! - centre) ** 2));
    const h = ((12 / (total * (total + 1))) * sum) / correction;
    const k = samples.length;
    const shift = extremeShift(samples, meanRanks, options);
    const warnings: MethodNote[] = [];
    const small = samples.filter((s) => s.values.length < 5).map((s) => s.label);
    if (small.length > 0) {
      warnings.push({kind: 'small-groups', groups: small});
    }
    if (shift.ci[0] === -Infinity) {
      warnings.push({kind: 'unattainable-interval', confidence: options.confidence, estimate: 'simultaneous shift'});
    }
    return {
      statistic: {name: 'H', value: h},
      df: k - 1,
      p: chiSquareSf(h, k - 1),
      variant: ties > 0 ? 'chi-square approximation with tie correction' : 'chi-square approximation',
      estimate: shift,
      // No deterministic interval for ε² is established (the usual one is a
      // bootstrap), so the effect is reported without one rather than with a guess.
      effect: {name: 'epsilon-squared', value: h / (total - 1), ci: null},
      warnings,
      details: {
        mean_ranks: Object.fromEntries(samples.map((s, i) => [s.label, meanRanks[i]!])),
        tie_correction: correction,
      },
    };
  },
};

/** Hodges–Lehmann shift between the highest and lowest mean-rank groups, Bonferroni–Moses interval. */
function extremeShift(samples: readonly Sample[], meanRanks: readonly number[], options: MethodOptions): Estimate {
  let low = 0;
  let high = 0;
  meanRanks.forEach((r, i) => {
    if (r < meanRanks[low]!) low = i;
    if (r > meanRanks[high]!) high = i;
  });
  // All mean ranks equal: any pair will do; take the first two.
  if (low === high) high = low === 0 ? 1 : 0;
  const [a, b] = [samples[low]!, samples[high]!];
  const k = samples.length;
  const count = a.values.length * b.values.length;
  const sd = Math.sqrt((count * (a.values.length + b.values.length + 1)) / 12);
  const alphaTail = (1 - options.confidence) / (k * (k - 1));
  const differences = pairwiseDifferences(a.values, b.values);
  const critical = normalCriticalCount(count, sd, alphaTail);
  return {
    pair: [a.label, b.label],
    name: `Hodges–Lehmann shift (${b.label} - ${a.label})`,
    value: medianOf(differences),
    ci: orderStatisticInterval((i) => selectKth(differences, i), count, critical, 'two-sided'),
    level: options.confidence,
  };
}

interface RankedGroups {
  readonly meanRanks: number[];
  /** Σ(t³ - t) over groups of tied values. */
  readonly ties: number;
  readonly total: number;
}

/** Mean rank of each group among all observations, ties at their midrank. */
function rankGroups(samples: readonly Sample[]): RankedGroups {
  const total = samples.reduce((n, s) => n + s.values.length, 0);
  const pooled = new Float64Array(total);
  let offset = 0;
  for (const s of samples) {
    pooled.set(s.values, offset);
    offset += s.values.length;
  }
  const {ranks, ties} = midRanks(pooled);
  offset = 0;
  const meanRanks = samples.map((s) => {
    let sum = 0;
    for (let i = 0; i < s.values.length; i++) sum += ranks[offset + i]!;
    offset += s.values.length;
    return sum / s.values.length;
  });
  return {meanRanks, ties: tieSum(ties), total};
}
