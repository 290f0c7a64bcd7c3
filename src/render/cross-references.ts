import type {Link, Parent, PhrasingContent, Root, Text} from 'mdast';
import {SKIP, visit} from 'unist-util-visit';
import {didYouMean} from '../spec/suggest.js';
import {UserError, type Place} from '../user-error.js';
import type {FloatNumbers} from './float-numbers.js';
import {placeInText} from './place-in-text.js';

/** `{{fig:ID}}` or `{{tab:ID}}` in prose. */
const crossReferencePattern = /\{\{\s*(fig|tab):([a-z][a-z0-9_-]*)\s*\}\}/g;

const kinds = {
  fig: {word: 'Figure', anchor: 'fig', what: 'a chart', key: 'figures'},
  tab: {word: 'Table', anchor: 'tab', what: 'a results table', key: 'tables'},
} as const;

/**
 * Replace cross-references by "Figure 2" / "Table 3", linked to the float
 * (the link matters in HTML; Markdown shows it as a link to an anchor of
 * the HTML). A reference to a block without that float is an error at the
 * reference. References to failed blocks stay as written.
 */
export function resolveCrossReferences(
  tree: Root,
  floats: FloatNumbers,
  failed: ReadonlySet<string>,
  report: (error: UserError) => void,
): void {
  visit(tree, 'text', (node: Text, index, parent: Parent | undefined) => {
    if (!parent || index === undefined || parent.type === 'link') return;
    const pieces: PhrasingContent[] = [];
    let last = 0;
    for (const match of node.value.matchAll(crossReferencePattern)) {
      const [whole, kind = 'fig', id = ''] = match;
      const {word, anchor, what, key} = kinds[kind as keyof typeof kinds];
      const number = floats[key].get(id);
      if (number === undefined) {
        if (!failed.has(id)) report(unknownFloat(whole, id, what, [...floats[key].keys()], placeInText(node, match.index)));
        continue;
      }
      if (match.index > last) pieces.push({type: 'text', value: node.value.slice(last, match.index)});
      const link: Link = {type: 'link', url: `#${anchor}-${id}`, children: [{type: 'text', value: `${word} ${number}`}]};
      pieces.push(link);
      last = match.index + whole.length;
    }
    if (pieces.length === 0) return;
    if (last < node.value.length) pieces.push({type: 'text', value: node.value.slice(last)});
    for (const piece of pieces) piece.position = node.position;
    parent.children.splice(index, 1, ...(pieces as typeof parent.children));
    return [SKIP, index + pieces.length];
  });
}

function unknownFloat(whole: string, id: string, what: string, known: string[], place: Place | undefined): UserError {
  return new UserError(`cross-reference \`${whole}\`: no block \`${id}\` with ${what}`, {
    ruleId: 'unknown-reference',
    place,
    hint: didYouMean(id, known, known.length ? `Blocks with ${what}: ${known.join(', ')}.` : `No block shows ${what}; check its \`show\` and \`chart\` keys.`),
  });
}
