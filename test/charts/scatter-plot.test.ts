import {describe, expect, it} from 'vitest';
import {regressionBand} from '../../src/charts/regression-band.js';
import {renderSvg} from '../../src/charts/render-svg.js';
import {completePairs, scatterSpec} from '../../src/charts/scatter-plot.js';
import {items} from './svg-items.js';

// Invented data: these tests check drawing, not statistics.
const x = Float64Array.from([1, 2, 3, 4, 5, 6, NaN]);
const y = Float64Array.from([2, 4.1, 5.9, 8.2, 9.9, 12.5, 7]);
const options = {title: 'Scatter', description: 'Scatter plot.', idPrefix: 'fig-s'};
const band = regressionBand({x, intercept: 0, slope: 2, residualSd: 0.3, residualDf: 4, confidence: 0.95, hasIntercept: true, steps: 11});

describe('scatterSpec', () => {
  it('draws one point per complete pair, the band and the line', async () => {
    const {svg, warnings} = await renderSvg(scatterSpec({x, y, xTitle: 'Dose', yTitle: 'Strength', yUnits: 'MPa', band}), options);
    expect(warnings).toEqual([]);
    expect(items(svg, 'points')).toHaveLength(6);
    expect(items(svg, 'band')).toHaveLength(1);
    expect(items(svg, 'fit')).toHaveLength(1);
    expect(svg).toMatch(/<text [^>]*>Strength \(MPa\)<\/text>/);
  });

  it('draws a plain line without a band for a correlation', async () => {
    const {svg} = await renderSvg(scatterSpec({x, y, xTitle: 'Dose', yTitle: 'Strength', line: {intercept: 0, slope: 2}}), options);
    expect(items(svg, 'band')).toHaveLength(0);
    expect(items(svg, 'fit')).toHaveLength(1);
  });

  it('renders the same bytes twice, as reviewed', async () => {
    const spec = scatterSpec({x, y, xTitle: 'Dose', yTitle: 'Strength', yUnits: 'MPa', band});
    const first = await renderSvg(spec, options);
    expect((await renderSvg(spec, options)).svg).toBe(first.svg);
    await expect(first.svg).toMatchFileSnapshot('./__snapshots__/scatter-plot.svg');
  });

  it('titles both axes with their units', () => {
    const spec = scatterSpec({x, y, xTitle: 'Dose', xUnits: 'kg/m³', yTitle: 'Strength', yUnits: 'MPa', band}) as {layer: {encoding: {x: {title: string}; y: {title: string}}}[]};
    expect(spec.layer[0]!.encoding.x.title).toBe('Dose (kg/m³)');
    expect(spec.layer[0]!.encoding.y.title).toBe('Strength (MPa)');
  });

  it('pairs values row by row and refuses misaligned columns', () => {
    expect(completePairs(Float64Array.from([1, NaN, 3]), Float64Array.from([4, 5, NaN]))).toEqual([{x: 1, y: 4}]);
    expect(() => completePairs(Float64Array.from([1]), Float64Array.from([1, 2]))).toThrow(/values/);
  });
});
