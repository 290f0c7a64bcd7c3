import {describe, expect, it} from 'vitest';
import {MethodError} from '../../../src/methods/method-error.js';
import {arcsine, checkProportion, cohensH} from '../../../src/methods/shared/proportion-checks.js';

describe('proportion checks and Cohen’s h', () => {
  it('refuses mu at 0 or 1 and empty samples, and programmer errors plainly', () => {
    const design = {kind: 'proportion', successes: 3, trials: 10, success: 'yes'} as const;
    expect(() => checkProportion(design, 1, 'T')).toThrow(MethodError);
    expect(() => checkProportion({...design, successes: 0, trials: 0}, 0.5, 'T')).toThrow(MethodError);
    expect(() => checkProportion({...design, successes: 11}, 0.5, 'T')).toThrow(/invalid counts/);
    expect(() => checkProportion(design, 0.5, 'T')).not.toThrow();
  });

  it('maps proportions to 2 asin √p (Cohen 1988, ch. 6: φ(0.5) = π/2)', () => {
    expect(arcsine(0)).toBe(0);
    expect(arcsine(1)).toBe(Math.PI);
    expect(Math.abs(arcsine(0.5) - Math.PI / 2)).toBeLessThan(1e-15);
    expect(cohensH(0.5, 0.5)).toBe(0);
  });
});
