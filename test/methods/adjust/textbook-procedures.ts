/**
 * The five procedures as their papers state them: a set of rejected
 * hypotheses at level α, found by walking the sorted p-values and comparing
 * each with its critical value (division form, no adjusted p-values). The
 * property tests check that "adjusted p ≤ α" rejects exactly this set,
 * which ties each adjusted-value formula back to its published procedure.
 */
export type Procedure = 'bonferroni' | 'holm' | 'hochberg' | 'bh' | 'by';

export function rejectedAt(procedure: Procedure, p: readonly number[], alpha: number): boolean[] {
  const m = p.length;
  const order = p.map((_, i) => i).sort((a, b) => p[a]! - p[b]!);
  const sorted = order.map((i) => p[i]!);
  const count = rejectedCount(procedure, sorted, alpha);
  const rejected = new Array<boolean>(m).fill(false);
  // Ties straddling the cut are all rejected or all kept: the critical
  // values are monotone, so the largest rejected p decides.
  const cutoff = count === 0 ? -Infinity : sorted[count - 1]!;
  p.forEach((value, i) => (rejected[i] = value <= cutoff));
  return rejected;
}

function rejectedCount(procedure: Procedure, sorted: readonly number[], alpha: number): number {
  const m = sorted.length;
  switch (procedure) {
    case 'bonferroni': // Dunn (1961): each test at α/m
      return sorted.filter((value) => value <= alpha / m).length;
    case 'holm': {
      // Holm (1979): step down while p_(j) ≤ α/(m − j + 1)
      let j = 0;
      while (j < m && sorted[j]! <= alpha / (m - j)) j++;
      return j;
    }
    case 'hochberg': // Hochberg (1988): largest k with p_(k) ≤ α/(m − k + 1)
      return largestK(sorted, (k) => alpha / (m - k + 1));
    case 'bh': // Benjamini & Hochberg (1995): largest k with p_(k) ≤ kα/m
      return largestK(sorted, (k) => (k * alpha) / m);
    case 'by': {
      // Benjamini & Yekutieli (2001), Theorem 1.3: BH at α / Σ 1/i
      let c = 0;
      for (let i = 1; i <= m; i++) c += 1 / i;
      return largestK(sorted, (k) => (k * alpha) / (m * c));
    }
  }
}

function largestK(sorted: readonly number[], critical: (k: number) => number): number {
  for (let k = sorted.length; k >= 1; k--) if (sorted[k - 1]! <= critical(k)) return k;
  return 0;
}
