import {describe, expect, it} from 'vitest';
import {boxStats} from '../../src/charts/box-stats.js';
import {lre} from '../helpers/lre.js';

describe('boxStats', () => {
  it('gives type-7 quartiles and 1.5 × IQR whiskers', () => {
    // numpy 2 (scipy 1.17.1 environment): np.percentile(a, [25, 50, 75]); whiskers a[a >= q1 - 1.5 iqr].min(), a[a <= q3 + 1.5 iqr].max()
    const s = boxStats([31.2, 29.8, 33.1, 30.4, 32.7, 28.9, 35.0, 30.1])!;
    expect(lre(s.q1, 30.025000000000002)).toBeGreaterThanOrEqual(14);
    expect(lre(s.median, 30.799999999999997)).toBeGreaterThanOrEqual(14);
    expect(lre(s.q3, 32.800000000000004)).toBeGreaterThanOrEqual(14);
    expect([s.lowerWhisker, s.upperWhisker]).toEqual([28.9, 35.0]);
    // numpy: 42.0 lies beyond q3 + 1.5 iqr = 40.8, so the upper whisker stops at 37.5
    const t = boxStats([34.6, 36.2, 33.9, NaN, 37.5, 35.1, 42.0])!;
    expect(lre(t.median, 35.650000000000006)).toBeGreaterThanOrEqual(14);
    expect([t.lowerWhisker, t.upperWhisker]).toEqual([33.9, 37.5]);
  });

  it('handles one value and none', () => {
    expect(boxStats([4])).toEqual({q1: 4, median: 4, q3: 4, lowerWhisker: 4, upperWhisker: 4});
    expect(boxStats([NaN])).toBeUndefined();
  });
});
