import type {Root, Text} from 'mdast';
import {SKIP, visit} from 'unist-util-visit';
import {styleNamed} from '../interpret/number-style.js';
import {markedOf, plainText} from '../interpret/symbol-marks.js';
import type {InterpretedBlock} from '../interpret/result-record.js';
import {didYouMean} from '../spec/suggest.js';
import {UserError} from '../user-error.js';
import {formatField} from './format-field.js';
import {placeInText} from './place-in-text.js';
import {markedPhrasing} from './marked-phrasing.js';

/** `{{id}}` or `{{id.path.to.field}}` in prose. */
export const referencePattern = /\{\{\s*([a-z][a-z0-9_-]*)((?:\.[A-Za-z0-9_]+)*)\s*\}\}/g;

/**
 * Replace every reference in the document's text with the value it names.
 * References to blocks that failed are left alone (their error is already
 * reported); unknown ids and paths are errors at the reference.
 */
export function resolveReferences(
  tree: Root,
  blocks: ReadonlyMap<string, InterpretedBlock>,
  failed: ReadonlySet<string>,
  report: (error: UserError) => void,
): void {
  const italic = styleNamed([...blocks.values()][0]?.computed.spec.style).italicSymbols;
  visit(tree, 'text', (node: Text, index, parent) => {
    const value = node.value.replace(referencePattern, (whole, id: string, dotted: string, offset: number) => {
      const place = placeInText(node, offset);
      if (failed.has(id)) return whole;
      const block = blocks.get(id);
      if (!block) {
        report(new UserError(`unknown reference \`{{${id}${dotted}}}\`: no block has id \`${id}\``, {
          ruleId: 'unknown-reference',
          place,
          hint: didYouMean(id, blocks.keys(), `Block ids: ${[...blocks.keys()].join(', ') || 'none'}.`),
        }));
        return whole;
      }
      if (!dotted) return block.compact;
      const path = dotted.slice(1).split('.');
      const text = path[0] === 'sentence' && path.length === 1 ? markedOf(block.segments) : formatField(block, path);
      if (text === undefined) {
        report(new UserError(`unknown field \`${dotted.slice(1)}\` in reference to \`${id}\``, {
          ruleId: 'unknown-reference',
          place,
          hint: `Fields of \`${id}\`: ${Object.keys(block.result).join(', ')}; groups are ${Object.keys(block.result.groups).join(', ')}.`,
        }));
        return whole;
      }
      return text;
    });
    if (value === node.value) return undefined;
    // Values carry marked symbols: the text becomes text and emphasis nodes.
    const nodes = markedPhrasing(value, italic).map((child) => ({...child, position: node.position}));
    if (!parent || index === undefined) {
      node.value = plainText(value);
      return undefined;
    }
    parent.children.splice(index, 1, ...nodes);
    return [SKIP, index + nodes.length];
  });
}
