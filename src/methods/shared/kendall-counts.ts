/**
 * Pair counts behind Kendall's tau-b in O(n log n) by Knight's algorithm
 * (Knight 1966, JASA 61:436–439): sort the pairs by x (then y), count the
 * discordant pairs as the swaps of a merge sort of the y sequence, and count
 * tied pairs from runs in the sorted orders. With n0 = n(n−1)/2, n1 and n2
 * the pairs tied in x and in y, and n3 the pairs tied in both,
 * concordant − discordant = n0 − n1 − n2 + n3 − 2·discordant, and
 * tau-b = (C − D) / √((n0 − n1)(n0 − n2)) (Kendall 1945, Biometrika
 * 33:239–251). Every count is an integer below 2^53 for n < 10^8.
 */
export interface KendallCounts {
  readonly n: number;
  readonly concordant: number;
  readonly discordant: number;
  /** Sizes of tie groups (more than one member) in x and in y. */
  readonly xTies: readonly number[];
  readonly yTies: readonly number[];
  readonly tauB: number;
}

export function kendallCounts(x: Float64Array, y: Float64Array): KendallCounts {
  const n = x.length;
  if (y.length !== n) throw new Error(`kendallCounts: x has ${n} values but y has ${y.length}`);
  const order = Array.from({length: n}, (_, i) => i).sort((a, b) => x[a]! - x[b]! || y[a]! - y[b]!);
  const xTies = runs(order, (a, b) => x[a] === x[b]);
  const jointTies = runs(order, (a, b) => x[a] === x[b] && y[a] === y[b]);
  const ys = Float64Array.from(order, (i) => y[i]!);
  const discordant = mergeSortSwaps(ys, new Float64Array(n), 0, n);
  const yTies = runs(Array.from({length: n}, (_, i) => i), (a, b) => ys[a] === ys[b]);
  const n0 = (n * (n - 1)) / 2;
  const n1 = pairs(xTies);
  const n2 = pairs(yTies);
  const n3 = pairs(jointTies);
  const concordant = n0 - n1 - n2 + n3 - discordant;
  const tauB = (concordant - discordant) / Math.sqrt((n0 - n1) * (n0 - n2));
  return {n, concordant, discordant, xTies, yTies, tauB: Math.max(-1, Math.min(1, tauB))};
}

function pairs(ties: readonly number[]): number {
  return ties.reduce((sum, t) => sum + (t * (t - 1)) / 2, 0);
}

/** Sizes of the runs (longer than one) of consecutive equal items. */
function runs(order: readonly number[], same: (a: number, b: number) => boolean): number[] {
  const sizes: number[] = [];
  let size = 1;
  for (let k = 1; k <= order.length; k++) {
    if (k < order.length && same(order[k - 1]!, order[k]!)) size++;
    else {
      if (size > 1) sizes.push(size);
      size = 1;
    }
  }
  return sizes;
}

/** Sorts values[lo, hi) ascending; returns the number of strictly inverted pairs. */
function mergeSortSwaps(values: Float64Array, buffer: Float64Array, lo: number, hi: number): number {
  if (hi - lo < 2) return 0;
  const mid = (lo + hi) >> 1;
  let swaps = mergeSortSwaps(values, buffer, lo, mid) + mergeSortSwaps(values, buffer, mid, hi);
  let i = lo;
  let j = mid;
  let k = lo;
  while (i < mid && j < hi) {
    // Equal values are not inverted: take from the left first.
    if (values[i]! <= values[j]!) buffer[k++] = values[i++]!;
    else {
      swaps += mid - i;
      buffer[k++] = values[j++]!;
    }
  }
  while (i < mid) buffer[k++] = values[i++]!;
  while (j < hi) buffer[k++] = values[j++]!;
  values.set(buffer.subarray(lo, hi), lo);
  return swaps;
}
