/**
 * Exact permutation distribution of Spearman's rho for n ≤ 10 pairs: every
 * one of the n! pairings of the y-ranks with the x-ranks is enumerated by
 * Heap's algorithm (Heap 1963, The Computer Journal 6(3):293–294), each
 * permutation one swap away from the last, so the statistic Σ a_i·b_π(i)
 * (monotone in rho) is updated in O(1). With mid-ranks the enumeration is
 * the permutation distribution conditional on the tie pattern. Ranks are
 * doubled so that mid-ranks are integers and every comparison is exact.
 *
 * Tail probabilities are counts over n! (at most 3 628 800), hence exact
 * rationals rounded once.
 */
export const SPEARMAN_EXACT_MAX_N = 10;

export interface PermutationTails {
  /** P(rho ≥ observed) under random pairing. */
  readonly greater: number;
  /** P(rho ≤ observed). */
  readonly less: number;
}

export function spearmanExactTails(xRanks: Float64Array, yRanks: Float64Array): PermutationTails {
  const n = xRanks.length;
  if (yRanks.length !== n || n > SPEARMAN_EXACT_MAX_N) {
    throw new Error(`spearmanExactTails: needs equal lengths of at most ${SPEARMAN_EXACT_MAX_N}, got ${n} and ${yRanks.length}`);
  }
  const a = Int32Array.from(xRanks, (r) => Math.round(2 * r));
  const b = Int32Array.from(yRanks, (r) => Math.round(2 * r));
  let observed = 0;
  for (let i = 0; i < n; i++) observed += a[i]! * b[i]!;
  let sum = observed;
  let atLeast = 1;
  let atMost = 1;
  let total = 1;
  const c = new Int32Array(n);
  for (let i = 1; i < n; ) {
    if (c[i]! < i) {
      const j = i % 2 === 0 ? 0 : c[i]!;
      // Swapping b[i] and b[j] changes the sum by (a_j − a_i)(b_i − b_j).
      const bi = b[i]!;
      const bj = b[j]!;
      sum += (a[j]! - a[i]!) * (bi - bj);
      b[i] = bj;
      b[j] = bi;
      total++;
      if (sum >= observed) atLeast++;
      if (sum <= observed) atMost++;
      c[i]!++;
      i = 1;
    } else {
      c[i] = 0;
      i++;
    }
  }
  return {greater: atLeast / total, less: atMost / total};
}
