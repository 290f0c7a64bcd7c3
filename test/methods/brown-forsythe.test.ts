import {describe, expect, it} from 'vitest';
import {brownForsythe} from '../../src/methods/brown-forsythe.js';
import {lre} from '../helpers/lre.js';
import {example} from '../helpers/reference.js';
import {options, sample} from './helpers.js';

interface Gear {
  data: Record<string, number[]>;
  published: {W: number; df: [number, number]; p_value_from_HypothesisTests_jl: number};
  scipy: {W: number; p_value: number; W_exact_rational: number};
}

describe('Brown–Forsythe test (method)', () => {
  it('reproduces NIST e-Handbook 1.3.5.10 (GEAR.DAT, median-centred Levene)', () => {
    const reference = example<Gear>('brown_forsythe_levene_median--nist-ehandbook-gear.json');
    const design = {kind: 'k-group', samples: Object.entries(reference.data).map(([k, v]) => sample(k, v))} as const;
    const result = brownForsythe.compute(design, options());
    expect(result.df).toEqual(reference.published.df);
    // Exact rational arithmetic on the printed decimals, in the example's scipy block.
    expect(lre(result.statistic.value, reference.scipy.W_exact_rational)).toBeGreaterThanOrEqual(13);
    // scipy 1.10.1 levene(center='median'), same file.
    expect(lre(result.p, reference.scipy.p_value)).toBeGreaterThanOrEqual(12);
    // NIST prints W = 1.70591 from single-precision Dataplot (4.5e-6 relative from exact; see notes).
    expect(lre(result.statistic.value, reference.published.W)).toBeGreaterThanOrEqual(5);
    expect(result.p.toFixed(4)).toBe(reference.published.p_value_from_HypothesisTests_jl.toFixed(4));
    expect(result.details!.centre).toBe('median');
  });

  it('matches the Real Statistics example (median-centred p = 0.97971, via HypothesisTests.jl)', () => {
    const reference = example<{data: Record<string, number[]>; scipy: {median_centered: {W: number; p_value: number}}}>(
      'levene--real-statistics-example.json',
    );
    const result = brownForsythe.compute({kind: 'k-group', samples: Object.entries(reference.data).map(([k, v]) => sample(k, v))}, options());
    expect(result.p.toFixed(5)).toBe('0.97971');
    // scipy 1.10.1 levene(center='median') in the same file.
    expect(lre(result.statistic.value, reference.scipy.median_centered.W)).toBeGreaterThanOrEqual(13);
    expect(lre(result.p, reference.scipy.median_centered.p_value)).toBeGreaterThanOrEqual(12);
  });
});
