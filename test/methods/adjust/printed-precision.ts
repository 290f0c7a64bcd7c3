/**
 * How far a full-precision value may sit from a number printed to
 * `decimals` decimal places and still round to it: half a unit in the last
 * printed place. A relative slack of 1e-12 absorbs the binary
 * representation of the printed decimal.
 */
export function halfUnitDecimals(published: number, decimals: number): number {
  return 0.5 * 10 ** -decimals + 1e-12 * Math.abs(published);
}
