import type {Element, ElementContent, Root as HastRoot} from 'hast';
import type {Root} from 'mdast';
import rehypeStringify from 'rehype-stringify';
import remarkRehype from 'remark-rehype';
import {unified} from 'unified';
import {visit} from 'unist-util-visit';
import type {BlockChart} from '../charts/block-chart.js';

/**
 * The document body as HTML. Raw HTML in the author's Markdown is dropped
 * (remark-rehype's safe default); charts are the only raw markup, and they
 * are SVG stet rendered itself from escaped data.
 */
export async function toHtmlBody(tree: Root, charts: ReadonlyMap<string, BlockChart>): Promise<string> {
  const processor = unified().use(remarkRehype).use(rehypeStringify, {allowDangerousHtml: true});
  const hast = (await processor.run(structuredClone(tree))) as HastRoot;
  inlineCharts(hast, charts);
  return processor.stringify(hast);
}

/** Replace `<img src="charts/ID.svg">` by a figure holding the SVG itself. */
function inlineCharts(hast: HastRoot, blockCharts: ReadonlyMap<string, BlockChart>): void {
  // Every chart file by name: a block's own and its extras (`ID-pairs`).
  const charts = new Map<string, {svg: string}>();
  for (const [id, chart] of blockCharts) {
    charts.set(id, chart);
    for (const extra of chart.extra) charts.set(`${id}-${extra.suffix}`, extra);
  }
  visit(hast, 'element', (node: Element, index, parent) => {
    if (node.tagName !== 'p' || !parent || index === undefined) return;
    const image = node.children.find((child): child is Element => child.type === 'element' && child.tagName === 'img');
    const id = /^charts\/(.+)\.svg$/.exec(String(image?.properties['src'] ?? ''))?.[1];
    const chart = id === undefined ? undefined : charts.get(id);
    if (!image || !chart) return;
    // A hast `raw` node: printed verbatim by rehype-stringify with allowDangerousHtml.
    const svg = {type: 'raw', value: chart.svg} as unknown as ElementContent;
    parent.children[index] = {type: 'element', tagName: 'figure', properties: {className: ['stet-chart'], id: `fig-${id}`}, children: [svg]};
  });
}
