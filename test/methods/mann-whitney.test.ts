import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {mannWhitney} from '../../src/methods/mann-whitney.js';
import {MethodError} from '../../src/methods/method-error.js';
import type {Alternative} from '../../src/methods/types.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, sample} from './helpers.js';

interface HollanderWolfe69 {
  data: {x_term: number[]; y_12_to_26_weeks: number[]};
  scipy: {exact: {W: number; p_value: number}};
  published: {exact: {W: number; p_value: number}};
}
interface Airquality {
  data: {ozone_may: number[]; ozone_august: number[]};
  scipy: {W: number; p_value: number};
  published: {W: number; p_value: number};
}
interface Shier {
  data: {males: number[]; females: number[]};
  scipy: {U1: number; p_exact: number; females_less_exact: {U: number; p_value: number}};
}

function run(first: readonly number[], second: readonly number[], alternative: Alternative = 'two-sided', confidence = 0.95) {
  return mannWhitney.compute({kind: 'two-group', first: sample('A', first), second: sample('B', second)}, options({alternative, confidence}));
}

/**
 * Moses' interval by brute force, independent of the implementation: the
 * null distribution by enumerating every placement of the second group's
 * ranks, the critical order statistic in exact integer arithmetic, and the
 * listed, sorted differences.
 */
function bruteForceInterval(first: readonly number[], second: readonly number[], tailPercent: number, alternative: Alternative) {
  const m = first.length;
  const n = second.length;
  const counts = new Array<number>(m * n + 1).fill(0);
  const visit = (start: number, left: number, rankSum: number): void => {
    if (left === 0) return void counts[rankSum - (n * (n + 1)) / 2]!++;
    for (let rank = start; rank <= m + n - left + 1; rank++) visit(rank + 1, left - 1, rankSum + rank);
  };
  visit(1, n, 0);
  const total = counts.reduce((s, c) => s + c, 0);
  // Largest k with 100·P(U ≤ k - 1) ≤ tailPercent, all in integers.
  let k = 0;
  let cumulative = 0;
  while (k < counts.length && (cumulative + counts[k]!) * 100 <= tailPercent * total) cumulative += counts[k++]!;
  const differences = second.flatMap((b) => first.map((a) => b - a)).sort((x, y) => x - y);
  const lower = alternative === 'less' ? -Infinity : differences[k - 1]!;
  const upper = alternative === 'greater' ? Infinity : differences[m * n - k]!;
  return {k, ci: [lower, upper]};
}

describe('Mann–Whitney U test: published examples', () => {
  const hw = example<HollanderWolfe69>('mann_whitney--r-wilcox-hollander-wolfe-1973-p69.json');
  // R's x (term) is stet's second group: `greater` = x shifted to the right.
  const first = hw.data.y_12_to_26_weeks;
  const second = hw.data.x_term;

  it('reproduces R ?wilcox.test, Hollander & Wolfe (1973) p. 69, exact one-sided', () => {
    const result = run(first, second, 'greater');
    expect(result.statistic).toEqual({name: 'U', value: hw.published.exact.W}); // R: W = 35
    expect(result.variant).toBe('exact');
    // scipy 1.10.1 in the example file: mannwhitneyu(x, y, 'greater', method='exact')
    expect(lre(result.p, hw.scipy.exact.p_value)).toBeGreaterThanOrEqual(14);
    expect(Number(result.p.toPrecision(4))).toBe(hw.published.exact.p_value); // R prints 0.1272
  });

  it('gives the other sides as scipy does', () => {
    // scipy 1.17.1: stats.mannwhitneyu(x, y, alternative=…, method='exact')
    expect(lre(run(first, second, 'less').p, 0.8967698967698967)).toBeGreaterThanOrEqual(14);
    expect(lre(run(first, second, 'two-sided').p, 0.2544122544122544)).toBeGreaterThanOrEqual(14);
  });

  it('gives the Hodges–Lehmann shift and Moses interval found by brute force', () => {
    for (const [alternative, tail] of [['two-sided', 2.5], ['greater', 5], ['less', 5]] as const) {
      const result = run(first, second, alternative);
      const reference = bruteForceInterval(first, second, tail, alternative);
      expect(result.estimate!.ci).toEqual(reference.ci);
    }
    const result = run(first, second);
    // Brute force: the 25th and 26th of the 50 sorted differences are 0.3 and 0.31.
    expect(lre(result.estimate!.value, (1.04 - 0.74 + (1.46 - 1.15)) / 2)).toBeGreaterThanOrEqual(15);
    expect(result.estimate!.name).toBe('Hodges–Lehmann shift (B - A)');
    expect(result.details!['ci_achieved_level']).toBeGreaterThanOrEqual(0.95);
  });

  it('gives the rank-biserial correlation with the effectsize interval', () => {
    const result = run(first, second);
    expect(lre(result.effect!.value, 0.4)).toBeGreaterThanOrEqual(15); // 2·35/50 - 1
    // mpmath 1.3.0 at 40 digits: tanh(atanh(0.4) ∓ z_.975·sqrt(16/150))
    expect(lre(result.effect!.ci![0], -0.21315349596050821081)).toBeGreaterThanOrEqual(13);
    expect(lre(result.effect!.ci![1], 0.78710267712645387643)).toBeGreaterThanOrEqual(13);
  });

  it('reproduces R ?wilcox.test, airquality May vs August, with ties', () => {
    const aq = example<Airquality>('mann_whitney--r-wilcox-airquality-may-vs-august.json');
    const result = run(aq.data.ozone_may, aq.data.ozone_august);
    expect(result.variant).toBe('normal approximation with tie and continuity correction');
    // R's W = 127.5 is U of May; stet reports U of August = 26·26 - 127.5.
    expect(result.statistic.value).toBe(26 * 26 - aq.published.W);
    expect(result.details!['u_first']).toBe(aq.published.W);
    // scipy 1.10.1 in the example file: method='asymptotic', use_continuity=True
    expect(lre(result.p, aq.scipy.p_value)).toBeGreaterThanOrEqual(12);
    expect(Number(result.p.toPrecision(4))).toBe(aq.published.p_value); // R: 0.0001208
    // scipy 1.17.1: stats.mannwhitneyu(aug, may, alternative=…, method='asymptotic')
    expect(lre(run(aq.data.ozone_may, aq.data.ozone_august, 'greater').p, 6.040391538438717e-5)).toBeGreaterThanOrEqual(12);
    expect(lre(run(aq.data.ozone_may, aq.data.ozone_august, 'less').p, 0.9999439498752809)).toBeGreaterThanOrEqual(14);
    expect(result.warnings).toContainEqual({kind: 'ties-approximation', tied: 'values'});
  });

  it('selects the large-sample interval from the listed differences', () => {
    const aq = example<Airquality>('mann_whitney--r-wilcox-airquality-may-vs-august.json');
    const result = run(aq.data.ozone_may, aq.data.ozone_august);
    const differences = aq.data.ozone_august.flatMap((b) => aq.data.ozone_may.map((a) => b - a)).sort((x, y) => x - y);
    // Same large-sample formula (scipy 1.17.1: norm.ppf(0.975) = 1.959963984540054),
    // so this checks the selection: k = round(338 - 1.96·sqrt(676·53/12)) = 231.
    const k = Math.floor(338 - 1.959963984540054 * Math.sqrt((676 * 53) / 12) + 0.5);
    expect(k).toBe(231);
    expect(result.estimate!.ci).toEqual([differences[k - 1], differences[676 - k]]);
    expect(result.estimate!.value).toBe((differences[337]! + differences[338]!) / 2);
  });

  it('reproduces the SciPy documentation example (Shier 2004)', () => {
    const shier = example<Shier>('mann_whitney--scipy-doc-shier2004.json');
    const result = run(shier.data.females, shier.data.males);
    expect(result.statistic.value).toBe(shier.scipy.U1); // U of males = 17
    expect(lre(result.p, shier.scipy.p_exact)).toBeGreaterThanOrEqual(14);
    const less = run(shier.data.males, shier.data.females, 'less');
    expect(less.statistic.value).toBe(shier.scipy.females_less_exact.U);
    expect(lre(less.p, shier.scipy.females_less_exact.p_value)).toBeGreaterThanOrEqual(14);
  });
});

describe('Mann–Whitney U test: exact distribution at the size limits', () => {
  // Deterministic untied data (multipliers coprime to prime moduli).
  const a = Array.from({length: 50}, (_, i) => ((i * 7919) % 1009) / 10);
  const b = Array.from({length: 50}, (_, j) => ((j * 104_729) % 1013) / 10 + 6.35);
  const c = Array.from({length: 100}, (_, j) => ((j * 104_729) % 1013) / 10 + 30.05);

  it('agrees with exact integer counts at 50 per group', () => {
    const result = run(a, b, 'greater');
    expect(result.variant).toBe('exact');
    expect(result.statistic.value).toBe(1317);
    // Python 3 big-integer counts of U (Mann–Whitney recurrence), divided by
    // C(100, 50) in mpmath 1.3.0 at 40 digits. scipy 1.17.1 gives
    // 0.32401221993072454 (12.9 digits).
    expect(lre(result.p, 0.32401221993072716917)).toBeGreaterThanOrEqual(14);
    expect(lre(run(a, b, 'less').p, 0.67845312678449544149)).toBeGreaterThanOrEqual(14);
    expect(lre(run(a, b).p, 0.64802443986145433833)).toBeGreaterThanOrEqual(14);
  });

  it('stays exact at 50 against 100 and in the far tail', () => {
    const result = run(a, c, 'greater');
    expect(result.variant).toBe('exact');
    // Python 3 big-integer counts / C(150, 50), mpmath 1.3.0 at 40 digits
    expect(lre(result.p, 1.4295793572629491961e-6)).toBeGreaterThanOrEqual(13);
    const separated = run(
      Array.from({length: 50}, (_, i) => i),
      Array.from({length: 50}, (_, i) => 100 + i),
    );
    // mpmath 1.3.0 at 40 digits: 2 / binomial(100, 50)
    expect(lre(separated.p, 2 * 9.91165302141834e-30)).toBeGreaterThanOrEqual(13);
    expect(separated.effect!.value).toBe(1);
  });

  it('switches to the normal approximation past 10 000 pairs', () => {
    const result = run(
      Array.from({length: 101}, (_, i) => i * 1.5),
      Array.from({length: 100}, (_, i) => i * 1.5 + 0.25),
    );
    expect(result.variant).toBe('normal approximation with tie and continuity correction');
    expect(result.warnings).toBeUndefined();
  });
});

describe('Mann–Whitney U test: edge cases', () => {
  it('reports an interval it cannot bound as infinite, with a warning', () => {
    const result = run([1, 2, 3], [4, 5, 6]);
    expect(result.p).toBe(0.1); // 2 · 1/20: the smallest two-sided p for 3 + 3
    expect(result.estimate!.ci).toEqual([-Infinity, Infinity]);
    expect(result.warnings).toContainEqual({kind: 'unattainable-interval', confidence: 0.95, estimate: 'shift', between: ['A', 'B']});
  });

  it('refuses an empty group and a constant outcome', () => {
    expect(() => run([], [1, 2])).toThrow(MethodError);
    expect(() => run([3, 3, 3], [3, 3])).toThrow(/Every value in A and B is the same/);
  });
});

describe('Mann–Whitney U test: properties', () => {
  const values = fc.array(fc.integer({min: 0, max: 12}).map((x) => x / 2), {minLength: 1, maxLength: 9});
  const distinct = fc.uniqueArray(fc.integer({min: -500, max: 500}), {minLength: 2, maxLength: 16});
  const alternatives: Alternative[] = ['two-sided', 'greater', 'less'];

  it('gives p in [0, 1] for every alternative', () => {
    fc.assert(
      fc.property(values, values, (x, y) => {
        if (new Set([...x, ...y]).size === 1) return;
        for (const alternative of alternatives) {
          const {p} = run(x, y, alternative);
          expect(p).toBeGreaterThanOrEqual(0);
          expect(p).toBeLessThanOrEqual(1);
        }
      }),
    );
  });

  it('does not depend on the order of rows within groups', () => {
    fc.assert(
      fc.property(values, values, fc.integer(), (x, y, seed) => {
        if (new Set([...x, ...y]).size === 1) return;
        const shuffle = (v: number[]) => fc.sample(fc.shuffledSubarray(v, {minLength: v.length}), {seed, numRuns: 1})[0]!;
        const original = run(x, y);
        const shuffled = run(shuffle(x), shuffle(y));
        expect(shuffled.p).toBe(original.p);
        expect(shuffled.statistic).toEqual(original.statistic);
        expect(shuffled.estimate).toEqual(original.estimate);
      }),
    );
  });

  it('gives two-sided p = 2 × the smaller one-sided p, capped at 1, in the exact case', () => {
    fc.assert(
      fc.property(distinct, fc.integer({min: 1, max: 15}), (pool, cut) => {
        const split = Math.min(cut, pool.length - 1);
        const x = pool.slice(0, split);
        const y = pool.slice(split);
        const greater = run(x, y, 'greater').p;
        const less = run(x, y, 'less').p;
        const two = run(x, y);
        expect(two.variant).toBe('exact');
        expect(two.p).toBe(Math.min(1, 2 * Math.min(greater, less)));
      }),
    );
  });

  it('mirrors when the groups are relabelled', () => {
    fc.assert(
      fc.property(values, values, (x, y) => {
        if (new Set([...x, ...y]).size === 1) return;
        const forward = run(x, y, 'greater');
        const backward = run(y, x, 'less');
        expect(backward.p).toBe(forward.p);
        expect(backward.statistic.value).toBe(x.length * y.length - forward.statistic.value);
        expect(backward.estimate!.value).toBe(-forward.estimate!.value + 0);
        expect(backward.effect!.value).toBe(-forward.effect!.value + 0);
      }),
    );
  });
});

describe('Mann–Whitney U test: large samples', () => {
  it('computes 5 000 against 5 000 with the Hodges–Lehmann shift in bounded time', () => {
    const x = Array.from({length: 5000}, (_, i) => ((i * 7919) % 5003) / 3);
    const y = Array.from({length: 5000}, (_, i) => ((i * 6007) % 5009) / 3 + 10);
    const start = performance.now();
    const result = run(x, y);
    const elapsed = performance.now() - start;
    expect(result.variant).toBe('normal approximation with tie and continuity correction');
    expect(result.estimate!.ci[0]).toBeLessThan(result.estimate!.value);
    expect(result.estimate!.ci[1]).toBeGreaterThan(result.estimate!.value);
    expect(elapsed).toBeLessThan(20_000); // 2.5e7 differences are never listed
  });
});
