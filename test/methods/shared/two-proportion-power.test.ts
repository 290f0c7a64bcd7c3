import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {twoProportionDetectable, twoProportionPower} from '../../../src/methods/shared/two-proportion-power.js';
import type {Alternative} from '../../../src/methods/types.js';
import {lre} from '../../helpers/lre.js';

describe('twoProportionPower', () => {
  it('reproduces R ?power.prop.test(n = 50, p1 = .50, p2 = .75)', () => {
    const power = twoProportionPower({p1: 0.5, p2: 0.75, n1: 50, n2: 50, alpha: 0.05, alternative: 'two-sided'});
    // R help page prints power = 0.740 (upper tail only); both tails, mpmath 1.3.0 at 40 digits
    expect(power.toFixed(3)).toBe('0.740');
    expect(lre(power, 0.740167193453611)).toBeGreaterThanOrEqual(14);
  });

  it('reproduces R ?power.prop.test(n = 50, p1 = .5, power = .90): p2 = 0.8026', () => {
    const delta = twoProportionDetectable({p1: 0.5, n1: 50, n2: 50, alpha: 0.05, alternative: 'two-sided'}, 1, 0.9)!;
    // R help page prints p2 = 0.8026 (uniroot, tol ~1e-4); mpmath 1.3.0 at 40 digits, bisection of the two-tailed formula
    expect((0.5 + delta).toFixed(4)).toBe('0.8026');
    expect(lre(delta, 0.3026305679884229)).toBeGreaterThanOrEqual(12);
  });

  it('handles unequal groups, one-sided tests and tiny alpha', () => {
    const p1 = 5 / 83;
    // mpmath 1.3.0 at 40 digits, the formula with p̄ = (n₁p₁ + n₂p₂)/(n₁ + n₂)
    expect(lre(twoProportionPower({p1, p2: p1 + 0.1, n1: 83, n2: 99, alpha: 0.05, alternative: 'two-sided'}), 0.5621953823607263)).toBeGreaterThanOrEqual(14);
    const greater = twoProportionDetectable({p1, n1: 83, n2: 99, alpha: 0.05, alternative: 'greater'}, 1, 0.8)!;
    expect(lre(greater, 0.1204402440177087)).toBeGreaterThanOrEqual(12);
    expect(lre(twoProportionPower({p1: 0.3, p2: 0.2, n1: 400, n2: 500, alpha: 1e-8, alternative: 'less'}), 0.01676893196668894)).toBeGreaterThanOrEqual(13);
  });

  it('is alpha at no difference, increasing in the difference, and null when 80% is out of reach', () => {
    expect(lre(twoProportionPower({p1: 0.3, p2: 0.3, n1: 40, n2: 60, alpha: 0.05, alternative: 'two-sided'}), 0.05)).toBeGreaterThanOrEqual(14);
    expect(twoProportionDetectable({p1: 0.5, n1: 3, n2: 3, alpha: 0.05, alternative: 'two-sided'}, 1, 0.8)).toBeNull();
    expect(Number.isNaN(twoProportionPower({p1: 1.2, p2: 0.3, n1: 4, n2: 4, alpha: 0.05, alternative: 'less'}))).toBe(true);
    const alternatives: Alternative[] = ['two-sided', 'greater'];
    fc.assert(
      fc.property(fc.double({min: 0.01, max: 0.6, noNaN: true}), fc.integer({min: 5, max: 500}), fc.constantFrom(...alternatives), (p1, n, alternative) => {
        const at = (d: number) => twoProportionPower({p1, p2: p1 + d, n1: n, n2: n + 7, alpha: 0.05, alternative});
        expect(at(0.2)).toBeGreaterThanOrEqual(at(0.1));
        expect(at(0.1)).toBeGreaterThanOrEqual(at(0.01) - 1e-12);
      }),
    );
  });
});
