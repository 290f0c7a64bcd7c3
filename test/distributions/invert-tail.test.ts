import {describe, expect, it} from 'vitest';
import {invertTail} from '../../src/distributions/invert-tail.js';
import {lre} from '../helpers/lre.js';

// The standard exponential: cdf 1 - e^-x, sf e^-x, x·f(x) = x e^-x.
const cdf = (x: number) => -Math.expm1(-x);
const sf = (x: number) => Math.exp(-x);
const xDensity = (x: number) => x * Math.exp(-x);

describe('invertTail', () => {
  it('inverts both tails of the exponential from 1e-300 to ½', () => {
    // Closed forms x = -log1p(-p) and x = -log q: common practice, no source
    for (const p of [1e-300, 1e-20, 0.01, 0.5]) {
      expect(lre(invertTail(cdf, xDensity, p, false, 1), -Math.log1p(-p))).toBeGreaterThanOrEqual(15);
      expect(lre(invertTail(sf, xDensity, p, true, 1), -Math.log(p))).toBeGreaterThanOrEqual(15);
    }
  });

  it('recovers from a start far off, where the tail underflows', () => {
    // sf(1e6) = 0: the bracket walks back towards the body.
    expect(lre(invertTail(sf, xDensity, 1e-10, true, 1e6), 10 * Math.LN10)).toBeGreaterThanOrEqual(15);
    // cdf(1e-320) is subnormal and cdf(0) = 0: it walks up.
    expect(lre(invertTail(cdf, xDensity, 0.25, false, 1e-320), -Math.log1p(-0.25))).toBeGreaterThanOrEqual(15);
  });
});
