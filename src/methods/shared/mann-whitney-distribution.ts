import {symmetrize} from './symmetrize.js';

/**
 * Exact null distribution of the Mann–Whitney U statistic for group sizes
 * m and n without ties: `pmf[u]` = P(U = u), u = 0..mn, where U counts the
 * pairs in which the second group's value is the larger.
 *
 * The recurrence of Mann & Whitney (1947), "On a test of whether one of two
 * random variables is stochastically larger than the other", Ann. Math.
 * Statist. 18:50–60, written in probabilities rather than counts: the
 * largest of the m + n values belongs to the second group with probability
 * n/(m + n) and then beats all m values of the first group, so
 *
 *   p(m, n; u) = n/(m+n) · p(m, n-1; u - m) + m/(m+n) · p(m-1, n; u).
 *
 * Every term is positive, so each probability keeps its relative accuracy
 * (about (m + n) roundings), tails included; counts would overflow 2^53 past
 * m = n = 28. Work is about m²n²/4 additions (6e6 at m = n = 50).
 */
export function mannWhitneyPmf(m: number, n: number): Float64Array {
  if (!(Number.isInteger(m) && Number.isInteger(n) && m >= 0 && n >= 0)) {
    throw new Error(`mannWhitneyPmf: group sizes must be non-negative integers, got ${m} and ${n}`);
  }
  // U for (m, n) and for (n, m) have the same distribution (it is symmetric
  // about mn/2); keeping the smaller size inner keeps the rows short.
  const outer = Math.max(m, n);
  const inner = Math.min(m, n);
  // rows[j] holds the pmf for (i, j), updated in place as i grows; each row
  // is allocated at its final length, zeros beyond the current support.
  const rows = Array.from({length: inner + 1}, (_, j) => new Float64Array(outer * j + 1));
  for (const row of rows) row[0] = 1; // i = 0: U = 0
  for (let i = 1; i <= outer; i++) {
    for (let j = 1; j <= inner; j++) {
      const row = rows[j]!; // (i - 1, j) before the update, (i, j) after
      const below = rows[j - 1]!; // already (i, j - 1)
      const fromOuter = i / (i + j); // largest value in the outer group: adds 0
      const fromInner = j / (i + j); // largest value in the inner group: adds i
      const top = i * j;
      for (let u = top; u >= i; u--) row[u] = fromOuter * row[u]! + fromInner * below[u - i]!;
      for (let u = i - 1; u >= 0; u--) row[u] = fromOuter * row[u]!;
    }
  }
  return symmetrize(rows[inner]!);
}

