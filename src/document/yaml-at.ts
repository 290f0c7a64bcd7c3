import {isMap, isScalar, LineCounter, parseDocument, type Document, type Node} from 'yaml';
import {UserError, type Place} from '../user-error.js';

/**
 * YAML embedded in the report (front matter, block bodies), parsed so that
 * every node can be traced back to its line and column in the report.
 */
export interface PlacedYaml {
  readonly document: Document.Parsed;
  /** Where a node (or the whole text, without one) starts in the report. */
  placeOf(node?: Node | null): Place;
}

/**
 * @param text YAML source.
 * @param origin Report position of the first character of `text`.
 * @param indent Columns stripped from each line (fenced code in lists).
 */
export function parseYamlAt(text: string, origin: Place, indent = 0): PlacedYaml {
  const lineCounter = new LineCounter();
  const document = parseDocument(text, {lineCounter, prettyErrors: false, uniqueKeys: true});
  const placeAt = (offset: number): Place => {
    const {line, col} = lineCounter.linePos(offset);
    return line === 1 ? {line: origin.line, column: origin.column + col - 1} : {line: origin.line + line - 1, column: indent + col};
  };
  const firstError = document.errors[0];
  if (firstError) {
    throw new UserError(`invalid YAML: ${firstError.message.split('\n')[0]}`, {
      ruleId: 'yaml-syntax',
      place: placeAt(firstError.pos[0]),
      hint: 'Check indentation and quoting; a value containing ": " or "#" needs quotes.',
    });
  }
  return {
    document,
    placeOf: (node) => (node?.range ? placeAt(node.range[0]) : origin),
  };
}

/** The mapping's entries with their key nodes, or an error if it is no mapping. */
export function mappingEntries(yaml: PlacedYaml, node: unknown, what: string, hint: string) {
  if (node === null || node === undefined) return [];
  if (!isMap(node)) {
    throw new UserError(`${what} must be a YAML mapping of keys to values`, {
      ruleId: 'yaml-not-mapping',
      place: yaml.placeOf(node as Node),
      hint,
    });
  }
  return node.items.map((pair) => {
    const keyNode = pair.key as Node;
    const key = isScalar(keyNode) ? String(keyNode.value) : String(keyNode);
    return {key, keyNode, valueNode: pair.value as Node | null};
  });
}
