import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {MethodError} from '../../src/methods/method-error.js';
import {shapiroWilk} from '../../src/methods/shapiro-wilk.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, sample} from './helpers.js';

describe('Shapiro–Wilk test (method)', () => {
  it('reports W and p for Shapiro & Wilk 1965, Example 1, with no estimate', () => {
    const reference = example<{data: {weights_lb: number[]}; published: {W: number}}>('shapiro_wilk--shapiro-wilk-1965-example1.json');
    const result = shapiroWilk.compute({kind: 'one-sample', sample: sample('all', reference.data.weights_lb)}, options());
    expect(result.statistic.name).toBe('W');
    // Shapiro & Wilk 1965, p. 606 (as quoted by a secondary source): W = 0.79, p < 0.01.
    expect(result.statistic.value.toFixed(2)).toBe(reference.published.W.toFixed(2));
    expect(result.p).toBeLessThan(0.01);
    // scipy 1.17.1: stats.shapiro(weights).pvalue = 0.006703814061898823 (its coefficients carry ~9 digits here).
    expect(lre(result.p, 0.006703814061898823)).toBeGreaterThanOrEqual(8);
    expect(result.df).toBeNull();
    expect(result.estimate).toBeUndefined();
    expect(result.effect).toBeUndefined();
    expect(result.variant).toBe('Royston’s normal approximation (AS R94)');
  });

  it('turns a constant sample into a MethodError', () => {
    expect(() => shapiroWilk.compute({kind: 'one-sample', sample: sample('all', [2, 2, 2, 2])}, options())).toThrow(MethodError);
    expect(() => shapiroWilk.compute({kind: 'one-sample', sample: sample('all', [2, 3])}, options())).toThrow(MethodError);
  });

  it('gives p in [0, 1] for any non-constant sample', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({min: -1000, max: 1000}), {minLength: 3, maxLength: 200}), (xs) => {
        if (new Set(xs).size < 2) return;
        const {p} = shapiroWilk.compute({kind: 'one-sample', sample: sample('all', xs)}, options());
        expect(p).toBeGreaterThanOrEqual(0);
        expect(p).toBeLessThanOrEqual(1);
      }),
    );
  });
});
