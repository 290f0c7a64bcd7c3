import * as vega from 'vega';
import {describe, expect, it} from 'vitest';
import {charAdvance, installTextMetrics, measureText, stetTextWidth} from '../../src/charts/text-metrics.js';
import {lre} from '../helpers/lre.js';

describe('measureText', () => {
  // Reference widths in em: sums of hmtx advances of LiberationSans-Regular.ttf
  // (fonts-liberation 1:1.07.4, Debian 12) read with fontTools 4.38. The class
  // table rounds advances by up to 0.066 em, so 2 digits (1%) is what it can promise.
  it.each([
    ['Strength (MPa)', 6.78],
    ['Reaction time (ms)', 8.391],
    ['0.05', 1.946],
    ['A & <B>', 3.725],
  ])('measures %j within 1%% of Liberation Sans', (text, em) => {
    expect(lre(measureText(text, 1000) / 1000, em)).toBeGreaterThanOrEqual(2);
  });

  it('scales with the font size and widens bold text', () => {
    expect(measureText('Control', 22)).toBeCloseTo(2 * measureText('Control', 11), 1);
    expect(measureText('Control', 11, true)).toBeGreaterThan(measureText('Control', 11));
  });

  it('gives digits one width, so numbers of equal length line up', () => {
    const widths = new Set([...'0123456789'].map(charAdvance));
    expect(widths.size).toBe(1);
  });

  it('gives unknown letters a width and combining marks none', () => {
    expect(charAdvance('é')).toBeGreaterThan(0.5);
    expect(charAdvance('\u0301')).toBe(0);
    expect(charAdvance('漢')).toBe(1);
  });
});

describe('stetTextWidth', () => {
  it('reads vega item font size, defaulting to 11 px like vega', () => {
    expect(stetTextWidth({}, 'abc')).toBe(measureText('abc', 11));
    expect(stetTextWidth({fontSize: 20}, 'abc')).toBe(measureText('abc', 20));
    expect(stetTextWidth({fontSize: 20}, '')).toBe(0);
    expect(stetTextWidth({fontSize: 20, fontWeight: 'bold'}, 'abc')).toBe(measureText('abc', 20, true));
  });

  it('never reports more than the truncation limit', () => {
    expect(stetTextWidth({fontSize: 11, limit: 30}, 'a rather long group label')).toBe(30);
  });
});

describe('installTextMetrics', () => {
  it('replaces vega text width and is idempotent', () => {
    installTextMetrics();
    installTextMetrics();
    const metrics = (vega as unknown as {textMetrics: {width: unknown; estimateWidth: unknown}}).textMetrics;
    expect(metrics.width).toBe(stetTextWidth);
    expect(metrics.estimateWidth).toBe(stetTextWidth);
  });
});
