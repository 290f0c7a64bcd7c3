/**
 * The rank tests' null distributions are symmetric about their centre;
 * averaging the mirrored terms of a computed pmf removes the last-bit
 * differences left by the recurrence, so that relabelling the groups (or
 * swapping the paired columns) turns one tail into the other bit for bit.
 * Works in place and returns its argument.
 */
export function symmetrize(pmf: Float64Array): Float64Array {
  for (let lo = 0, hi = pmf.length - 1; lo < hi; lo++, hi--) {
    const mean = (pmf[lo]! + pmf[hi]!) / 2;
    pmf[lo] = mean;
    pmf[hi] = mean;
  }
  return pmf;
}
