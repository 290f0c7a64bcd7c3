/**
 * Mid-ranks (average ranks for ties, 1-based) of a sample, and the sizes of
 * its tie groups, as used by Spearman's rho (Kendall & Gibbons 1990, "Rank
 * Correlation Methods", 5th ed., §3.8) and the tie corrections of rank
 * tests. Ties are exact equality of the doubles.
 *
 * @example midRanks(Float64Array.of(3, 1, 3)).ranks // [2.5, 1, 2.5]
 */
export interface MidRanks {
  readonly ranks: Float64Array;
  /** Size of every tie group with more than one member. */
  readonly ties: readonly number[];
}

export function midRanks(values: Float64Array): MidRanks {
  const n = values.length;
  const order = Array.from({length: n}, (_, i) => i).sort((a, b) => values[a]! - values[b]!);
  const ranks = new Float64Array(n);
  const ties: number[] = [];
  for (let start = 0; start < n; ) {
    let end = start + 1;
    while (end < n && values[order[end]!] === values[order[start]!]) end++;
    // Positions start..end-1 share the average of ranks start+1..end.
    const rank = (start + 1 + end) / 2;
    for (let k = start; k < end; k++) ranks[order[k]!] = rank;
    if (end - start > 1) ties.push(end - start);
    start = end;
  }
  return {ranks, ties};
}
