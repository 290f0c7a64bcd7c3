import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {normalTwoSidedP} from '../../../src/distributions/normal.js';
import {MethodError} from '../../../src/methods/method-error.js';
import {dunn} from '../../../src/methods/posthoc/dunn.js';
import type {Sample} from '../../../src/methods/types.js';
import {lre} from '../../helpers/lre.js';
import {example} from '../../helpers/reference.js';
import {sample} from '../helpers.js';

function samplesOf(file: string): Sample[] {
  const data = example<{data: Record<string, number[]>}>(file).data;
  return Object.entries(data).map(([label, values]) => sample(label, values));
}

/**
 * References: Dunn's formula evaluated in Python on this machine with
 * scipy 1.17.1 (stats.rankdata midranks, Σ(t³-t) from numpy.unique counts,
 * z = ΔR̄ / √([N(N+1)/12 - Σ(t³-t)/(12(N-1))](1/n_a + 1/n_b)),
 * p = 2·stats.norm.sf(|z|), Holm's step-down adjustment written out).
 */
describe('dunn: mean-rank comparisons after Kruskal–Wallis', () => {
  const ozone = dunn(samplesOf('kruskal_wallis--r-kruskal-airquality-ozone-by-month.json'), 0.95);

  it('matches the formula with ties (airquality ozone by month, Σ(t³-t) = 798)', () => {
    // Python formula with scipy 1.17.1 (see above): [a, b, ΔR̄, z, Holm p]
    const rows: readonly [string, string, number, number, number][] = [
      ['month_5', 'month_6', 12.029914529914528, 0.9251586162687266, 1],
      ['month_5', 'month_7', 41.21153846153847, 4.419470640611556, 9.894296150000462e-5],
      ['month_5', 'month_8', 38.53846153846153, 4.132813422205112, 0.0003225146528982772],
      ['month_5', 'month_9', 11.9973474801061, 1.3212022825201664, 0.7457357018511819],
      ['month_6', 'month_7', 29.18162393162394, 2.2442080323946723, 0.14891411682253272],
      ['month_6', 'month_8', 26.508547008547005, 2.0386354872877126, 0.20743210362524886],
      ['month_6', 'month_9', -0.03256704980842784, -0.002538555269522609, 1],
      ['month_7', 'month_8', -2.673076923076934, -0.28665721840644365, 1],
      ['month_7', 'month_9', -29.214190981432367, -3.217199124277357, 0.010355897731606886],
      ['month_8', 'month_9', -26.541114058355433, -2.9228277777795233, 0.024280782128045676],
    ];
    expect(ozone.map((c) => [c.a, c.b])).toEqual(rows.map(([a, b]) => [a, b]));
    rows.forEach(([, , difference, z, p], i) => {
      const c = ozone[i]!;
      // The mean-rank difference of month_6 - month_9 cancels to 3e-2 from ~60: 12 digits there.
      expect(lre(c.estimate, difference)).toBeGreaterThanOrEqual(12);
      expect(lre(c.statistic, z)).toBeGreaterThanOrEqual(12);
      expect(lre(c.p_adjusted, p)).toBeGreaterThanOrEqual(13);
      expect(c.ci).toBeNull();
    });
  });

  it('matches the formula without ties (Hollander & Wolfe 1973, p. 116)', () => {
    // Python formula with scipy 1.17.1 (see above); every Holm p is 1 here
    const result = dunn(samplesOf('kruskal_wallis--r-kruskal-hollander-wolfe-1973-p116.json'), 0.95);
    const z = [0.6414269805898184, -0.22677868380553654, -0.8552359741197582];
    result.forEach((c, i) => {
      expect(lre(c.statistic, z[i]!)).toBeGreaterThanOrEqual(13);
      expect(c.p_adjusted).toBe(1);
    });
  });

  it('reduces to the Kruskal–Wallis test for two groups: z² = H', () => {
    // scipy 1.17.1: stats.kruskal(month_5, month_8) = (14.850499272202718, 0.00011637726004353517)
    const data = samplesOf('kruskal_wallis--r-kruskal-airquality-ozone-by-month.json');
    const [c] = dunn([data[0]!, data[3]!], 0.95);
    expect(lre(c!.statistic ** 2, 14.850499272202718)).toBeGreaterThanOrEqual(13);
    expect(lre(c!.p_adjusted, 0.00011637726004353517)).toBeGreaterThanOrEqual(13);
  });

  it('gives adjusted p ≥ raw p, in [0, 1], invariant to row order (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({min: 0, max: 6}), {minLength: 3, maxLength: 12}),
        fc.array(fc.integer({min: 0, max: 6}), {minLength: 3, maxLength: 12}),
        fc.array(fc.integer({min: 0, max: 6}), {minLength: 3, maxLength: 12}),
        (x, y, z) => {
          const groups = [sample('x', x), sample('y', y), sample('z', z)];
          if (new Set([...x, ...y, ...z]).size < 2) return;
          const result = dunn(groups, 0.95);
          const reversed = dunn(groups.map((g) => sample(g.label, [...g.values].reverse())), 0.95);
          result.forEach((c, i) => {
            expect(c.p_adjusted).toBeGreaterThanOrEqual(0);
            expect(c.p_adjusted).toBeLessThanOrEqual(1);
            expect(c.p_adjusted).toBeGreaterThanOrEqual(normalTwoSidedP(c.statistic));
            expect(c.p_adjusted).toBe(reversed[i]!.p_adjusted);
          });
        },
      ),
      {numRuns: 100},
    );
  });

  it('refuses data without two distinct values', () => {
    expect(() => dunn([sample('A', [3, 3]), sample('B', [3])], 0.95)).toThrow(MethodError);
    expect(() => dunn([sample('A', [3, 3])], 0.95)).toThrow(/two or more groups/);
  });
});
