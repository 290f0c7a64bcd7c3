import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {binomialCdf, binomialPmf, binomialSf} from '../../src/distributions/binomial.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {binomialTerms, exactAt, toNumber} from './exact-rational.js';

/** Digits required: 12 at ordinary arguments, 9 in far tails (issue 3). */
const digitsFor = (ref: number): number => (ref > 1e-30 ? 12 : 9);

/** Worst LRE of pmf, cdf and sf against [pmf, cdf, sf], each held to its requirement. */
function check(k: number, n: number, p: number, [pmf, cdf, sf]: readonly number[]): void {
  expect(lre(binomialPmf(k, n, p), pmf!)).toBeGreaterThanOrEqual(digitsFor(pmf!));
  expect(lre(binomialCdf(k, n, p), cdf!)).toBeGreaterThanOrEqual(digitsFor(cdf!));
  expect(lre(binomialSf(k, n, p), sf!)).toBeGreaterThanOrEqual(digitsFor(sf!));
}

describe('against exact rational sums (small n)', () => {
  // Exact rational arithmetic with the double p taken exactly (Python
  // fractions, 22 digits shown; the BigInt sums below agree), computed for
  // this test. [k, n, p, pmf, cdf, sf]
  const table: [number, number, number, number, number, number][] = [
    [3, 10, 0.3, 0.266827932, 0.6496107184000000296239, 0.3503892815999999703761],
    [12, 40, 0.5, 0.005081213639641646295786, 0.008294501687487354502082, 0.9917054983125126454979],
    [98, 100, 0.001, 4.94010495000001007778e-291, 1, 9.990100000000020587906e-296],
    [99, 100, 0.001, 9.990000000000020587698e-296, 1, 1.000000000000002081668e-300],
    [0, 1000, 0.5, 9.332636185032188789901e-302, 9.332636185032188789901e-302, 1],
    [5, 20, 1e-6, 1.550376744162790943784e-26, 1, 3.875953488264535007063e-32],
    [0, 5, 0.999, 1.000000000000004440892e-15, 1.000000000000004440892e-15, 0.999999999999999],
    [4, 5, 0.999, 0.004980029980005004405445, 0.004990009995001004423155, 0.9950099900049989955768],
  ];

  it.each(table)('k = %d, n = %d, p = %d', (k, n, p, ...values) => check(k, n, p, values));

  it('is exact where the answer is a power of two', () => {
    // 2^-1000 and 2^-10: exact in binary
    expect(binomialPmf(0, 1000, 0.5)).toBe(2 ** -1000);
    expect(lre(binomialCdf(0, 10, 0.5), 2 ** -10)).toBeGreaterThanOrEqual(15);
  });

  it('agrees with BigInt sums for random n ≤ 60, p and k (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({min: 1, max: 60}),
        fc.double({min: 1e-4, max: 0.9999, noNaN: true}),
        fc.double({min: 0, max: 1, noNaN: true}),
        (n, p, u) => {
          const k = Math.min(n, Math.floor(u * (n + 1)));
          const exact = exactAt(binomialTerms(n, p), k).map(toNumber);
          const ok = (x: number, ref: number) => ref === 0 || lre(x, ref) >= digitsFor(ref);
          return (
            ok(binomialPmf(k, n, p), exact[0]!) &&
            ok(binomialCdf(k, n, p), exact[1]!) &&
            ok(binomialSf(k, n, p), exact[2]!)
          );
        },
      ),
      {numRuns: 300},
    );
  });
});

describe('against mpmath for large n', () => {
  // mpmath 1.3.0 at 50 digits: the pmf from log-gamma and tail sums by the
  // term ratio until terms fall below 1e-45 of the sum, computed for this
  // test. [k, n, p, pmf, cdf, sf]
  const table: [number, number, number, number, number, number][] = [
    [5000000, 1e7, 0.5, 0.0002523132458941847786222, 0.5001261566229470923893, 0.4998738433770529076107],
    [3000000, 1e7, 0.3, 0.000275296319240207703341, 0.5001560012458831759979, 0.4998439987541168240021],
    [2971000, 1e7, 0.3, 2.077605271156380257859e-91, 1.506997382032109441456e-89, 1],
    [1, 1e7, 1e-7, 0.3678794595654154531494, 0.7357588823428849664045, 0.2642411176571150335955],
    [2258, 1e5, 0.01, 1.193425730233770638456e-258, 1, 9.259418508721057666006e-259],
    [92240, 1e5, 0.95, 2.651174971687870726887e-303, 7.077048837720142063688e-303, 1],
    [0, 1e6, 1e-6, 0.367879257231645110933, 0.367879257231645110933, 0.632120742768354889067],
    [10, 1e6, 1e-6, 1.013741131041620862539e-7, 0.9999999899526898155437, 1.004731018445628069898e-8],
  ];

  it.each(table)('k = %d, n = %d, p = %d', (k, n, p, ...values) => check(k, n, p, values));

  it('keeps 12.5 digits even in these tails (measured: 12.6 to 15.9)', () => {
    const worst = Math.min(
      ...table.flatMap(([k, n, p, pmf, cdf, sf]) => [
        lre(binomialPmf(k, n, p), pmf),
        lre(binomialCdf(k, n, p), cdf),
        lre(binomialSf(k, n, p), sf),
      ]),
    );
    expect(worst).toBeGreaterThanOrEqual(12.5);
  });
});

describe('published exact binomial tests', () => {
  it('Conover (1971): two-sided p of 682 of 925 at p0 = ¾, and the Clopper–Pearson limits', () => {
    const ref = example<{scipy: {p_value: number; conf_int: [number, number]}; published: {p_value: number}}>(
      'binomial_exact--r-binom-conover1971-mendel.json',
    );
    const n = 925;
    const observed = binomialPmf(682, n, 0.75);
    // "No more probable" rule, with R's and scipy's relative tolerance 1 + 1e-7.
    let y = Math.ceil(n * 0.75);
    while (binomialPmf(y, n, 0.75) > observed * (1 + 1e-7)) y++;
    const p = binomialCdf(682, n, 0.75) + binomialSf(y - 1, n, 0.75);
    // scipy 1.10 binomtest in the example file; R prints 4 digits
    expect(lre(p, ref.scipy.p_value)).toBeGreaterThanOrEqual(13);
    expect(lre(p, ref.published.p_value)).toBeGreaterThanOrEqual(3.5);
    // exact rational (Python fractions): P(X ≤ 682)
    expect(lre(binomialCdf(682, n, 0.75), 0.196009267053883346164)).toBeGreaterThanOrEqual(14);
    // mpmath 1.3.0 at 50 digits, the same rule: 0.38249155957485168131781816
    expect(lre(p, 0.38249155957485168131781816)).toBeGreaterThanOrEqual(14);
    // At scipy's 95% limits each tail is near 0.025; scipy's upper limit solves
    // it to 8e-12 only. mpmath 1.3.0 sums at 50 digits at those exact doubles:
    const [low, high] = ref.scipy.conf_int;
    expect(lre(binomialSf(681, n, low), 0.02500000000000008265687540188)).toBeGreaterThanOrEqual(13);
    expect(lre(binomialCdf(682, n, high), 0.02500000000020052076520640579)).toBeGreaterThanOrEqual(13);
  });

  it('Zar (2010) via the scipy docs: P(X ≥ 3) for n = 15, p = 0.1', () => {
    const ref = example<{published: {p_value: number}}>('binomial_exact--scipy-doc-car-safety.json');
    // scipy docs, full precision; exact rational 0.1840610691063910214005 (Python fractions)
    expect(lre(binomialSf(2, 15, 0.1), ref.published.p_value)).toBeGreaterThanOrEqual(14);
    expect(lre(binomialSf(2, 15, 0.1), 0.1840610691063910214005)).toBeGreaterThanOrEqual(15);
  });
});

describe('invalid input and edges', () => {
  it('returns NaN for invalid n, p or k', () => {
    for (const [n, p] of [
      [10.5, 0.3],
      [-1, 0.3],
      [10, -0.1],
      [10, 1.1],
      [NaN, 0.3],
      [10, NaN],
    ] as const) {
      expect(binomialPmf(3, n, p)).toBeNaN();
      expect(binomialCdf(3, n, p)).toBeNaN();
      expect(binomialSf(3, n, p)).toBeNaN();
    }
    expect(binomialCdf(NaN, 10, 0.3)).toBeNaN();
  });

  it('handles the ends of the support, non-integer k and p in {0, 1}', () => {
    expect(binomialPmf(2.5, 10, 0.3)).toBe(0);
    expect(binomialCdf(2.5, 10, 0.3)).toBe(binomialCdf(2, 10, 0.3));
    expect(binomialCdf(-1, 10, 0.3)).toBe(0);
    expect(binomialSf(-1, 10, 0.3)).toBe(1);
    expect(binomialCdf(10, 10, 0.3)).toBe(1);
    expect(binomialSf(10, 10, 0.3)).toBe(0);
    expect(binomialPmf(0, 10, 0)).toBe(1);
    expect(binomialSf(0, 10, 0)).toBe(0);
    expect(binomialPmf(10, 10, 1)).toBe(1);
    expect(binomialCdf(9, 10, 1)).toBe(0);
    expect(binomialPmf(0, 0, 0.4)).toBe(1);
    expect(binomialCdf(0, 0, 0.4)).toBe(1);
  });
});

describe('properties (fast-check)', () => {
  const n = fc.oneof(fc.integer({min: 1, max: 200}), fc.integer({min: 200, max: 1e6}));
  const p = fc.double({min: 1e-6, max: 1 - 1e-6, noNaN: true});
  const u = fc.double({min: 0, max: 1, noNaN: true});

  it('cdf + sf = 1', () => {
    fc.assert(
      fc.property(n, p, u, (m, q, v) => {
        const k = Math.floor(v * m);
        return Math.abs(binomialCdf(k, m, q) + binomialSf(k, m, q) - 1) <= 2e-15;
      }),
    );
  });

  it('cdf is non-decreasing in k and cdf(k) - cdf(k-1) = pmf(k)', () => {
    fc.assert(
      fc.property(fc.integer({min: 1, max: 300}), p, u, (m, q, v) => {
        const k = Math.max(1, Math.floor(v * m));
        const step = binomialCdf(k, m, q) - binomialCdf(k - 1, m, q);
        // Each cdf carries a few ulps of a number up to 1.
        return step >= 0 && Math.abs(step - binomialPmf(k, m, q)) <= 2e-15;
      }),
    );
  });

  it('sf is non-decreasing in p for fixed k (stochastic order)', () => {
    fc.assert(
      fc.property(n, p, p, u, (m, a, b, v) => {
        const k = Math.floor(v * m);
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        return binomialSf(k, m, lo) <= binomialSf(k, m, hi) * (1 + 1e-13);
      }),
    );
  });
});
