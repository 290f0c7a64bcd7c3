import {describe, expect, it} from 'vitest';
import {wilsonInterval} from '../../../src/methods/shared/wilson-interval.js';
import {lre} from '../../helpers/lre.js';

describe('wilsonInterval', () => {
  // Every reference: mpmath 1.3.0 at 40 digits, Wilson's closed form centre ± half-width.
  it('keeps full relative precision for a tiny lower bound and a bound near 1', () => {
    const tiny = wilsonInterval(1, 1e6, 0.95, 'two-sided');
    expect(lre(tiny[0], 1.7652457674537147e-7)).toBeGreaterThanOrEqual(14);
    expect(lre(tiny[1], 5.664911804311443e-6)).toBeGreaterThanOrEqual(14);
    const high = wilsonInterval(999999, 1e6, 0.99, 'two-sided');
    expect(lre(high[0], 0.9999914825661652)).toBeGreaterThanOrEqual(15);
    expect(lre(high[1], 0.999999882594525)).toBeGreaterThanOrEqual(15);
  });

  it('gives 0 and 1 exactly at the edges', () => {
    const none = wilsonInterval(0, 10, 0.95, 'two-sided');
    expect(none[0]).toBe(0);
    expect(lre(none[1], 0.27753279986288926)).toBeGreaterThanOrEqual(15);
    const all = wilsonInterval(10, 10, 0.95, 'two-sided');
    expect(lre(all[0], 0.7224672001371107)).toBeGreaterThanOrEqual(15);
    expect(all[1]).toBe(1);
  });

  it('puts one-sided bounds at the one-sided level, the other at 0 or 1', () => {
    expect(wilsonInterval(3, 20, 0.95, 'greater')[1]).toBe(1);
    expect(wilsonInterval(3, 20, 0.95, 'less')[0]).toBe(0);
    // 1 - 0.95 and (1 - 0.9)/2 differ in the last bits
    expect(lre(wilsonInterval(3, 20, 0.95, 'greater')[0], wilsonInterval(3, 20, 0.9, 'two-sided')[0])).toBeGreaterThanOrEqual(14);
    expect(() => wilsonInterval(3, 2, 0.95, 'two-sided')).toThrow(/invalid/);
  });
});
