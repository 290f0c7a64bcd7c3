import {describe, expect, it} from 'vitest';
import {intervalPlotSpec} from '../../src/charts/interval-plot.js';
import {renderSvg} from '../../src/charts/render-svg.js';
import {items, layerValues} from './svg-items.js';

// Invented estimates: these tests check drawing, not statistics.
const rows = [
  {label: 'B − A', estimate: 1.2, ci: [-0.3, 2.7] as const},
  {label: 'C − A', estimate: 3, ci: [1, Infinity] as const},
  {label: 'C − B', estimate: 1.8, ci: null},
];
const options = {title: 'Pairs', description: 'Interval plot.', idPrefix: 'fig-i'};

describe('intervalPlotSpec', () => {
  it('draws one estimate per row, an interval where there is one, and the zero line', async () => {
    const spec = intervalPlotSpec({rows, xTitle: 'Difference (MPa)'});
    const {svg, warnings} = await renderSvg(spec, options);
    expect(warnings).toEqual([]);
    expect(items(svg, 'estimates')).toHaveLength(3);
    expect(items(svg, 'intervals')).toHaveLength(2);
    expect(items(svg, 'reference')).toHaveLength(1);
    // the open bound is cut at the largest value drawn (the estimate 3)
    expect(layerValues(spec, 'estimates')[1]).toMatchObject({lower: 1, upper: 3, open: 'upper'});
  });

  it('renders the same bytes twice, as reviewed', async () => {
    const spec = intervalPlotSpec({rows, xTitle: 'Difference (MPa)'});
    const first = await renderSvg(spec, options);
    expect((await renderSvg(spec, options)).svg).toBe(first.svg);
    await expect(first.svg).toMatchFileSnapshot('./__snapshots__/interval-plot.svg');
  });

  it('rejects no rows and repeated labels', () => {
    expect(() => intervalPlotSpec({rows: [], xTitle: 'x'})).toThrow(/at least one/);
    expect(() => intervalPlotSpec({rows: [rows[0]!, rows[0]!], xTitle: 'x'})).toThrow(/distinct/);
  });
});
