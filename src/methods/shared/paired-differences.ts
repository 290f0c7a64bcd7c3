import type {Sample} from '../types.js';

/**
 * Within-pair differences `second - first` for the paired rank tests, and
 * the same differences centred on the null value `mu` with rounding noise
 * removed.
 *
 * Data arrive as decimal text; the difference of two parsed decimals
 * carries the representation error of both (up to about ε·(|a| + |b|)), so
 * differences equal in the data (2.3 - 2.2 and 1.3 - 1.2), or a difference
 * equal to `mu`, can differ as doubles. Zeros and ties decide between the
 * exact and the approximate test, so centred values within `tolerance` of 0
 * become exactly 0, and magnitudes within `tolerance` of their sorted
 * neighbour become exactly equal (signs kept), so that exact-equality
 * rankers see the ties of the data. The bound 4ε·max(|a| + |b| + |mu|)
 * covers the representation error of both operands, the two subtractions
 * and the comparison of two such values; distinct decimals closer than
 * that would need 15 agreeing digits.
 */
export interface PairedDifferences {
  /** `second - first`, row by row: what the estimates describe. */
  readonly raw: Float64Array;
  /** `raw - mu` with rounding noise snapped away: what the tests rank. */
  readonly centred: Float64Array;
  readonly tolerance: number;
}

export function pairedDifferences(first: Sample, second: Sample, mu: number): PairedDifferences {
  const n = first.values.length;
  if (second.values.length !== n) {
    throw new Error(`pairedDifferences: ${first.label} has ${n} values but ${second.label} has ${second.values.length}`);
  }
  const raw = new Float64Array(n);
  let scale = 0;
  for (let i = 0; i < n; i++) {
    const a = first.values[i]!;
    const b = second.values[i]!;
    raw[i] = b - a;
    scale = Math.max(scale, Math.abs(a) + Math.abs(b) + Math.abs(mu));
  }
  const tolerance = 4 * Number.EPSILON * scale;
  const centred = raw.map((d) => {
    const c = d - mu;
    return Math.abs(c) <= tolerance ? 0 : c;
  });
  snapMagnitudes(centred, tolerance);
  return {raw, centred, tolerance};
}

/** Give every run of magnitudes within `tolerance` of its neighbour the run's first magnitude. */
function snapMagnitudes(values: Float64Array, tolerance: number): void {
  const order = Array.from(values.keys()).sort((i, j) => Math.abs(values[i]!) - Math.abs(values[j]!));
  let representative = NaN;
  let previous = NaN;
  for (const i of order) {
    const magnitude = Math.abs(values[i]!);
    if (!(magnitude - previous <= tolerance)) representative = magnitude;
    previous = magnitude;
    values[i] = Math.sign(values[i]!) * representative;
  }
}
