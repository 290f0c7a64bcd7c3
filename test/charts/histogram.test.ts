import {describe, expect, it} from 'vitest';
import {histogramSpec} from '../../src/charts/histogram.js';
import {renderSvg} from '../../src/charts/render-svg.js';
import {items, layerValues} from './svg-items.js';

// Invented data: these tests check drawing, not statistics.
const values = Float64Array.from([31.2, 29.8, 33.1, 30.4, 32.7, 28.9, 35.0, 30.1, 34.2, 31.9, NaN]);
const options = {title: 'Strength', description: 'Histogram of strength.', idPrefix: 'fig-h'};
const input = {
  values,
  xTitle: 'Strength',
  units: 'MPa',
  reference: {value: 32, label: 'μ₀ = 32 MPa'},
  estimate: {value: 31.73, ci: [30.5, Infinity] as const, label: 'mean, 95% CI'},
};

describe('histogramSpec', () => {
  it('bins every finite value and marks the null value and the interval once', async () => {
    const spec = histogramSpec(input);
    expect(layerValues(spec, 'bars')).toHaveLength(10);
    const {svg, warnings} = await renderSvg(spec, options);
    expect(warnings).toEqual([]);
    // Sturges: ⌈log₂ 10⌉ + 1 = 5 bins at most
    const bars = items(svg, 'bars');
    expect(bars.length).toBeGreaterThanOrEqual(3);
    expect(bars.length).toBeLessThanOrEqual(5);
    expect(items(svg, 'reference')).toHaveLength(1);
    expect(items(svg, 'interval')).toHaveLength(1);
    expect(items(svg, 'estimate')).toHaveLength(1);
    expect(svg).toMatch(/<text [^>]*>Strength \(MPa\)<\/text>/);
    expect(svg).toMatch(/<text [^>]*>μ₀ = 32 MPa<\/text>/);
  });

  it('cuts a one-sided interval at the largest value drawn', () => {
    const [row] = layerValues(histogramSpec(input), 'interval');
    expect(row).toMatchObject({lower: 30.5, upper: 35.0});
  });

  it('renders the same bytes twice, as reviewed', async () => {
    const first = await renderSvg(histogramSpec(input), options);
    const second = await renderSvg(histogramSpec(input), options);
    expect(second.svg).toBe(first.svg);
    await expect(first.svg).toMatchFileSnapshot('./__snapshots__/histogram.svg');
  });

  it('rejects an empty sample', () => {
    expect(() => histogramSpec({values: Float64Array.from([NaN]), xTitle: 'x'})).toThrow(/finite/);
  });
});
