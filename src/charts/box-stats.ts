/** What a box plot draws for one group: Tukey's five numbers with 1.5 × IQR whiskers. */
export interface BoxStats {
  readonly q1: number;
  readonly median: number;
  readonly q3: number;
  /** Most extreme observations within 1.5 × IQR of the box (Tukey 1977, "Exploratory Data Analysis", ch. 2). */
  readonly lowerWhisker: number;
  readonly upperWhisker: number;
}

/**
 * Quartiles by linear interpolation between order statistics, Hyndman &
 * Fan (1996) type 7 (the default of R's `quantile` and numpy's
 * `percentile`), and whiskers reaching the furthest observation within
 * 1.5 × IQR of the box. Non-finite values are left out; undefined when none remain.
 */
export function boxStats(values: ArrayLike<number>): BoxStats | undefined {
  const sorted = Float64Array.from(Array.from(values).filter(Number.isFinite)).sort();
  const n = sorted.length;
  if (n === 0) return undefined;
  const quantile = (p: number): number => {
    const h = (n - 1) * p;
    const lo = Math.floor(h);
    const below = sorted[lo]!;
    const above = sorted[Math.min(lo + 1, n - 1)]!;
    return below + (h - lo) * (above - below);
  };
  const q1 = quantile(0.25);
  const q3 = quantile(0.75);
  const reach = 1.5 * (q3 - q1);
  let lowerWhisker = q1;
  let upperWhisker = q3;
  for (const v of sorted) {
    if (v >= q1 - reach && v < lowerWhisker) lowerWhisker = v;
    if (v <= q3 + reach && v > upperWhisker) upperWhisker = v;
  }
  return {q1, median: quantile(0.5), q3, lowerWhisker, upperWhisker};
}
