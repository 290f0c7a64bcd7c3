import {describe, expect, it} from 'vitest';
import {boxPlotSpec, jitter} from '../../src/charts/box-plot.js';
import {renderSvg} from '../../src/charts/render-svg.js';
import type {Sample} from '../../src/methods/types.js';
import {items, layerValues} from './svg-items.js';

// Invented data: these tests check drawing, not statistics.
const sample = (label: string, values: number[]): Sample => ({label, values: Float64Array.from(values)});
const mixes = [
  sample('Control', [31.2, 29.8, 33.1, 30.4, 32.7, 28.9, 35.0, 30.1]),
  sample('A & <B>', [34.6, 36.2, 33.9, Number.NaN, 37.5, 35.1, 42.0]),
  sample('Slag', [30.2, 29.5, 31.0, 30.7, 25.9]),
];
const before = sample('Before', [412, 388, 450, 401, 395, 430]);
const after = sample('After', [398, 380, 441, 407, 372, 415]);
const options = {title: 'Strength by mix', description: 'Box plots with every specimen.', idPrefix: 'fig-strength'};

describe('boxPlotSpec', () => {
  it('draws one point per finite observation and one mean per group', async () => {
    const {svg, warnings} = await renderSvg(boxPlotSpec({samples: mixes, yTitle: 'Strength', units: 'MPa'}), options);
    expect(warnings).toEqual([]);
    expect(items(svg, 'points')).toHaveLength(8 + 6 + 5);
    expect(items(svg, 'means')).toHaveLength(3);
    expect(items(svg, 'pairs')).toHaveLength(0);
  });

  it('titles the y axis with units and writes group labels escaped', async () => {
    const {svg} = await renderSvg(boxPlotSpec({samples: mixes, yTitle: 'Strength', units: 'MPa'}), options);
    expect(svg).toMatch(/<text [^>]*>Strength \(MPa\)<\/text>/);
    expect(svg).toMatch(/<text [^>]*>A &amp; &lt;B&gt;<\/text>/);
    expect(svg).not.toContain('<B>');
  });

  it('joins each subject of a paired design with one line', async () => {
    const {svg} = await renderSvg(boxPlotSpec({samples: [before, after], yTitle: 'Reaction time', units: 'ms', paired: true}), options);
    const lines = items(svg, 'pairs');
    expect(lines).toHaveLength(6);
    // Each line is one segment, from the first box to the second.
    for (const line of lines) expect(line).toMatch(/ d="M[-\d.,]+L[-\d.,]+"/);
    expect(items(svg, 'points')).toHaveLength(12);
  });

  it('leaves a subject with a missing value out of both boxes', async () => {
    const gap = sample('After', [398, Number.NaN, 441, 407, 372, 415]);
    const {svg} = await renderSvg(boxPlotSpec({samples: [before, gap], yTitle: 'Reaction time', paired: true}), options);
    expect(items(svg, 'pairs')).toHaveLength(5);
    expect(items(svg, 'points')).toHaveLength(10);
  });

  it('marks each mean beside its box with the given interval, cutting an infinite bound at the data', async () => {
    const intervals = [[30, 32.5], [33, Infinity], [-Infinity, 31]] as const;
    const spec = boxPlotSpec({samples: mixes, yTitle: 'Strength', intervals});
    const {svg} = await renderSvg(spec, options);
    expect(items(svg, 'intervals')).toHaveLength(3);
    expect(items(svg, 'means')).toHaveLength(3);
    const rows = layerValues(spec, 'means');
    expect(rows.map((r) => [r['lower'], r['upper'], r['open']])).toEqual([
      [30, 32.5, undefined],
      [33, 42.0, 'upper'],
      [25.9, 31, 'lower'],
    ]);
    // Means by summarize, NaN left out: (34.6 + 36.2 + 33.9 + 37.5 + 35.1 + 42.0) / 6
    expect(rows[1]?.['centre']).toBeCloseTo(36.55, 12);
    // beside the box, never on it
    for (const r of rows) expect(Number(r['side'])).toBeGreaterThan(Number(r['box']));
  });

  it('shows a mean alone where a group has no interval', async () => {
    const {svg} = await renderSvg(boxPlotSpec({samples: mixes, yTitle: 'Strength', intervals: [[30, 32.5], undefined, [29, 31]]}), options);
    expect(items(svg, 'intervals')).toHaveLength(2);
    expect(items(svg, 'means')).toHaveLength(3);
  });

  it('draws a strip plot without boxes, and a dashed reference line', async () => {
    const {svg} = await renderSvg(boxPlotSpec({samples: mixes, yTitle: 'Strength', boxes: false, reference: 30}), options);
    // Boxes are the only translucent rectangles.
    expect(svg).not.toContain('fill-opacity="0.12"');
    expect(items(svg, 'points')).toHaveLength(19);
    expect(items(svg, 'reference')).toHaveLength(1);
    const boxed = (await renderSvg(boxPlotSpec({samples: mixes, yTitle: 'Strength'}), options)).svg;
    expect(boxed.match(/fill-opacity="0.12"/g)).toHaveLength(3);
  });

  it('names its layers with a prefix so two box plots can share a chart', () => {
    const spec = boxPlotSpec({samples: mixes, yTitle: 'Strength', layerPrefix: 'd-'}) as {layer: {name?: string}[]};
    const names = spec.layer.map((l) => l.name).filter((n) => n !== undefined);
    expect(names.length).toBeGreaterThanOrEqual(3);
    for (const name of names) expect(name.startsWith('d-')).toBe(true);
  });

  it('writes no randomness or clock into the spec', () => {
    const text = JSON.stringify(boxPlotSpec({samples: mixes, yTitle: 'Strength'}));
    expect(text).not.toMatch(/random|now\(/);
    expect(JSON.stringify(boxPlotSpec({samples: mixes, yTitle: 'Strength'}))).toBe(text);
  });

  it('rejects misuse', () => {
    expect(() => boxPlotSpec({samples: [], yTitle: 'y'})).toThrow(/at least one/);
    expect(() => boxPlotSpec({samples: [before, before], yTitle: 'y'})).toThrow(/distinct/);
    expect(() => boxPlotSpec({samples: mixes, yTitle: 'y', paired: true})).toThrow(/exactly two/);
    expect(() => boxPlotSpec({samples: [before, sample('After', [1, 2])], yTitle: 'y', paired: true})).toThrow(/row-aligned/);
    expect(() => boxPlotSpec({samples: mixes, yTitle: 'y', intervals: [[1, 2]]})).toThrow(/intervals/);
  });

  it('renders a small fixed chart exactly as reviewed', async () => {
    const intervals = [[29.5, 33.3], [33.8, 39.2], [26.9, 32.2]] as const;
    const {svg} = await renderSvg(boxPlotSpec({samples: mixes, yTitle: 'Strength', units: 'MPa', intervals}), options);
    await expect(svg).toMatchFileSnapshot('./__snapshots__/box-plot-groups.svg');
    const paired = await renderSvg(boxPlotSpec({samples: [before, after], yTitle: 'Reaction time', units: 'ms', paired: true}), {
      ...options,
      idPrefix: 'fig-paired',
    });
    await expect(paired.svg).toMatchFileSnapshot('./__snapshots__/box-plot-paired.svg');
  });
});

describe('jitter', () => {
  it('is centred at the first row and stays in [-1, 1)', () => {
    expect(jitter(0)).toBe(0);
    for (let i = 0; i < 1000; i++) {
      expect(jitter(i)).toBeGreaterThanOrEqual(-1);
      expect(jitter(i)).toBeLessThan(1);
    }
  });

  it.each([10, 50, 200])('spreads the first %i rows evenly', (n) => {
    // Three-distance theorem (Sós 1958): the gaps of frac(i/φ) take at most three
    // values, so none is much below the even spacing 2/n (measured: 0.56–0.66 of it).
    const sorted = Array.from({length: n}, (_, i) => jitter(i)).sort((a, b) => a - b);
    const gaps = sorted.slice(1).map((v, i) => v - (sorted[i] ?? v));
    expect(Math.min(...gaps)).toBeGreaterThan(0.5 * (2 / n));
  });
});
