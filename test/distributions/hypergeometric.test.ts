import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {hypergeometricCdf, hypergeometricPmf, hypergeometricSf} from '../../src/distributions/hypergeometric.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {exactAt, hypergeometricTerms, toNumber} from './exact-rational.js';

/** Digits required: 12 at ordinary arguments, 9 in far tails (issue 3). */
const digitsFor = (ref: number): number => (ref > 1e-30 ? 12 : 9);

type Row = [k: number, population: number, successes: number, draws: number, pmf: number, cdf: number, sf: number];

function digits([k, population, successes, draws, pmf, cdf, sf]: Row): [number, number, number] {
  return [
    lre(hypergeometricPmf(k, population, successes, draws), pmf),
    lre(hypergeometricCdf(k, population, successes, draws), cdf),
    lre(hypergeometricSf(k, population, successes, draws), sf),
  ];
}

function check(row: Row): void {
  const got = digits(row);
  [row[4], row[5], row[6]].forEach((ref, i) => expect(got[i]).toBeGreaterThanOrEqual(digitsFor(ref)));
}

describe('against exact rationals (population ≤ 1000)', () => {
  // Exact rational arithmetic, C(K,k)C(N-K,n-k)/C(N,n) (Python fractions, 22
  // digits shown), computed for this test. [k, N, K, n, pmf, cdf, sf]
  const table: Row[] = [
    [2, 8, 4, 4, 0.5142857142857142857143, 0.7571428571428571428571, 0.2428571428571428571429],
    [8, 16, 9, 10, 0.0236013986013986013986, 0.9991258741258741258741, 0.0008741258741258741258741],
    [2, 30, 12, 17, 0.0004496999620490506626386, 0.0004651809433629050136586, 0.9995348190566370949863],
    [300, 1000, 500, 500, 9.453803057056255356212e-11, 0.999999999926907448972, 7.3092551028024269676e-11],
    [3, 1000, 10, 20, 0.0007296227339351955119495, 0.9999772697715312666307, 0.0000227302284687333692694],
    [200, 1000, 300, 800, 1.288635576643736361525e-11, 1.910317257554611303896e-11, 0.9999999999808968274245],
    [101, 1000, 300, 800, 8.710559796472454661211e-132, 8.716843843182766932073e-132, 1],
  ];

  it.each(table)('k = %d, N = %d, K = %d, n = %d', (...row) => check(row));

  it('agrees with BigInt sums for random tables with population ≤ 300 (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({min: 1, max: 300}),
        fc.double({min: 0, max: 1, noNaN: true}),
        fc.double({min: 0, max: 1, noNaN: true}),
        fc.double({min: 0, max: 1, noNaN: true}),
        (population, a, b, c) => {
          const successes = Math.round(a * population);
          const draws = Math.round(b * population);
          const k = Math.round(c * draws);
          const exact = exactAt(hypergeometricTerms(population, successes, draws), k).map(toNumber);
          const ok = (x: number, ref: number) => (ref === 0 ? x === 0 : lre(x, ref) >= digitsFor(ref));
          return (
            ok(hypergeometricPmf(k, population, successes, draws), exact[0]!) &&
            ok(hypergeometricCdf(k, population, successes, draws), exact[1]!) &&
            ok(hypergeometricSf(k, population, successes, draws), exact[2]!)
          );
        },
      ),
      {numRuns: 300},
    );
  });
});

describe('against mpmath for population 1e6', () => {
  // mpmath 1.3.0 at 50 digits: the pmf from log-gamma and tail sums by the
  // term ratio until terms fall below 1e-45 of the sum, computed for this test.
  const table: Row[] = [
    [250000, 1e6, 5e5, 5e5, 0.001595767924779338318412, 0.5007978839623896691592, 0.4992021160376103308408],
    [180, 1e6, 1e5, 2000, 0.00989374693748697793834, 0.07123143151653439277984, 0.9287685684834656072202],
    [736, 1e6, 1e5, 2000, 1.462203770081376607736e-225, 1, 3.414949124766439857917e-226],
    [1367, 1e6, 1e4, 5e4, 1.906808146987100391054e-244, 1, 9.218042893636812727675e-245],
    [6408, 1e6, 1e4, 8e5, 3.136179898663240263307e-302, 5.612757471778083838665e-302, 1],
  ];

  it.each(table)('k = %d, N = %d, K = %d, n = %d', (...row) => check(row));

  it('keeps 12.5 digits even in these tails (measured: 12.7 to 15.9)', () => {
    expect(Math.min(...table.flatMap(digits))).toBeGreaterThanOrEqual(12.5);
  });
});

describe("Fisher's exact test p-values from published tables", () => {
  it('tea tasting (Fisher 1935): one-sided P(X ≥ 3) = 17/70', () => {
    const ref = example<{scipy: {p_value: number}}>('fisher_exact--r-fisher-tea-tasting.json').scipy;
    // scipy 1.10 in the example file; exact 17/70 (common practice, no source)
    expect(lre(hypergeometricSf(2, 8, 4, 4), ref.p_value)).toBeGreaterThanOrEqual(15);
    expect(lre(hypergeometricSf(2, 8, 4, 4), 17 / 70)).toBeGreaterThanOrEqual(15);
  });

  it('convictions of twins (Fisher 1962): one-sided and two-sided', () => {
    const ref = example<{scipy: {less: {p_value: number}; two_sided: {p_value: number}}}>(
      'fisher_exact--r-fisher-convictions-fisher1962.json',
    ).scipy;
    // Table [[2, 15], [10, 3]]: X = 2 convicted among 17 dizygotic, 12 convicted of 30.
    expect(lre(hypergeometricCdf(2, 30, 12, 17), ref.less.p_value)).toBeGreaterThanOrEqual(14);
    expect(lre(twoSided(2, 30, 12, 17), ref.two_sided.p_value)).toBeGreaterThanOrEqual(14);
  });

  it('scipy docs table [[8, 2], [1, 5]]: two-sided', () => {
    const ref = example<{scipy: {p_value: number}}>('fisher_exact--scipy-doc.json').scipy;
    expect(lre(twoSided(8, 16, 9, 10), ref.p_value)).toBeGreaterThanOrEqual(14);
  });
});

/** Sum of P(X = j) over tables no more probable than the observed one (R's relative tolerance 1e-7). */
function twoSided(k: number, population: number, successes: number, draws: number): number {
  const observed = hypergeometricPmf(k, population, successes, draws) * (1 + 1e-7);
  let sum = 0;
  for (let j = 0; j <= draws; j++) {
    const d = hypergeometricPmf(j, population, successes, draws);
    if (d <= observed) sum += d;
  }
  return sum;
}

describe('invalid input and edges', () => {
  it('returns NaN for invalid arguments', () => {
    for (const [n, s, d] of [
      [10.5, 3, 4],
      [10, 11, 4],
      [10, 3, 11],
      [10, -1, 4],
      [NaN, 3, 4],
    ] as const) {
      expect(hypergeometricPmf(1, n, s, d)).toBeNaN();
      expect(hypergeometricCdf(1, n, s, d)).toBeNaN();
      expect(hypergeometricSf(1, n, s, d)).toBeNaN();
    }
    expect(hypergeometricSf(NaN, 10, 3, 4)).toBeNaN();
  });

  it('handles the support bounds, non-integer k and degenerate draws', () => {
    expect(hypergeometricPmf(0, 10, 8, 5)).toBe(0); // at least 3 successes are drawn
    expect(hypergeometricCdf(2, 10, 8, 5)).toBe(0);
    expect(hypergeometricSf(5, 10, 8, 5)).toBe(0);
    expect(hypergeometricPmf(1.5, 10, 3, 4)).toBe(0);
    expect(hypergeometricCdf(1.5, 10, 3, 4)).toBe(hypergeometricCdf(1, 10, 3, 4));
    expect(hypergeometricPmf(3, 10, 3, 10)).toBe(1);
    expect(hypergeometricPmf(0, 10, 3, 0)).toBe(1);
    expect(hypergeometricPmf(0, 0, 0, 0)).toBe(1);
  });
});

describe('properties (fast-check)', () => {
  const share = fc.double({min: 0, max: 1, noNaN: true});
  const table = fc
    .tuple(fc.integer({min: 2, max: 1e5}), share, share)
    .map(([population, a, b]) => [population, Math.round(a * population), Math.round(b * population)] as const);
  const u = fc.double({min: 0, max: 1, noNaN: true});

  it('cdf + sf = 1 and cdf(k) - cdf(k-1) = pmf(k)', () => {
    fc.assert(
      fc.property(table, u, ([population, successes, draws], v) => {
        const k = Math.round(v * draws);
        const cdf = hypergeometricCdf(k, population, successes, draws);
        const step = cdf - hypergeometricCdf(k - 1, population, successes, draws);
        return (
          Math.abs(cdf + hypergeometricSf(k, population, successes, draws) - 1) <= 2e-15 &&
          step >= 0 &&
          // A tail sums O(SD) terms, each a product of ratios: about 10 ulps of ½ near the mean.
          Math.abs(step - hypergeometricPmf(k, population, successes, draws)) <= 4e-15
        );
      }),
    );
  });

  it('is symmetric in successes and draws', () => {
    // C(K,k)C(N-K,n-k)/C(N,n) = C(n,k)C(N-n,K-k)/C(N,K): common practice, no source
    fc.assert(
      fc.property(table, u, ([population, successes, draws], v) => {
        const k = Math.round(v * Math.min(successes, draws));
        const a = hypergeometricSf(k, population, successes, draws);
        const b = hypergeometricSf(k, population, draws, successes);
        // Subnormal tails (below 2.2e-308) carry too few digits to compare.
        return a < 1e-300 || lre(a, b) >= 12;
      }),
    );
  });
});
