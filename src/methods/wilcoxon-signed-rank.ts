import {MethodError} from './method-error.js';
import {atMost, exactCriticalCount, exactTails} from './shared/exact-tails.js';
import {medianOf, orderStatisticInterval, walshAverages} from './shared/hodges-lehmann.js';
import {midRanks} from './shared/mid-ranks.js';
import {normalCriticalCount, normalTails, tieSum} from './shared/normal-tails.js';
import {pairedDifferences} from './shared/paired-differences.js';
import {rankBiserial} from './shared/rank-biserial.js';
import {selectKth} from './shared/select-kth.js';
import {sidedP, tailAlpha, type Tails} from './shared/sided-p.js';
import {signedRankPmf} from './shared/signed-rank-distribution.js';
import type {MethodDefinition, MethodNote, PairedDesign} from './types.js';

/**
 * Wilcoxon signed-rank test on the paired differences `second - first`
 * (Wilcoxon 1945, Biometrics Bulletin 1:80–83; Hollander, Wolfe & Chicken
 * 2014, "Nonparametric Statistical Methods", 3rd ed., §3.1), against a
 * centre of `mu` (default 0).
 *
 * Zero differences are dropped before ranking (Wilcoxon's convention, as R
 * and scipy's default) and counted in `details.zero_differences`. Statistic:
 * V = T+, the sum of the ranks of |d| over the positive differences, as R
 * prints it for every alternative (scipy's two-sided statistic is
 * min(T+, T-)). `greater` means the differences tend to be positive.
 *
 * p-value: exact (`signedRankPmf`) when there are no zero differences, no
 * ties among |d| and n ≤ 500 (2e7 additions); otherwise the normal
 * approximation with σ² = n(n+1)(2n+1)/24 - Σ(t³-t)/48 and a continuity
 * correction of ½. Ties and zeros are judged on the decimal data
 * (`pairedDifferences`), not on the rounding noise of their doubles.
 *
 * Estimate: the Hodges–Lehmann centre of the differences, the median of
 * their Walsh averages, with Tukey's interval between order statistics of
 * the Walsh averages (§3.2–3.3; Bauer 1972, JASA 67:687–690); critical
 * values exact when the test is exact, else the normal approximation. The
 * estimate uses every difference, zeros included: dropping zeros is a
 * convention of the test, and would pull the estimate away from 0 (R drops
 * them in its approximate interval).
 *
 * Effect: the matched-pairs rank-biserial correlation (T+ - T-)/(T+ + T-),
 * see `rankBiserial`.
 */
const EXACT_MAX_N = 500;

export const wilcoxonSignedRank: MethodDefinition<PairedDesign> = {
  id: 'wilcoxon-signed-rank',
  title: 'Wilcoxon signed-rank test',
  design: 'paired',
  compute({first, second}, options) {
    const {raw, centred} = pairedDifferences(first, second, options.mu);
    const nonzero = centred.filter((d) => d !== 0);
    const n = nonzero.length;
    const zeros = centred.length - n;
    if (n === 0) {
      throw new MethodError(
        centred.length === 0
          ? `There are no pairs of ${first.label} and ${second.label}.`
          : `Every difference ${second.label} - ${first.label} equals ${options.mu}; the signed-rank test has nothing to rank.`,
        'The Wilcoxon signed-rank test needs at least one pair whose difference is not the null value.',
      );
    }
    const {ranks, ties: tieSizes} = midRanks(nonzero.map(Math.abs));
    let vPlus = 0;
    for (let i = 0; i < n; i++) if (nonzero[i]! > 0) vPlus += ranks[i]!;
    const rankTotal = (n * (n + 1)) / 2;
    const exact = zeros === 0 && tieSizes.length === 0 && n <= EXACT_MAX_N;
    const pmf = exact ? signedRankPmf(n) : undefined;
    let tails: Tails;
    let z: number | undefined;
    if (pmf) {
      tails = exactTails(pmf, vPlus);
    } else {
      const sd = Math.sqrt((n * (n + 1) * (2 * n + 1)) / 24 - tieSum(tieSizes) / 48);
      const normal = normalTails(vPlus, rankTotal / 2, sd);
      tails = normal;
      z = normal.z;
    }

    // The interval uses all N differences; with the test exact, N = n.
    const all = raw.length;
    const walshCount = (all * (all + 1)) / 2;
    const alphaTail = tailAlpha(options.alternative, options.confidence);
    const k = pmf
      ? exactCriticalCount(pmf, alphaTail)
      : normalCriticalCount(walshCount, Math.sqrt((all * (all + 1) * (2 * all + 1)) / 24), alphaTail);
    const walsh = walshAverages(raw);
    const ci = orderStatisticInterval((i) => selectKth(walsh, i), walshCount, k, options.alternative);
    const achieved = pmf && k > 0 ? 1 - (options.alternative === 'two-sided' ? 2 : 1) * atMost(pmf, k - 1) : null;

    const warnings: MethodNote[] = [];
    if (zeros > 0) {
      warnings.push({kind: 'dropped-zeros', zeros, pairs: all, second: second.label, first: first.label, mu: options.mu, wilcoxon: true});
    }
    if (!exact && n <= EXACT_MAX_N) {
      warnings.push({kind: 'ties-approximation', tied: zeros > 0 ? 'zero differences' : 'differences'});
    }
    if (k === 0) {
      warnings.push({kind: 'unattainable-interval', confidence: options.confidence, estimate: 'shift', pairs: all});
    }
    return {
      statistic: {name: 'V', value: vPlus},
      df: null,
      p: sidedP(tails, options.alternative),
      estimate: {
        name: `Hodges–Lehmann shift (${second.label} - ${first.label})`,
        value: medianOf(walsh),
        ci,
        level: options.confidence,
      },
      effect: rankBiserial({
        r: (vPlus - (rankTotal - vPlus)) / rankTotal,
        sd: Math.sqrt((n * (n + 1) * (2 * n + 1)) / 6) / rankTotal,
        halfStep: 1 / rankTotal,
        alternative: options.alternative,
        confidence: options.confidence,
      }),
      variant: exact ? 'exact' : 'normal approximation with tie and continuity correction',
      ...(warnings.length > 0 ? {warnings} : {}),
      details: {
        zero_differences: zeros,
        v_minus: rankTotal - vPlus,
        ...(z === undefined ? {} : {z}),
        ci_achieved_level: achieved,
      },
    };
  },
};
