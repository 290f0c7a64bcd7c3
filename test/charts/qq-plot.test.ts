import {describe, expect, it} from 'vitest';
import {qqLine, qqPlotSpec, qqPoints} from '../../src/charts/qq-plot.js';
import {renderSvg} from '../../src/charts/render-svg.js';
import {lre} from '../helpers/lre.js';
import {items} from './svg-items.js';

const eight = Float64Array.from([31.2, 29.8, 33.1, 30.4, 32.7, 28.9, 35.0, 30.1]);
const twelve = Float64Array.from([5, 3, 8, 1, 9, 2, 7, 4, 6, 12, 10, 11]);

describe('qqPoints', () => {
  it('uses Blom positions up to n = 10 and (i − ½)/n above', () => {
    // scipy 1.17.1: stats.norm.ppf((1 - 3/8) / (8 + 1/4)), R ppoints(8)[1]
    expect(lre(qqPoints(eight)[0]!.theoretical, -1.4342001596863792)).toBeGreaterThanOrEqual(13);
    expect(lre(qqPoints(eight)[7]!.theoretical, 1.4342001596863792)).toBeGreaterThanOrEqual(13);
    // scipy 1.17.1: stats.norm.ppf((1 - 1/2) / 12), R ppoints(12)[1]
    expect(lre(qqPoints(twelve)[0]!.theoretical, -1.731664396122245)).toBeGreaterThanOrEqual(13);
    expect(qqPoints(eight).map((p) => p.value)).toEqual([28.9, 29.8, 30.1, 30.4, 31.2, 32.7, 33.1, 35.0]);
  });

  it('draws the reference line through the quartiles', () => {
    // Type 7 quartiles of 1..12 are 3.75 and 9.25; the normal quartiles ±0.6744897501960817 (scipy 1.17.1 norm.ppf(0.75))
    const {intercept, slope} = qqLine(twelve);
    expect(lre(slope, 5.5 / (2 * 0.6744897501960817))).toBeGreaterThanOrEqual(13);
    expect(lre(intercept, 6.5)).toBeGreaterThanOrEqual(13);
  });
});

describe('qqPlotSpec', () => {
  const options = {title: 'Q–Q', description: 'Normal Q–Q plot.', idPrefix: 'fig-qq'};
  it('draws one point per finite value and one line', async () => {
    const {svg, warnings} = await renderSvg(qqPlotSpec({values: Float64Array.from([...eight, NaN]), yTitle: 'Strength', units: 'MPa'}), options);
    expect(warnings).toEqual([]);
    expect(items(svg, 'points')).toHaveLength(8);
    expect(items(svg, 'line')).toHaveLength(1);
    expect(svg).toMatch(/<text [^>]*>Normal quantile<\/text>/);
  });

  it('renders the same bytes twice, as reviewed', async () => {
    const spec = qqPlotSpec({values: eight, yTitle: 'Strength', units: 'MPa'});
    const first = await renderSvg(spec, options);
    expect((await renderSvg(spec, options)).svg).toBe(first.svg);
    await expect(first.svg).toMatchFileSnapshot('./__snapshots__/qq-plot.svg');
  });

  it('rejects fewer than three values', () => {
    expect(() => qqPlotSpec({values: Float64Array.from([1, 2]), yTitle: 'y'})).toThrow(/three/);
  });
});
