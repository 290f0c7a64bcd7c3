import {describe, expect, it} from 'vitest';
import {clopperPearsonInterval} from '../../../src/methods/shared/clopper-pearson.js';
import {lre} from '../../helpers/lre.js';

describe('clopperPearsonInterval', () => {
  // Every reference: mpmath 1.3.0 at 40 (500 of 1000: 30) digits, bisection of the exact binomial tails summed term by term.
  it('solves both tail equations to full precision, tiny bounds included', () => {
    const cases: readonly [number, number, number, readonly [number, number]][] = [
      [1, 1e6, 0.95, [2.5317807663794178e-8, 5.571630655172244e-6]],
      [19, 20, 0.99, [0.6828582652429046, 0.9997494043131685]],
      [500, 1000, 0.95, [0.46854917297179194, 0.531450827028208]],
    ];
    for (const [x, n, level, [lower, upper]] of cases) {
      const ci = clopperPearsonInterval(x, n, level, 'two-sided');
      expect(lre(ci[0], lower), `${x}/${n} lower`).toBeGreaterThanOrEqual(13);
      expect(lre(ci[1], upper), `${x}/${n} upper`).toBeGreaterThanOrEqual(13);
    }
  });

  it('gives 0 and 1 at the edges and one-sided bounds at the full alpha', () => {
    const none = clopperPearsonInterval(0, 20, 0.95, 'two-sided');
    expect(none[0]).toBe(0);
    expect(lre(none[1], 0.16843347098308534)).toBeGreaterThanOrEqual(14);
    expect(clopperPearsonInterval(20, 20, 0.95, 'two-sided')[1]).toBe(1);
    expect(clopperPearsonInterval(3, 15, 0.95, 'less')[0]).toBe(0);
    // 1 - 0.95 and (1 - 0.9)/2 differ in the last bits
    expect(lre(clopperPearsonInterval(3, 15, 0.95, 'greater')[0], clopperPearsonInterval(3, 15, 0.9, 'two-sided')[0])).toBeGreaterThanOrEqual(14);
    expect(() => clopperPearsonInterval(3.5, 15, 0.95, 'two-sided')).toThrow(/invalid counts/);
  });
});
