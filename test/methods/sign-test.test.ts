import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {MethodError} from '../../src/methods/method-error.js';
import {binomialCriticalCount, signTest} from '../../src/methods/sign-test.js';
import type {Alternative} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, sample} from './helpers.js';

interface HollanderWolfe29 {
  data: {x_first_visit: number[]; y_second_visit: number[]};
}

function run(first: readonly number[], second: readonly number[], alternative: Alternative = 'two-sided', mu = 0) {
  return signTest.compute({kind: 'paired', first: sample('A', first), second: sample('B', second)}, options({alternative, mu}));
}

/** Largest k with 100·P(B ≤ k - 1) ≤ tailPercent, B ~ Binomial(n, ½), in exact integers. */
function bruteForceK(n: number, tailPercent: number): number {
  const choose = [1n];
  for (let j = 1; j <= n; j++) choose.push((choose[j - 1]! * BigInt(n - j + 1)) / BigInt(j));
  const total = 2n ** BigInt(n);
  let k = 0;
  let cumulative = 0n;
  while ((cumulative + choose[k]!) * 100n <= BigInt(tailPercent * 10) * total / 10n) cumulative += choose[k++]!;
  return k;
}

describe('sign test', () => {
  const hw = example<HollanderWolfe29>('wilcoxon_signed_rank--r-wilcox-hollander-wolfe-1973-p29.json');
  const first = hw.data.y_second_visit;
  const second = hw.data.x_first_visit;

  it('counts signs of the Hollander & Wolfe (1973) p. 29 differences and gives exact binomial p', () => {
    const result = run(first, second);
    expect(result.statistic).toEqual({name: 'S', value: 7}); // 7 of 9 differences x - y are positive
    expect(result.variant).toBe('exact');
    // scipy 1.17.1: stats.binomtest(7, 9, 0.5, alternative=…).pvalue (92/512, 46/512, 502/512);
    // the incomplete beta behind binomialCdf leaves the last digit or two.
    expect(lre(result.p, 0.1796875)).toBeGreaterThanOrEqual(14);
    expect(lre(run(first, second, 'greater').p, 0.08984375)).toBeGreaterThanOrEqual(14);
    expect(lre(run(first, second, 'less').p, 0.98046875)).toBeGreaterThanOrEqual(14);
  });

  it("gives the median difference with the order-statistic interval (Darwin's maize)", () => {
    const d = [6, 8, 14, 16, 23, 24, 28, 29, 41, -48, 49, 56, 60, -67, 75];
    const zeros = d.map(() => 0);
    const result = run(zeros, d);
    // scipy 1.17.1: stats.binomtest(13, 15, 0.5).pvalue
    expect(lre(result.p, 0.00738525390625)).toBeGreaterThanOrEqual(14);
    expect(result.estimate!.value).toBe(24); // 8th of the 15 sorted differences
    expect(result.estimate!.name).toBe('median difference (B - A)');
    const sorted = [...d].sort((a, b) => a - b);
    const k = bruteForceK(15, 2.5); // P(B ≤ 3) = 576/32768 ≤ 0.025 < P(B ≤ 4)
    expect(k).toBe(4);
    expect(result.estimate!.ci).toEqual([sorted[k - 1], sorted[15 - k]]);
    expect(result.details!['ci_achieved_level']).toBe(1 - (2 * 576) / 32768);
    const greater = run(zeros, d, 'greater');
    expect(greater.estimate!.ci).toEqual([sorted[bruteForceK(15, 5) - 1], Infinity]);
  });

  it('drops zero differences from the test but not from the estimate', () => {
    const a = [12.1, 13.4, 11.0, 15.2, 14.8, 10.5, 12.9, 13.3, 16.0, 11.7, 12.2, 14.1];
    const b = [13.0, 13.4, 12.5, 15.9, 14.1, 11.4, 13.8, 13.3, 17.5, 12.6, 12.9, 15.0];
    const result = run(a, b);
    expect(result.details).toMatchObject({positive: 9, negative: 1, zero_differences: 2});
    // scipy 1.17.1: stats.binomtest(9, 10, 0.5).pvalue
    expect(lre(result.p, 0.021484375)).toBeGreaterThanOrEqual(15);
    expect(result.warnings).toContainEqual(expect.objectContaining({kind: 'dropped-zeros', zeros: 2, pairs: 12}));
    expect(result.estimate!.value).toBe(b[0]! - a[0]!); // median of all 12 differences: 0.9
  });

  it('reaches the far tail', () => {
    const d = Array.from({length: 1000}, (_, i) => (i < 900 ? 1 + i : -1 - i));
    const zeros = d.map(() => 0);
    // mpmath 1.3.0 at 50 digits: sum(binomial(1000, j), j ≥ 900) / 2^1000
    expect(lre(run(zeros, d, 'greater').p, 6.7017177900062963407e-162)).toBeGreaterThanOrEqual(12);
    const middling = Array.from({length: 1000}, (_, i) => (i < 550 ? 1 : -1));
    // mpmath 1.3.0 at 50 digits: sum(binomial(1000, j), j ≥ 550) / 2^1000
    expect(lre(run(zeros, middling, 'greater').p, 0.00086526804248815880412)).toBeGreaterThanOrEqual(12);
  });

  it('refuses pairs that are all equal', () => {
    expect(() => run([1, 2], [1, 2])).toThrow(MethodError);
  });

  it('finds the same critical order statistic as integer arithmetic', () => {
    for (const n of [1, 5, 6, 17, 40, 100, 301]) {
      for (const tail of [2.5, 5, 0.5]) expect(binomialCriticalCount(n, tail / 100)).toBe(bruteForceK(n, tail));
    }
  });
});

describe('sign test: properties', () => {
  const pairs = fc.array(fc.tuple(fc.integer({min: 0, max: 6}), fc.integer({min: 0, max: 6})), {minLength: 1, maxLength: 40});

  it('gives p in [0, 1], two-sided = 2 × the smaller one-sided, and ignores row order', () => {
    fc.assert(
      fc.property(pairs, fc.integer(), (p, seed) => {
        if (!p.some(([a, b]) => a !== b)) return;
        const a = p.map(([x]) => x);
        const b = p.map(([, y]) => y);
        const greater = run(a, b, 'greater').p;
        const less = run(a, b, 'less').p;
        const two = run(a, b).p;
        for (const q of [greater, less, two]) {
          expect(q).toBeGreaterThanOrEqual(0);
          expect(q).toBeLessThanOrEqual(1);
        }
        expect(two).toBe(Math.min(1, 2 * Math.min(greater, less)));
        const shuffled = fc.sample(fc.shuffledSubarray(p, {minLength: p.length}), {seed, numRuns: 1})[0]!;
        expect(run(shuffled.map(([x]) => x), shuffled.map(([, y]) => y)).p).toBe(two);
        expect(run(b, a, 'less').p).toBe(greater);
      }),
    );
  });
});
