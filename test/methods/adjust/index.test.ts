import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {adjustPValues} from '../../../src/methods/adjust/index.js';
import type {AdjustMethod} from '../../../src/spec/parse-settings.js';
import {lre} from '../../helpers/lre.js';
import {rejectedAt, type Procedure} from './textbook-procedures.js';

const procedures: readonly Procedure[] = ['bonferroni', 'holm', 'hochberg', 'bh', 'by'];
const methods: readonly AdjustMethod[] = ['none', ...procedures];

// Random p-values mixed with a few repeated constants so ties, 0 and 1 are common.
// The constants are chosen so that no factor m/j, m − j + 1 (m ≤ 40) lands a
// product exactly on the α values used below, where the two float forms
// (p·factor ≤ α vs p ≤ α/factor) could round differently.
const pValue = fc.oneof(fc.double({min: 0, max: 1, noNaN: true}), fc.constantFrom(0, 0.0123, 0.0371, 0.5, 1));
const family = fc.array(pValue, {minLength: 1, maxLength: 40});

describe('adjustPValues', () => {
  it('dispatches to each method', () => {
    // hand computation from each method's definition (see the method files' doc comments)
    const p = [0.01, 0.04, 0.03];
    const expected: Record<AdjustMethod, number[]> = {
      none: [0.01, 0.04, 0.03],
      bonferroni: [0.03, 0.12, 0.09],
      holm: [0.03, 0.06, 0.06],
      hochberg: [0.03, 0.04, 0.04],
      bh: [0.03, 0.04, 0.04],
      by: [0.055, 0.22 / 3, 0.22 / 3], // c(3) = 11/6: min(11/6·0.04, 11/6·1.5·0.03) = 0.22/3
    };
    for (const method of methods) {
      adjustPValues(method, p).forEach((value, i) => expect(lre(value, expected[method][i]!)).toBeGreaterThanOrEqual(15));
    }
  });

  it("'none' returns a copy, not the caller's array", () => {
    const p = [0.2, 0.01];
    const copy = adjustPValues('none', p);
    expect(copy).toEqual(p);
    expect(copy).not.toBe(p);
  });

  it.each(methods)('%s: a single p-value is its own adjustment (every factor is exactly 1)', (method) => {
    expect(adjustPValues(method, [0.037])).toEqual([0.037]);
  });

  it.each(methods)('%s: p = 0 stays 0 and p = 1 stays 1', (method) => {
    expect(adjustPValues(method, [1, 0])).toEqual([1, 0]);
    expect(adjustPValues(method, [0, 0, 0])).toEqual([0, 0, 0]);
    expect(adjustPValues(method, [1, 1, 1])).toEqual([1, 1, 1]);
  });

  it.each(methods)('%s: an empty family gives an empty result', (method) => {
    expect(adjustPValues(method, [])).toEqual([]);
  });

  it.each(methods)('%s: rejects a p-value outside [0, 1] with an Error naming the function', (method) => {
    expect(() => adjustPValues(method, [0.5, 2])).toThrow(/: every p-value must be a finite number in \[0, 1\], but p\[1\] is 2$/);
  });

  it('rejects an unknown method name from untyped callers', () => {
    expect(() => adjustPValues('sidak' as AdjustMethod, [0.5])).toThrow(/^adjustPValues: unknown method "sidak"$/);
  });
});

describe('adjusted p-value properties (fast-check)', () => {
  it.each(procedures)('%s: raw ≤ adjusted ≤ 1, one value per input', (method) => {
    fc.assert(
      fc.property(family, (p) => {
        const adjusted = adjustPValues(method, p);
        expect(adjusted).toHaveLength(p.length);
        adjusted.forEach((value, i) => {
          expect(value).toBeGreaterThanOrEqual(p[i]!);
          expect(value).toBeLessThanOrEqual(1);
        });
      }),
      {numRuns: 300},
    );
  });

  it.each(procedures)('%s: order-preserving (p_i ≤ p_j ⇒ adj_i ≤ adj_j; ties equal)', (method) => {
    fc.assert(
      fc.property(family, (p) => {
        const adjusted = adjustPValues(method, p);
        p.forEach((pi, i) =>
          p.forEach((pj, j) => {
            if (pi <= pj) expect(adjusted[i]!).toBeLessThanOrEqual(adjusted[j]!);
          }),
        );
      }),
      {numRuns: 300},
    );
  });

  it.each(procedures)('%s: permuting the input permutes the output the same way', (method) => {
    const permuted = family.chain((p) =>
      fc.tuple(fc.constant(p), fc.shuffledSubarray([...p.keys()], {minLength: p.length, maxLength: p.length})),
    );
    fc.assert(
      fc.property(permuted, ([p, order]) => {
        const whole = adjustPValues(method, p);
        expect(adjustPValues(method, order.map((i) => p[i]!))).toEqual(order.map((i) => whole[i]!));
      }),
      {numRuns: 300},
    );
  });

  it.each(procedures)('%s: "adjusted ≤ α" rejects exactly what the published procedure rejects', (method) => {
    fc.assert(
      fc.property(family, fc.constantFrom(0.01, 0.05, 0.1), (p, alpha) => {
        const adjusted = adjustPValues(method, p);
        expect(adjusted.map((value) => value <= alpha)).toEqual(rejectedAt(method, p, alpha));
      }),
      {numRuns: 500},
    );
  });

  it('Bonferroni ≥ Holm ≥ Hochberg ≥ BH, and BY ≥ BH', () => {
    // Holm 1979 and Hochberg 1988 state the first two; Hochberg ≥ BH because
    // m/j ≤ m − j + 1 ⇔ (j − 1)(m − j) ≥ 0; BY ≥ BH because c(m) ≥ 1.
    fc.assert(
      fc.property(family, (p) => {
        const [bonf, holm, hoch, bh, by] = (['bonferroni', 'holm', 'hochberg', 'bh', 'by'] as const).map((m) =>
          adjustPValues(m, p),
        );
        p.forEach((_, i) => {
          expect(bonf![i]!).toBeGreaterThanOrEqual(holm![i]!);
          expect(holm![i]!).toBeGreaterThanOrEqual(hoch![i]!);
          expect(hoch![i]!).toBeGreaterThanOrEqual(bh![i]!);
          expect(by![i]!).toBeGreaterThanOrEqual(bh![i]!);
        });
      }),
      {numRuns: 500},
    );
  });
});
