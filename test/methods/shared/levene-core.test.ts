import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {levene} from '../../../src/methods/shared/levene-core.js';
import {lre} from '../../helpers/lre.js';
import {example} from '../../helpers/reference.js';
import {sample} from '../helpers.js';

function groupsOf(file: string) {
  const reference = example<{data: Record<string, number[]>}>(file);
  return Object.entries(reference.data).map(([label, values]) => sample(label, values));
}

/**
 * Exact references: F in rational arithmetic on the decimal data as printed
 * (Python fractions), p = I_{d2/(d2+d1F)}(d2/2, d1/2) with mpmath 1.3.0 at
 * 40 digits. scipy 1.17.1 `stats.levene(*groups, center=…)` agrees with both
 * to 13–15 digits.
 */
const exact = {
  'levene--real-statistics-example.json': {
    mean: {f: 0.18814616471688289609, p: 0.90357218992034291207},
    median: {f: 0.061348240087166611398, p: 0.97971219945513572972},
  },
  'levene--scipy-doc-abc.json': {
    mean: {f: 7.9051944834420678834, p: 0.0019837958174727126728},
    median: {f: 7.5849527545016937065, p: 0.0024315059672496270095},
  },
  'brown_forsythe_levene_median--nist-ehandbook-gear.json': {
    mean: {f: 2.1594598564728727997, p: 0.032236826559781370344},
    median: {f: 1.7059176930009011715, p: 0.099082975552202895682},
  },
} as const;

describe('levene core (mean- and median-centred)', () => {
  it('matches exact rational F and 40-digit p on three published data sets', () => {
    for (const [file, byCentre] of Object.entries(exact)) {
      const groups = groupsOf(file);
      for (const centre of ['mean', 'median'] as const) {
        const result = levene(groups, centre);
        const label = `${file} ${centre}`;
        // 13: the data are decimals read as doubles; absolute deviations of
        // size 1e-3 from values near 1 (GEAR) keep about 13 digits.
        expect(lre(result.f, byCentre[centre].f), label).toBeGreaterThanOrEqual(13);
        expect(lre(result.p, byCentre[centre].p), label).toBeGreaterThanOrEqual(12);
        expect([result.df1, result.df2]).toEqual([groups.length - 1, groups.reduce((n, g) => n + g.values.length, 0) - groups.length]);
      }
    }
  });

  it('agrees with the published values at their printed precision', () => {
    // Real Statistics via HypothesisTests.jl: p = 0.90357 (mean), 0.97971 (median).
    const rs = groupsOf('levene--real-statistics-example.json');
    expect(levene(rs, 'mean').p.toFixed(5)).toBe('0.90357');
    expect(levene(rs, 'median').p.toFixed(5)).toBe('0.97971');
    // SciPy docs, levene(a, b, c): p = 0.002431505967249681 (scipy 1.10.1, printed in full).
    expect(lre(levene(groupsOf('levene--scipy-doc-abc.json'), 'median').p, 0.002431505967249681)).toBeGreaterThanOrEqual(12);
    // NIST e-Handbook 1.3.5.10, GEAR: W = 1.70591 (Dataplot single precision,
    // 4.5e-6 relative from exact; see the example's notes), p = 0.0991 (HypothesisTests.jl).
    const gear = levene(groupsOf('brown_forsythe_levene_median--nist-ehandbook-gear.json'), 'median');
    expect(lre(gear.f, 1.70591)).toBeGreaterThanOrEqual(5);
    expect(gear.p.toFixed(4)).toBe('0.0991');
  });

  it('is undefined (NaN) when deviations are constant within every group', () => {
    // Groups of two: |x - mean| is the same for both values.
    expect(levene([sample('a', [1, 3]), sample('b', [0, 10])], 'mean').f).toBeNaN();
    expect(levene([sample('a', [5, 5, 5]), sample('b', [2, 2])], 'median').p).toBeNaN();
    expect(() => levene([sample('a', [1, 2])], 'mean')).toThrow();
  });

  it('gives p in [0, 1], unchanged by shuffling rows and relabelling groups', () => {
    const shuffle = <T>(xs: readonly T[]) => fc.shuffledSubarray([...xs], {minLength: xs.length, maxLength: xs.length});
    const groups = fc.array(fc.array(fc.integer({min: -500, max: 500}), {minLength: 3, maxLength: 12}), {minLength: 2, maxLength: 5});
    const withShuffle = groups.chain((raw) => fc.tuple(fc.constant(raw), shuffle(raw.map((values) => shuffle(values))).chain((gs) => fc.tuple(...gs))));
    fc.assert(
      fc.property(withShuffle, fc.boolean(), ([raw, shuffled], useMedian) => {
        const centre = useMedian ? 'median' : 'mean';
        const result = levene(raw.map((values, i) => sample(`g${i}`, values)), centre);
        if (Number.isNaN(result.f)) return;
        expect(result.p).toBeGreaterThanOrEqual(0);
        expect(result.p).toBeLessThanOrEqual(1);
        const again = levene(shuffled.map((values, i) => sample(`h${i}`, values)), centre);
        expect(Math.abs(again.f - result.f)).toBeLessThanOrEqual(1e-12 * Math.max(1, result.f));
        expect(Math.abs(again.p - result.p)).toBeLessThanOrEqual(1e-11);
      }),
    );
  });
});
