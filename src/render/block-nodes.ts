import type {Code, RootContent} from 'mdast';
import type {InterpretedBlock} from '../interpret/result-record.js';
import {resultsTables} from './results-tables.js';

/**
 * What replaces a ```stet block in the document: its sentence, its tables
 * and its chart (as an image of `charts/ID.svg`), as the block's `show`
 * asks. Every node keeps the block's position so messages point at it.
 */
export function blockNodes(
  code: Code,
  block: InterpretedBlock,
  chart: {alt: string; extra?: readonly {suffix: string; alt: string}[]} | undefined,
): RootContent[] {
  const {spec} = block.computed;
  const position = code.position;
  const nodes: RootContent[] = [];
  if (spec.show.has('sentence')) {
    nodes.push({type: 'paragraph', position, children: [{type: 'text', value: block.result.sentence, position}]});
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
    // Extra charts (post-hoc pairs) follow as their own images: `charts/ID-SUFFIX.svg`.
    for (const extra of chart.extra ?? []) {
      nodes.push({
        type: 'paragraph',
        position,
        children: [{type: 'image', url: `charts/${spec.id}-${extra.suffix}.svg`, alt: extra.alt, title: null, position}],
      });
    }
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
