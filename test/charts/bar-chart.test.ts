import {describe, expect, it} from 'vitest';
import {barChartSpec} from '../../src/charts/bar-chart.js';
import {renderSvg} from '../../src/charts/render-svg.js';
import {items} from './svg-items.js';

// Invented counts: these tests check drawing, not statistics.
const counts = [
  {group: 'North', category: 'pass', value: 10},
  {group: 'North', category: 'fail', value: 3},
  {group: 'South & <Co>', category: 'pass', value: 8},
  {group: 'South & <Co>', category: 'fail', value: 6},
];
const options = {title: 'Checks', description: 'Bar chart.', idPrefix: 'fig-b'};

describe('barChartSpec', () => {
  it('draws one bar per cell with a legend of categories', async () => {
    const {svg, warnings} = await renderSvg(barChartSpec({bars: counts, xTitle: 'Supplier', yTitle: 'Count', categoryTitle: 'check'}), options);
    expect(warnings).toEqual([]);
    expect(items(svg, 'bars')).toHaveLength(4);
    expect(svg).toMatch(/<text [^>]*>South &amp; &lt;Co&gt;<\/text>/);
    expect(svg).toMatch(/role-legend-label[^>]*><text [^>]*>pass<\/text>/);
  });

  it('draws proportions on [0, 1] with their intervals and a reference line', async () => {
    const bars = [
      {group: 'North', category: 'fail', value: 0.2, ci: [0.1, 0.4] as const},
      {group: 'South', category: 'fail', value: 0.4, ci: [0.2, 0.6] as const},
    ];
    const {svg} = await renderSvg(barChartSpec({bars, xTitle: 'Supplier', yTitle: 'Proportion fail', proportion: true, reference: 0.3}), options);
    expect(items(svg, 'bars')).toHaveLength(2);
    expect(items(svg, 'intervals')).toHaveLength(2);
    expect(items(svg, 'reference')).toHaveLength(1);
    expect(svg).toMatch(/<text [^>]*>100%<\/text>/);
    // one category: no legend
    expect(svg).not.toContain('role-legend');
  });

  it('renders the same bytes twice, as reviewed', async () => {
    const spec = barChartSpec({bars: counts, xTitle: 'Supplier', yTitle: 'Count', categoryTitle: 'check'});
    const first = await renderSvg(spec, options);
    expect((await renderSvg(spec, options)).svg).toBe(first.svg);
    await expect(first.svg).toMatchFileSnapshot('./__snapshots__/bar-chart.svg');
  });

  it('gives each group a panel when there are more categories than colours', async () => {
    const many = ['g', 'h'].flatMap((group) => Array.from({length: 7}, (_, i) => ({group, category: `c${i}`, value: i + 1})));
    const {svg, warnings} = await renderSvg(barChartSpec({bars: many, xTitle: 'Site', yTitle: 'Count'}), options);
    expect(warnings).toEqual([]);
    expect(svg.match(/<path [^>]*fill="#265EA9"/g)).toHaveLength(14);
    expect(svg).not.toContain('role-legend');
  });

  it('rejects no bars, and intervals with more categories than colours', () => {
    expect(() => barChartSpec({bars: [], xTitle: 'x', yTitle: 'y'})).toThrow(/at least one/);
    const many = Array.from({length: 7}, (_, i) => ({group: 'g', category: `c${i}`, value: i, ci: [0, 1] as const}));
    expect(() => barChartSpec({bars: many, xTitle: 'x', yTitle: 'y'})).toThrow(/categories/);
  });
});
