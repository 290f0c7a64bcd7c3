import type {TopLevelSpec} from 'vega-lite';
import {afterEach, describe, expect, it, vi} from 'vitest';
import {escapeXml, prefixIds, renderSvg} from '../../src/charts/render-svg.js';

/** A chart that makes vega emit both a gradient and a clip path, the two kinds of def ids. */
const defsSpec: TopLevelSpec = {
  width: 120,
  height: 80,
  data: {values: [{a: 1, b: 2}, {a: 2, b: 5}, {a: 3, b: 3}]},
  mark: {
    type: 'area',
    clip: true,
    color: {gradient: 'linear', x1: 0, y1: 0, x2: 1, y2: 0, stops: [{offset: 0, color: '#ffffff'}, {offset: 1, color: '#265EA9'}]},
  },
  encoding: {x: {field: 'a', type: 'quantitative', scale: {domain: [0, 2.5]}}, y: {field: 'b', type: 'quantitative'}},
};

const options = {title: 'Strength by mix', description: 'Box plot of strength.', idPrefix: 'fig-a'};

const ids = (svg: string): string[] => [...svg.matchAll(/\sid="([^"]*)"/g)].map((m) => m[1] ?? '');

afterEach(() => vi.restoreAllMocks());

describe('renderSvg', () => {
  it('renders the same spec to the same bytes, even after other charts', async () => {
    const first = await renderSvg(defsSpec, options);
    await renderSvg(defsSpec, {...options, idPrefix: 'other'});
    const second = await renderSvg(defsSpec, options);
    expect(second.svg).toBe(first.svg);
  });

  it('names the chart with an escaped <title> and <desc> as the first children of <svg>', async () => {
    const {svg} = await renderSvg(defsSpec, {title: 'A & <B>', description: 'Say "hi" & \'bye\'', idPrefix: 'c1'});
    expect(svg).toMatch(
      /^<svg [^>]*><title id="c1-title">A &amp; &lt;B&gt;<\/title><desc id="c1-desc">Say &quot;hi&quot; &amp; &apos;bye&apos;<\/desc>/,
    );
    const root = /^<svg [^>]*>/.exec(svg)?.[0] ?? '';
    expect(root).toContain(' role="img"');
    expect(root).toContain(' aria-labelledby="c1-title"');
    expect(root).toContain(' aria-describedby="c1-desc"');
    // vega's own root role is replaced, not duplicated
    expect(root.match(/\srole=/g)).toHaveLength(1);
  });

  it('prefixes every id and every reference, so two charts share none', async () => {
    const a = (await renderSvg(defsSpec, {...options, idPrefix: 'fig-a'})).svg;
    const b = (await renderSvg(defsSpec, {...options, idPrefix: 'fig-b'})).svg;
    const idsA = ids(a);
    const idsB = ids(b);
    // title, desc, one gradient and one clip path each
    expect(idsA.length).toBeGreaterThanOrEqual(4);
    expect(idsA.some((id) => id.includes('gradient'))).toBe(true);
    expect(idsA.some((id) => id.includes('clip'))).toBe(true);
    expect(idsA.every((id) => id.startsWith('fig-a-'))).toBe(true);
    expect(idsA.filter((id) => idsB.includes(id))).toEqual([]);
    const references = [...a.matchAll(/url\(#([^)]*)\)/g)].map((m) => m[1]);
    expect(references.length).toBeGreaterThanOrEqual(2);
    for (const ref of references) expect(idsA).toContain(ref);
  });

  it('returns vega-lite warnings instead of printing them', async () => {
    const warn = vi.spyOn(console, 'warn');
    const spec: TopLevelSpec = {
      data: {values: [{a: 1}]},
      mark: 'point',
      // An invalid aggregate: vega-lite warns and drops it.
      encoding: {x: {field: 'a', type: 'quantitative', aggregate: 'nonsense' as 'mean'}},
    };
    const {warnings} = await renderSvg(spec, options);
    expect(warnings.join('\n')).toMatch(/nonsense/);
    expect(warn).not.toHaveBeenCalled();
  });

  it('refuses to load data from files or URLs', async () => {
    for (const url of ['/etc/hostname', 'data.csv', 'https://example.org/x.csv']) {
      const spec: TopLevelSpec = {data: {url}, mark: 'point', encoding: {x: {field: 'a', type: 'quantitative'}}};
      await expect(renderSvg(spec, options)).rejects.toThrow(/inline/);
    }
  });

  it('rejects an id prefix that is not a plain name', async () => {
    await expect(renderSvg(defsSpec, {...options, idPrefix: 'a"b'})).rejects.toThrow(/idPrefix/);
    await expect(renderSvg(defsSpec, {...options, idPrefix: '1a'})).rejects.toThrow(/idPrefix/);
  });
});

describe('prefixIds', () => {
  it('rewrites ids and references inside tags but not text', () => {
    const svg = '<svg><clipPath id="clip1"/><g clip-path="url(#clip1)"><use href="#clip1"/><text>id="clip1" url(#clip1)</text></g></svg>';
    expect(prefixIds(svg, 'p')).toBe(
      '<svg><clipPath id="p-clip1"/><g clip-path="url(#p-clip1)"><use href="#p-clip1"/><text>id="clip1" url(#clip1)</text></g></svg>',
    );
  });
});

describe('escapeXml', () => {
  it('escapes the five XML special characters', () => {
    expect(escapeXml(`<a href="x">Tom & Jerry's</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;Tom &amp; Jerry&apos;s&lt;/a&gt;');
  });
});
