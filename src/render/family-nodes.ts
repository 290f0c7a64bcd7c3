import type {Code, RootContent} from 'mdast';
import path from 'node:path';
import {familyChartPath} from '../charts/family-charts.js';
import type {RenderedChart} from '../charts/render-draft.js';
import type {InterpretedBlock} from '../interpret/result-record.js';
import {wording} from '../interpret/wording.js';
import {captionParagraph} from './block-nodes.js';
import type {FloatCounter} from './float-numbers.js';

/** The figure name of a family's forest plot (`family-NAME`), as `{{fig:family-NAME}}` refers to it. */
export function familyFigureName(family: string): string {
  return path.basename(familyChartPath(family));
}

/**
 * Where each family's forest plot goes: after the last block of the family
 * in document order, once all its estimates have been shown.
 * @returns family name by the id of the block it follows.
 */
export function familyPlacement(blocks: Iterable<InterpretedBlock>, charts: ReadonlyMap<string, RenderedChart>): Map<string, string> {
  const last = new Map<string, string>();
  for (const block of blocks) {
    const family = block.computed.spec.family;
    if (family !== undefined && charts.has(family)) last.set(family, block.computed.spec.id);
  }
  return new Map([...last].map(([family, id]) => [id, family]));
}

/** The family's forest plot as an image and its numbered caption. */
export function familyNodes(family: string, chart: RenderedChart, size: number, floats: FloatCounter, position: Code['position']): RootContent[] {
  const name = familyFigureName(family);
  return [
    {type: 'paragraph', position, children: [{type: 'image', url: `charts/${name}.svg`, alt: chart.alt, title: null, position}]},
    captionParagraph(`Figure ${floats.figure(name)}.`, wording.familyCaption(family, size), `fig-${name}-caption`, 'fig', position),
  ];
}
