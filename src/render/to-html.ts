import type {Element, ElementContent, Root as HastRoot} from 'hast';
import type {Root} from 'mdast';
import rehypeRaw from 'rehype-raw';
import rehypeSanitize, {defaultSchema, type Options as SanitizeSchema} from 'rehype-sanitize';
import rehypeStringify from 'rehype-stringify';
import remarkRehype from 'remark-rehype';
import {unified} from 'unified';
import {visit} from 'unist-util-visit';
import type {BlockChart} from '../charts/block-chart.js';

export interface HtmlBodyOptions {
  /** Keep the author's raw HTML as written (default: sanitised). */
  allowHtml?: boolean | undefined;
  /** Charts that belong to no block (family forest plots), by file name without `.svg`. */
  moreCharts?: ReadonlyMap<string, {svg: string}> | undefined;
}

/**
 * GitHub-style sanitising, plus stet's own `stet-*` classes (captions,
 * tables) and block markers. Ids are still prefixed (`user-content-`) so an author's HTML
 * cannot clobber the page's; stet sets its own ids after sanitising.
 */
const schema: SanitizeSchema = {
  ...defaultSchema,
  attributes: {
    ...defaultSchema.attributes,
    // `data-stet-block` marks a block's sentence for the live-reload page of `stet watch --serve`.
    '*': [...(defaultSchema.attributes?.['*'] ?? []), ['className', /^stet-/], 'dataStetBlock'],
  },
};

/**
 * The document body as HTML. The author's raw HTML is parsed and sanitised
 * (scripts, event handlers and `javascript:` links removed) unless
 * `allowHtml`. Charts are the only markup stet adds after sanitising: SVG
 * it rendered itself from escaped data.
 */
export async function toHtmlBody(tree: Root, charts: ReadonlyMap<string, BlockChart>, options: HtmlBodyOptions = {}): Promise<string> {
  const processor = unified().use(remarkRehype, {allowDangerousHtml: true}).use(rehypeRaw);
  if (!options.allowHtml) processor.use(rehypeSanitize, schema);
  const hast = (await processor.run(structuredClone(tree))) as HastRoot;
  restoreStetIds(hast);
  inlineCharts(hast, charts, options.moreCharts ?? new Map());
  return unified().use(rehypeStringify, {allowDangerousHtml: true}).stringify(hast);
}

/** Undo the clobber prefix on ids stet gave its own captions. */
function restoreStetIds(hast: HastRoot): void {
  visit(hast, 'element', (node: Element) => {
    const classes = node.properties['className'];
    const id = node.properties['id'];
    if (Array.isArray(classes) && classes.includes('stet-caption') && typeof id === 'string') {
      node.properties['id'] = id.replace(/^user-content-/, '');
    }
  });
}

/**
 * Replace `<p><img src="charts/ID.svg"></p>` and the caption after it by
 * `<figure id="fig-ID">SVG<figcaption>…</figcaption></figure>`, so the
 * chart and its caption print on one page.
 */
function inlineCharts(hast: HastRoot, blockCharts: ReadonlyMap<string, BlockChart>, more: ReadonlyMap<string, {svg: string}>): void {
  // Every chart file by name: a block's own, its extras (`ID-pairs`) and family plots (`family-NAME`).
  const charts = new Map<string, {svg: string}>(more);
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
    const children: ElementContent[] = [{type: 'raw', value: chart.svg} as unknown as ElementContent];
    const captionAt = parent.children.findIndex((child, at) => at > index && child.type === 'element');
    const caption = parent.children[captionAt];
    if (caption?.type === 'element' && caption.properties['id'] === `fig-${id}-caption`) {
      children.push({type: 'element', tagName: 'figcaption', properties: {className: ['stet-caption']}, children: caption.children});
      parent.children.splice(index + 1, captionAt - index);
    }
    parent.children[index] = {type: 'element', tagName: 'figure', properties: {className: ['stet-chart'], id: `fig-${id}`}, children};
  });
}
