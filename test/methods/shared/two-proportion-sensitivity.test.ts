import {describe, expect, it} from 'vitest';
import {MethodError} from '../../../src/methods/method-error.js';
import {twoProportionSensitivity} from '../../../src/methods/shared/two-proportion-sensitivity.js';
import {twoProportionPower} from '../../../src/methods/shared/two-proportion-power.js';
import {lre} from '../../helpers/lre.js';

describe('twoProportionSensitivity', () => {
  it('shifts the baseline towards ½ for two-sided tests', () => {
    const low = twoProportionSensitivity({p1: 0.2, n1: 80, n2: 90, alpha: 0.05, alternative: 'two-sided', smallestEffect: 0.1});
    // 0.2 + 0.1 rounds to 0.30000000000000004
    expect(lre(low.sensitivity!.power_at_smallest_effect!, twoProportionPower({p1: 0.2, p2: 0.3, n1: 80, n2: 90, alpha: 0.05, alternative: 'two-sided'}))).toBeGreaterThanOrEqual(14);
    const high = twoProportionSensitivity({p1: 0.8, n1: 80, n2: 90, alpha: 0.05, alternative: 'two-sided', smallestEffect: -0.1});
    expect(lre(high.sensitivity!.power_at_smallest_effect!, twoProportionPower({p1: 0.8, p2: 0.7, n1: 80, n2: 90, alpha: 0.05, alternative: 'two-sided'}))).toBeGreaterThanOrEqual(14);
    expect(high.baseline).toBe(0.8);
  });

  it('reaches 80% at the detectable difference in the tested direction', () => {
    const less = twoProportionSensitivity({p1: 0.6, n1: 120, n2: 100, alpha: 0.01, alternative: 'less', smallestEffect: undefined});
    expect(less.sensitivity!.power_at_smallest_effect).toBeNull();
    const delta = less.sensitivity!.min_detectable_effect_80;
    expect(lre(twoProportionPower({p1: 0.6, p2: 0.6 - delta, n1: 120, n2: 100, alpha: 0.01, alternative: 'less'}), 0.8)).toBeGreaterThanOrEqual(12);
  });

  it('warns instead of reporting what cannot exist', () => {
    const tiny = twoProportionSensitivity({p1: 0.5, n1: 3, n2: 3, alpha: 0.05, alternative: 'two-sided', smallestEffect: 0.2});
    expect(tiny.sensitivity).toBeUndefined();
    expect(tiny.warnings.at(-1)).toMatchObject({kind: 'no-sensitivity'});
    expect(() => twoProportionSensitivity({p1: 0.5, n1: 30, n2: 30, alpha: 0.05, alternative: 'greater', smallestEffect: 0})).toThrow(MethodError);
  });
});
