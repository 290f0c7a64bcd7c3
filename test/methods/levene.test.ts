import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {levene} from '../../src/methods/levene.js';
import {MethodError} from '../../src/methods/method-error.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, sample} from './helpers.js';

interface Abc {
  data: {a: number[]; b: number[]; c: number[]};
  published: {sample_variances: number[]};
  scipy: {mean_centered: {W: number; p_value: number}};
}

describe('Levene’s test (method)', () => {
  it('matches scipy levene(center="mean") on the SciPy documentation data', () => {
    const reference = example<Abc>('levene--scipy-doc-abc.json');
    const design = {kind: 'k-group', samples: Object.entries(reference.data).map(([k, v]) => sample(k, v))} as const;
    const result = levene.compute(design, options());
    // scipy 1.10.1 recomputation in shared/reference/examples/levene--scipy-doc-abc.json.
    expect(result.statistic.name).toBe('F');
    expect(lre(result.statistic.value, reference.scipy.mean_centered.W)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.mean_centered.p_value)).toBeGreaterThanOrEqual(12);
    expect(result.df).toEqual([2, 27]);
    expect(result.estimate).toBeUndefined();
    // SciPy docs print the sample variances 0.00705…, 0.13074…, 0.00889…: b is the widest, a the narrowest.
    const [va, vb] = reference.published.sample_variances as [number, number];
    const ratio = result.details!.sd_ratio as {name: string; value: number; largest: string; smallest: string};
    expect(ratio.name).toBe('ratio of largest to smallest SD');
    expect([ratio.largest, ratio.smallest]).toEqual(['b', 'a']);
    expect(lre(ratio.value, Math.sqrt(vb / va))).toBeGreaterThanOrEqual(13);
    expect(result.details!.centre).toBe('mean');
  });

  it('matches the Real Statistics example as transcribed by HypothesisTests.jl (p = 0.90357)', () => {
    const reference = example<{data: Record<string, number[]>}>('levene--real-statistics-example.json');
    const result = levene.compute({kind: 'k-group', samples: Object.entries(reference.data).map(([k, v]) => sample(k, v))}, options());
    expect(result.p.toFixed(5)).toBe('0.90357');
    expect(result.df).toEqual([3, 28]);
  });

  it('refuses one group, groups of one value and groups of two (deviations constant)', () => {
    const run = (groups: number[][]) => () =>
      levene.compute({kind: 'k-group', samples: groups.map((v, i) => sample(`g${i}`, v))}, options());
    expect(run([[1, 2, 3]])).toThrow(MethodError);
    expect(run([[1, 2, 3], [4]])).toThrow(MethodError);
    expect(run([[1, 3], [0, 10]])).toThrow(MethodError);
  });

  it('warns about a constant group and leaves the SD ratio undefined', () => {
    const result = levene.compute({kind: 'k-group', samples: [sample('a', [5, 5, 5]), sample('b', [1, 2, 4])]}, options());
    expect((result.details!.sd_ratio as {value: number | null}).value).toBeNull();
    expect(result.warnings).toEqual([{kind: 'constant-groups', groups: ['a']}]);
  });

  it('gives p in [0, 1]', () => {
    const groups = fc.array(fc.array(fc.integer({min: -50, max: 50}), {minLength: 3, maxLength: 10}), {minLength: 2, maxLength: 6});
    fc.assert(
      fc.property(groups, (raw) => {
        try {
          const {p} = levene.compute({kind: 'k-group', samples: raw.map((v, i) => sample(`g${i}`, v))}, options());
          expect(p).toBeGreaterThanOrEqual(0);
          expect(p).toBeLessThanOrEqual(1);
        } catch (error) {
          expect(error).toBeInstanceOf(MethodError);
        }
      }),
    );
  });
});
