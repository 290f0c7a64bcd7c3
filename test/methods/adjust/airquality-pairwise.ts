import tCdf from '@stdlib/stats-base-dists-t-cdf';
import {airquality} from './reference-values.js';

/**
 * Raw two-sided p-values of the 10 pairwise t tests in
 * shared/reference/examples/p_adjust_holm_bonferroni--r-pairwise-t-airquality.json,
 * recomputed from its data so the Holm and Bonferroni checks start from the
 * same unadjusted values R adjusted. The t tail comes straight from
 * @stdlib (used here only as a test oracle, not by stet's method code).
 *
 * - pooled: R's pool.sd = TRUE, s_p² from all 5 months, df = N − k (file `notes`);
 * - welch: per-pair Welch t with Welch–Satterthwaite df.
 */
export function airqualityPairwiseP(kind: 'pooled' | 'welch'): number[] {
  const months = Object.values(airquality.ozone).map(summarize);
  const byName = new Map(Object.keys(airquality.ozone).map((name, index) => [name, months[index]!]));
  const n = months.reduce((total, month) => total + month.n, 0);
  const pooledDf = n - months.length;
  const pooledVariance = months.reduce((total, month) => total + (month.n - 1) * month.variance, 0) / pooledDf;
  return airquality.pairs.map((pair) => {
    const [later, earlier] = pair.split('-').map((name) => byName.get(name)!);
    const a = later!;
    const b = earlier!;
    const diff = a.mean - b.mean;
    if (kind === 'pooled') {
      const se = Math.sqrt(pooledVariance * (1 / a.n + 1 / b.n));
      return twoSided(diff / se, pooledDf);
    }
    const va = a.variance / a.n;
    const vb = b.variance / b.n;
    const df = (va + vb) ** 2 / (va ** 2 / (a.n - 1) + vb ** 2 / (b.n - 1));
    return twoSided(diff / Math.sqrt(va + vb), df);
  });
}

function twoSided(t: number, df: number): number {
  return Math.min(1, 2 * tCdf(-Math.abs(t), df));
}

function summarize(values: readonly number[]): {n: number; mean: number; variance: number} {
  const n = values.length;
  const mean = values.reduce((a, b) => a + b, 0) / n;
  const variance = values.reduce((total, x) => total + (x - mean) ** 2, 0) / (n - 1);
  return {n, mean, variance};
}
