import {describe, expect, it} from 'vitest';
import {meanInterval} from '../../src/charts/mean-interval.js';
import {lre} from '../helpers/lre.js';

describe('meanInterval', () => {
  it('matches the t interval of the mean', () => {
    // scipy 1.17.1: stats.t.interval(0.95, 7, loc=v.mean(), scale=stats.sem(v))
    const ci = meanInterval(Float64Array.from([31.2, 29.8, 33.1, 30.4, 32.7, 28.9, 35.0, 30.1]), 0.95)!;
    expect(lre(ci[0], 29.696016727983373)).toBeGreaterThanOrEqual(12);
    expect(lre(ci[1], 33.10398327201662)).toBeGreaterThanOrEqual(12);
  });

  it('leaves out non-finite values and has no interval without spread', () => {
    const withGap = meanInterval(Float64Array.from([31.2, 29.8, NaN, 33.1, 30.4, 32.7, 28.9, 35.0, 30.1]), 0.95)!;
    const without = meanInterval(Float64Array.from([31.2, 29.8, 33.1, 30.4, 32.7, 28.9, 35.0, 30.1]), 0.95)!;
    expect(withGap).toEqual(without);
    expect(meanInterval(Float64Array.from([3]), 0.95)).toBeUndefined();
    expect(meanInterval(Float64Array.from([3, 3, 3]), 0.95)).toBeUndefined();
  });
});
