import type {Code, PhrasingContent, RootContent} from 'mdast';
import {styleNamed} from '../interpret/number-style.js';
import type {InterpretedBlock} from '../interpret/result-record.js';
import {resultsTables} from './results-tables.js';

/**
 * What replaces a ```stet block in the document: its sentence, its tables
 * and its chart (as an image of `charts/ID.svg`), as the block's `show`
 * asks. Every node keeps the block's position so messages point at it.
 */
export function blockNodes(code: Code, block: InterpretedBlock, chart: {alt: string} | undefined): RootContent[] {
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
    nodes.push({type: 'paragraph', position, children: mergeText(children)});
  }
  if (spec.show.has('table')) {
    for (const table of resultsTables(block)) nodes.push({...table, position});
  }
  if (chart && spec.show.has('chart')) {
    nodes.push({
      type: 'paragraph',
      position,
      children: [{type: 'image', url: `charts/${spec.id}.svg`, alt: chart.alt, title: null, position}],
    });
  }
  if (spec.caption && (spec.show.has('table') || (chart && spec.show.has('chart')))) {
    nodes.push({
      type: 'paragraph',
      position,
      data: {hProperties: {className: ['stet-caption']}},
      children: [{type: 'emphasis', children: [{type: 'text', value: spec.caption}]}],
    });
  }
  return nodes;
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
