/**
 * Log relative error, the digits-of-agreement measure used by NIST StRD
 * (McCullough 1998, "Assessing the reliability of statistical software",
 * The American Statistician 52:358–366): LRE = −log10(|x − ref| / |ref|).
 * Exact agreement returns 15.95 (the float64 ceiling); a reference of 0
 * falls back to absolute error, −log10(|x|).
 */
export function lre(actual: number, expected: number): number {
  if (actual === expected) return 15.95;
  if (Number.isNaN(actual) || Number.isNaN(expected)) return 0;
  const error = expected === 0 ? Math.abs(actual) : Math.abs(actual - expected) / Math.abs(expected);
  return Math.min(15.95, Math.max(0, -Math.log10(error)));
}
