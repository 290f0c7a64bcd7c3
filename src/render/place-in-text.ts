import type {Text} from 'mdast';
import type {Place} from '../user-error.js';

/** Report position of a character of a text node (exact unless escapes precede it). */
export function placeInText(node: Text, offset: number): Place | undefined {
  const start = node.position?.start;
  if (!start) return undefined;
  const before = node.value.slice(0, offset);
  const lastNewline = before.lastIndexOf('\n');
  const lines = before.split('\n').length - 1;
  return lines === 0
    ? {line: start.line, column: start.column + offset}
    : {line: start.line + lines, column: offset - lastNewline};
}
