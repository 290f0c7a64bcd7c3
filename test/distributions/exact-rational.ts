/**
 * Exact rational reference values in BigInt arithmetic for the discrete
 * distribution tests: binomial terms with the double p taken exactly (a
 * double is m/2^e), and hypergeometric terms as ratios of binomial
 * coefficients. Sums are exact; only the final conversion to a double rounds.
 */

/** A fraction num/den of non-negative BigInts. */
export interface Fraction {
  readonly num: bigint;
  readonly den: bigint;
}

function bitLength(x: bigint): number {
  return x === 0n ? 0 : x.toString(2).length;
}

/** num/den correctly rounded to within 2^-60 relative, including below 1e-300. */
export function toNumber({num, den}: Fraction): number {
  if (num === 0n) return 0;
  // Keep 64 significant bits of the quotient before rounding to 53.
  const shift = bitLength(den) - bitLength(num) + 64;
  const quotient = shift >= 0 ? (num << BigInt(shift)) / den : num / (den << BigInt(-shift));
  let x = Number(quotient);
  let s = shift;
  for (; s > 1000; s -= 1000) x *= 2 ** -1000;
  return x * 2 ** -s;
}

/** The exact double p as m/2^e. */
function dyadic(p: number): [bigint, bigint] {
  let m = p;
  let e = 0;
  while (!Number.isInteger(m)) {
    m *= 2;
    e++;
  }
  return [BigInt(m), 1n << BigInt(e)];
}

function choose(n: number, k: number): bigint {
  let c = 1n;
  for (let i = 1; i <= k; i++) c = (c * BigInt(n - k + i)) / BigInt(i);
  return c;
}

/** P(X = j) for j = 0..n as numerators over one common denominator. */
export function binomialTerms(n: number, p: number): {terms: bigint[]; den: bigint} {
  const [m, d] = dyadic(p);
  const terms: bigint[] = [];
  for (let j = 0; j <= n; j++) terms.push(choose(n, j) * m ** BigInt(j) * (d - m) ** BigInt(n - j));
  return {terms, den: d ** BigInt(n)};
}

/** P(X = j) for j = 0..draws (0 outside the support) over the common denominator C(N, n). */
export function hypergeometricTerms(
  population: number,
  successes: number,
  draws: number,
): {terms: bigint[]; den: bigint} {
  const terms: bigint[] = [];
  for (let j = 0; j <= draws; j++) {
    const ok = j <= successes && draws - j <= population - successes;
    terms.push(ok ? choose(successes, j) * choose(population - successes, draws - j) : 0n);
  }
  return {terms, den: choose(population, draws)};
}

/** [pmf, P(X ≤ k), P(X > k)] as exact fractions from a table of terms. */
export function exactAt(table: {terms: bigint[]; den: bigint}, k: number): [Fraction, Fraction, Fraction] {
  let lower = 0n;
  let upper = 0n;
  table.terms.forEach((t, j) => {
    if (j <= k) lower += t;
    else upper += t;
  });
  const den = table.den;
  return [{num: table.terms[k] ?? 0n, den}, {num: lower, den}, {num: upper, den}];
}
