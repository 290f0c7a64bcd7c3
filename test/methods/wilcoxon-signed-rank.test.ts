import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {MethodError} from '../../src/methods/method-error.js';
import type {Alternative} from '../../src/methods/types.js';
import {wilcoxonSignedRank} from '../../src/methods/wilcoxon-signed-rank.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, sample} from './helpers.js';

interface HollanderWolfe29 {
  data: {x_first_visit: number[]; y_second_visit: number[]};
  published: {exact_greater: {V: number; p_value: number}; exact_two_sided: {V: number; p_value: number}};
  scipy: {exact_greater: {V: number; p_value: number}; exact_two_sided: {p_value: number}};
}
interface Darwin {
  data: {differences: number[]};
  scipy: {two_sided_exact: {p_value: number}; greater_exact: {T_plus: number; p_value: number}};
}

function run(first: readonly number[], second: readonly number[], alternative: Alternative = 'two-sided', mu = 0) {
  return wilcoxonSignedRank.compute({kind: 'paired', first: sample('A', first), second: sample('B', second)}, options({alternative, mu}));
}

/**
 * Tukey's interval by brute force, independent of the implementation: the
 * null distribution of T+ by enumerating all 2^n sign vectors, the critical
 * order statistic in integers, and the listed, sorted Walsh averages.
 */
function bruteForceInterval(d: readonly number[], tailPercent: number, alternative: Alternative) {
  const n = d.length;
  const counts = new Array<number>((n * (n + 1)) / 2 + 1).fill(0);
  for (let signs = 0; signs < 2 ** n; signs++) {
    let t = 0;
    for (let rank = 1; rank <= n; rank++) if (signs & (1 << (rank - 1))) t += rank;
    counts[t]!++;
  }
  let k = 0;
  let cumulative = 0;
  while ((cumulative + counts[k]!) * 100 <= tailPercent * 2 ** n) cumulative += counts[k++]!;
  const walsh: number[] = [];
  for (let i = 0; i < n; i++) for (let j = i; j < n; j++) walsh.push((d[i]! + d[j]!) / 2);
  walsh.sort((a, b) => a - b);
  const lower = alternative === 'less' ? -Infinity : walsh[k - 1]!;
  const upper = alternative === 'greater' ? Infinity : walsh[walsh.length - k]!;
  return {median: (walsh[(walsh.length - 1) >> 1]! + walsh[walsh.length >> 1]!) / 2, ci: [lower, upper]};
}

describe('Wilcoxon signed-rank test: published examples', () => {
  const hw = example<HollanderWolfe29>('wilcoxon_signed_rank--r-wilcox-hollander-wolfe-1973-p29.json');
  // R tests x - y; stet's differences are second - first, so x is second.
  const first = hw.data.y_second_visit;
  const second = hw.data.x_first_visit;

  it('reproduces R ?wilcox.test, Hollander & Wolfe (1973) p. 29, exact', () => {
    const greater = run(first, second, 'greater');
    expect(greater.statistic).toEqual({name: 'V', value: hw.published.exact_greater.V}); // R: V = 40
    expect(greater.variant).toBe('exact');
    // scipy 1.10.1 in the example file (exact dyadic fractions 10/512 and 20/512)
    expect(greater.p).toBe(hw.scipy.exact_greater.p_value);
    const two = run(first, second);
    expect(two.statistic.value).toBe(hw.published.exact_two_sided.V); // V = T+ for every alternative, as R
    expect(two.p).toBe(hw.scipy.exact_two_sided.p_value);
    expect(Number(two.p.toPrecision(4))).toBe(hw.published.exact_two_sided.p_value); // R prints 0.03906
    // scipy 1.17.1: stats.wilcoxon(x - y, alternative='less', method='exact')
    expect(run(first, second, 'less').p).toBe(0.986328125);
    expect(two.details!['zero_differences']).toBe(0);
    expect(two.warnings).toBeUndefined();
  });

  it('gives the Hodges–Lehmann shift and Tukey interval found by brute force', () => {
    const d = second.map((x, i) => x - first[i]!);
    for (const [alternative, tail] of [['two-sided', 2.5], ['greater', 5], ['less', 5]] as const) {
      const result = run(first, second, alternative);
      const reference = bruteForceInterval(d, tail, alternative);
      expect(result.estimate!.ci).toEqual(reference.ci);
      expect(result.estimate!.value).toBe(reference.median);
    }
  });

  it('gives the matched-pairs rank-biserial correlation', () => {
    const result = run(first, second);
    expect(lre(result.effect!.value, 35 / 45)).toBeGreaterThanOrEqual(15); // (T+ - T-)/(T+ + T-) = (40 - 5)/45
    // mpmath 1.3.0 at 40 digits: tanh(atanh(35/45) ∓ z_.975·sqrt(9·10·19/6)/45)
    expect(lre(result.effect!.ci![0], 0.29536312933624202624)).toBeGreaterThanOrEqual(13);
    expect(lre(result.effect!.ci![1], 0.94415590192008147874)).toBeGreaterThanOrEqual(13);
  });

  it("reproduces the SciPy documentation example (Darwin's maize, Wilcoxon 1945)", () => {
    const darwin = example<Darwin>('wilcoxon_signed_rank--scipy-doc-darwin-wilcoxon1945.json');
    const d = darwin.data.differences;
    const zeros = d.map(() => 0);
    expect(run(zeros, d).p).toBe(darwin.scipy.two_sided_exact.p_value); // 1352/32768
    const greater = run(zeros, d, 'greater');
    expect(greater.statistic.value).toBe(darwin.scipy.greater_exact.T_plus);
    expect(greater.p).toBe(darwin.scipy.greater_exact.p_value);
    const reference = bruteForceInterval(d, 2.5, 'two-sided');
    expect(run(zeros, d).estimate!.ci).toEqual(reference.ci);
    // scipy 1.17.1: stats.wilcoxon(d - 10.5, alternative=…, method='exact')
    expect(run(zeros, d, 'greater', 10.5).statistic.value).toBe(88);
    expect(run(zeros, d, 'greater', 10.5).p).toBe(0.060272216796875);
    expect(run(zeros, d, 'less', 10.5).p).toBe(0.946502685546875);
    expect(run(zeros, d, 'two-sided', 10.5).p).toBe(0.12054443359375);
  });
});

describe('Wilcoxon signed-rank test: zeros and ties', () => {
  const first = [12.1, 13.4, 11.0, 15.2, 14.8, 10.5, 12.9, 13.3, 16.0, 11.7, 12.2, 14.1];
  const second = [13.0, 13.4, 12.5, 15.9, 14.1, 11.4, 13.8, 13.3, 17.5, 12.6, 12.9, 15.0];

  it('drops zero differences, says how many, and uses the corrected normal approximation', () => {
    const result = run(first, second);
    expect(result.variant).toBe('normal approximation with tie and continuity correction');
    expect(result.details!['zero_differences']).toBe(2);
    expect(result.statistic.value).toBe(53);
    expect(result.warnings).toContainEqual({kind: 'dropped-zeros', zeros: 2, pairs: 12, second: 'B', first: 'A', mu: 0, wilcoxon: true});
    // scipy 1.17.1: stats.wilcoxon(round(b - a, 10), method='approx', correction=True, zero_method='wilcox')
    expect(lre(result.p, 0.009579798078148873)).toBeGreaterThanOrEqual(12);
    expect(lre(run(first, second, 'greater').p, 0.004789899039074437)).toBeGreaterThanOrEqual(12);
    expect(lre(run(first, second, 'less').p, 0.9964727905116542)).toBeGreaterThanOrEqual(14);
  });

  it('sees ties in the decimal data that the doubles blur', () => {
    // |b - a| holds 0.1 twice and 0.3 twice; as doubles 2.3 - 2.2 ≠ 1.3 - 1.2.
    const a = [2.2, 1.2, 3.1, 0.5, 4.4, 7.0, 2.05, 6.6];
    const b = [2.3, 1.3, 3.4, 0.2, 4.9, 7.7, 2.95, 6.0];
    const result = run(a, b);
    expect(result.variant).toBe('normal approximation with tie and continuity correction');
    expect(result.statistic.value).toBe(26.5);
    // scipy 1.17.1 on the rounded differences: stats.wilcoxon(round(b - a, 10), method='approx');
    // on the raw doubles scipy sees no ties: V = 26, exact p = 0.3125.
    expect(lre(result.p, 0.26144605232963014)).toBeGreaterThanOrEqual(12);
    expect(lre(run(a, b, 'greater').p, 0.13072302616481507)).toBeGreaterThanOrEqual(12);
  });

  it('refuses pairs that are all equal', () => {
    expect(() => run([1, 2, 3], [1, 2, 3])).toThrow(MethodError);
    expect(() => run([1, 2], [1.5, 2.5], 'two-sided', 0.5)).toThrow(/Every difference B - A equals 0.5/);
    expect(() => run([], [])).toThrow(/no pairs/);
  });

  it('reports an unreachable interval as infinite', () => {
    const result = run([0, 0, 0], [1, 2, 3]);
    expect(result.p).toBe(0.25); // 2 · 1/8
    expect(result.estimate!.ci).toEqual([-Infinity, Infinity]);
    expect(result.warnings).toContainEqual(expect.objectContaining({kind: 'unattainable-interval', pairs: 3}));
  });
});

describe('Wilcoxon signed-rank test: properties', () => {
  const pairs = fc.array(fc.tuple(fc.integer({min: 0, max: 10}), fc.integer({min: 0, max: 10})), {minLength: 1, maxLength: 14});
  const untied = fc
    .uniqueArray(fc.integer({min: 1, max: 400}), {minLength: 1, maxLength: 18})
    .chain((magnitudes) => fc.tuple(fc.constant(magnitudes), fc.array(fc.boolean(), {minLength: magnitudes.length, maxLength: magnitudes.length})));
  const hasNonzero = (p: [number, number][]) => p.some(([a, b]) => a !== b);
  const split = (p: [number, number][]) => [p.map(([a]) => a), p.map(([, b]) => b)] as const;

  it('gives p in [0, 1] and is unchanged by shuffling rows', () => {
    fc.assert(
      fc.property(pairs, fc.integer(), (p, seed) => {
        if (!hasNonzero(p)) return;
        const shuffled = fc.sample(fc.shuffledSubarray(p, {minLength: p.length}), {seed, numRuns: 1})[0]!;
        for (const alternative of ['two-sided', 'greater', 'less'] as const) {
          const result = run(...split(p), alternative);
          expect(result.p).toBeGreaterThanOrEqual(0);
          expect(result.p).toBeLessThanOrEqual(1);
          const again = run(...split(shuffled), alternative);
          expect(again.p).toBe(result.p);
          expect(again.estimate).toEqual(result.estimate);
        }
      }),
    );
  });

  it('gives two-sided p = 2 × the smaller one-sided p, capped at 1, in the exact case', () => {
    fc.assert(
      fc.property(untied, ([magnitudes, signs]) => {
        const d = magnitudes.map((x, i) => (signs[i] ? x : -x));
        const zeros = d.map(() => 0);
        const two = run(zeros, d);
        expect(two.variant).toBe('exact');
        expect(two.p).toBe(Math.min(1, 2 * Math.min(run(zeros, d, 'greater').p, run(zeros, d, 'less').p)));
      }),
    );
  });

  it('mirrors when the columns are swapped', () => {
    fc.assert(
      fc.property(pairs, (p) => {
        if (!hasNonzero(p)) return;
        const [a, b] = split(p);
        const forward = run(a, b, 'greater');
        const backward = run(b, a, 'less');
        expect(backward.p).toBe(forward.p);
        expect(backward.estimate!.value).toBe(-forward.estimate!.value + 0);
        expect(backward.effect!.value).toBe(-forward.effect!.value + 0);
      }),
    );
  });
});

describe('Wilcoxon signed-rank test: sizes', () => {
  it('stays exact up to 500 pairs and approximates beyond', () => {
    const d = (n: number) => Array.from({length: n}, (_, i) => ((i * 7919) % 1009) / 10 - 45.05);
    const zeros = (n: number) => new Array<number>(n).fill(0);
    const exact = run(zeros(300), d(300), 'greater');
    expect(exact.variant).toBe('exact');
    // Python 3 big-integer counts of T+ over 2^300, mpmath 1.3.0 at 40 digits
    // (scipy 1.17.1 method='exact': 0.000989080245603624, 12.4 digits)
    expect(lre(exact.p, 0.00098908024560370508825)).toBeGreaterThanOrEqual(13);
    const big = Array.from({length: 20_000}, (_, i) => ((i * 7919) % 20_011) / 7 - 1400);
    const start = performance.now();
    const approximate = run(zeros(20_000), big);
    expect(performance.now() - start).toBeLessThan(20_000);
    expect(approximate.variant).toBe('normal approximation with tie and continuity correction');
  });
});
