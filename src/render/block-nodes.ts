import type {Code, Paragraph, PhrasingContent, RootContent} from 'mdast';
import {styleNamed} from '../interpret/number-style.js';
import type {InterpretedBlock} from '../interpret/result-record.js';
import type {FloatCounter} from './float-numbers.js';
import {capitalize, wording} from '../interpret/wording.js';
import {resultsTables} from './results-tables.js';

/**
 * What replaces a ```stet block in the document, as the block's `show`
 * asks: its sentence; its results tables under a numbered caption (tables
 * are captioned above); its chart (as an image of `charts/ID.svg`) with a
 * numbered caption below. Every node keeps the block's position so
 * messages point at it.
 */
export function blockNodes(
  code: Code,
  block: InterpretedBlock,
  chart: {alt: string; extra?: readonly {suffix: string; alt: string}[]} | undefined,
  floats: FloatCounter,
): RootContent[] {
  const {spec} = block.computed;
  const position = code.position;
  const nodes: RootContent[] = [];
  if (spec.show.has('sentence')) {
    // Statistic symbols in italics where the style asks (JSON keeps the plain sentence).
    const italic = styleNamed(spec.style).italicSymbols;
    const children: PhrasingContent[] = block.segments.map((segment) =>
      segment.symbol && italic
        ? {type: 'emphasis', position, children: [{type: 'text', value: segment.text, position}]}
        : {type: 'text', value: segment.text, position},
    );
    // `data-stet-block` lets the live-reload page of `stet watch --serve` find the sentence.
    nodes.push({type: 'paragraph', position, data: {hProperties: {dataStetBlock: spec.id}}, children: mergeText(children)});
  }
  if (spec.show.has('table')) {
    const tables = resultsTables(block);
    if (tables.length > 0) nodes.push(caption(block, 'Table', floats.table(spec.id), 'tab', position));
    for (const table of tables) nodes.push({...table, position});
    const plan = block.result.plan;
    if (plan) nodes.push({type: 'paragraph', position, data: {hProperties: {className: ['stet-plan']}}, children: [{type: 'text', value: wording.planNote(plan)}]});
  }
  if (chart && spec.show.has('chart')) {
    nodes.push({
      type: 'paragraph',
      position,
      children: [{type: 'image', url: `charts/${spec.id}.svg`, alt: chart.alt, title: null, position}],
    });
    nodes.push(caption(block, 'Figure', floats.figure(spec.id), 'fig', position));
    // Extra charts (post-hoc pairs) follow as figures of their own: `charts/ID-SUFFIX.svg`.
    for (const extra of chart.extra ?? []) {
      const name = `${spec.id}-${extra.suffix}`;
      nodes.push(
        {type: 'paragraph', position, children: [{type: 'image', url: `charts/${name}.svg`, alt: extra.alt, title: null, position}]},
        captionParagraph(`Figure ${floats.figure(name)}.`, extraCaption(block, extra.suffix), `fig-${name}-caption`, 'fig', position),
      );
    }
  }
  return nodes;
}

/** "Table 2. caption" — the block's own caption, or one from its method and columns. */
function caption(block: InterpretedBlock, word: string, number: number, kind: 'tab' | 'fig', position: Code['position']): Paragraph {
  const {spec, title, names} = block.computed;
  const text = spec.caption ?? `${capitalize(title)}: ${names.outcome}${names.by ? ` by ${names.by}` : ''}.`;
  return captionParagraph(`${word} ${number}.`, text, `${kind}-${spec.id}${kind === 'fig' ? '-caption' : ''}`, kind, position);
}

function extraCaption(block: InterpretedBlock, suffix: string): string {
  const {names} = block.computed;
  return suffix === 'pairs' ? wording.pairsCaption(names.outcome, names.by) : `${capitalize(block.computed.title)}: ${suffix}.`;
}

/** A numbered caption: the label in bold, then the text; its id lets `{{fig:…}}`/`{{tab:…}}` link to it. */
export function captionParagraph(label: string, text: string, id: string, kind: 'tab' | 'fig', position?: Code['position']): Paragraph {
  return {
    type: 'paragraph',
    position,
    data: {hProperties: {className: ['stet-caption', `stet-${kind}-caption`], id}},
    children: [
      {type: 'strong', children: [{type: 'text', value: label}]},
      {type: 'text', value: ` ${text}`},
    ],
  };
}

/** Adjacent text segments (upright symbols) as one node, as Markdown would parse them. */
function mergeText(children: PhrasingContent[]): PhrasingContent[] {
  const merged: PhrasingContent[] = [];
  for (const child of children) {
    const previous = merged.at(-1);
    if (child.type === 'text' && previous?.type === 'text') merged[merged.length - 1] = {...previous, value: previous.value + child.value};
    else merged.push(child);
  }
  return merged;
}
