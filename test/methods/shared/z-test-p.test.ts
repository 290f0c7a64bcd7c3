import {describe, expect, it} from 'vitest';
import {zTestP} from '../../../src/methods/shared/z-test-p.js';
import {lre} from '../../helpers/lre.js';

describe('zTestP', () => {
  it('takes each tail directly', () => {
    // mpmath 1.3.0: ncdf(-9) = 1.1285884059538406e-19 (the normal module's own example)
    expect(lre(zTestP(9, 'greater'), 1.1285884059538406e-19)).toBeGreaterThanOrEqual(14);
    expect(lre(zTestP(-9, 'less'), 1.1285884059538406e-19)).toBeGreaterThanOrEqual(14);
    expect(lre(zTestP(-9, 'two-sided'), 2 * 1.1285884059538406e-19)).toBeGreaterThanOrEqual(14);
    expect(zTestP(0, 'two-sided')).toBe(1);
  });
});
