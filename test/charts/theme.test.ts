import {describe, expect, it} from 'vitest';
import {fontStack, ink, palette, stetConfig} from '../../src/charts/theme.js';
import {lre} from '../helpers/lre.js';
import {contrastRatio, deficiencies, deltaE2000, lab, linearRgb, simulate} from './colour-vision.js';

const white = [1, 1, 1] as const;
const identity = [
  [1, 0, 0],
  [0, 1, 0],
  [0, 0, 1],
] as const;

function smallestDifference(colours: readonly string[], matrix: typeof identity | (typeof deficiencies)['protanopia']): number {
  const labs = colours.map((c) => lab(simulate(linearRgb(c), matrix)));
  let min = Infinity;
  labs.forEach((p, i) => labs.slice(i + 1).forEach((q) => (min = Math.min(min, deltaE2000(p, q)))));
  return min;
}

describe('colour arithmetic used by the palette check', () => {
  // Published to 4 decimals, so agreement to 4 significant digits is all they can show.
  it('reproduces the CIEDE2000 test pairs', () => {
    // Sharma, Wu & Dalal 2005, Color Res. Appl. 30(1), Table 1, pair 1
    expect(lre(deltaE2000([50, 2.6772, -79.7751], [50, 0, -82.7485]), 2.0425)).toBeGreaterThanOrEqual(4);
    // Sharma, Wu & Dalal 2005, Table 1, pair 7
    expect(lre(deltaE2000([50, 0, 0], [50, -1, 2]), 2.3669)).toBeGreaterThanOrEqual(4);
    // Sharma, Wu & Dalal 2005, Table 1, pair 17
    expect(lre(deltaE2000([50, 2.5, 0], [73, 25, -18]), 27.1492)).toBeGreaterThanOrEqual(4);
  });

  it('gives black on white the WCAG maximum contrast', () => {
    // WCAG 2.x definition: (1 + 0.05) / (0 + 0.05) = 21
    expect(lre(contrastRatio(linearRgb('#000000'), white), 21)).toBeGreaterThanOrEqual(15);
  });
});

describe('palette', () => {
  it('has at least 3:1 contrast on white for every colour', () => {
    // WCAG 2.1 SC 1.4.11 non-text contrast threshold
    for (const colour of palette) expect(contrastRatio(linearRgb(colour), white), colour).toBeGreaterThanOrEqual(3);
  });

  it('keeps every pair distinct with normal vision', () => {
    // Measured 21.7 (CIEDE2000); a floor of 20 catches any edit that brings two hues together.
    expect(smallestDifference(palette, identity)).toBeGreaterThanOrEqual(20);
  });

  it.each(Object.keys(deficiencies) as (keyof typeof deficiencies)[])('keeps every pair distinct under simulated %s', (kind) => {
    // Measured 13.3–13.4; the Okabe–Ito set it was derived from (yellow left out) reaches 10.9 under tritanopia.
    expect(smallestDifference(palette, deficiencies[kind])).toBeGreaterThanOrEqual(13);
  });

  it('gives neutral inks readable contrast for text', () => {
    // WCAG 2.1 SC 1.4.3: 4.5:1 for normal-size text
    expect(contrastRatio(linearRgb(ink.text), white)).toBeGreaterThanOrEqual(4.5);
    expect(contrastRatio(linearRgb(ink.label), white)).toBeGreaterThanOrEqual(4.5);
  });
});

describe('stetConfig', () => {
  it('uses the palette and a font stack led by Helvetica-metric fonts', () => {
    expect(stetConfig.range?.category).toEqual([...palette]);
    expect(stetConfig.font).toBe(fontStack);
    expect(fontStack.split(', ').slice(0, 3)).toEqual(['Helvetica', 'Arial', 'Liberation Sans']);
    expect(fontStack.endsWith('sans-serif')).toBe(true);
  });
});
