/**
 * An interval ready to draw: a one-sided interval has an infinite bound,
 * which a chart cannot place, so it is cut at the edge of the drawn data
 * (`extent`) and flagged, and the description says the interval is open.
 */
export interface DrawnInterval {
  readonly lower: number;
  readonly upper: number;
  /** Which bound was infinite and cut at the plot's edge. */
  readonly open?: 'lower' | 'upper';
}

export function clampInterval(ci: readonly [number, number], extent: readonly [number, number]): DrawnInterval {
  const [lo, hi] = ci;
  if (lo === -Infinity && Number.isFinite(hi)) return {lower: Math.min(extent[0], hi), upper: hi, open: 'lower'};
  if (hi === Infinity && Number.isFinite(lo)) return {lower: lo, upper: Math.max(extent[1], lo), open: 'upper'};
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) throw new Error(`clampInterval: cannot draw [${lo}, ${hi}]`);
  return {lower: lo, upper: hi};
}

/** Smallest and largest finite value, without spreading a long array into arguments. */
export function extentOf(values: Iterable<number>): readonly [number, number] {
  let min = Infinity;
  let max = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  return min <= max ? [min, max] : [0, 1];
}
