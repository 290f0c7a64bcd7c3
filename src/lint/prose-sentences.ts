import type {Html, Nodes, Parents, Root, Text} from 'mdast';
import {visit} from 'unist-util-visit';
import {referencePattern} from '../render/resolve-references.js';
import type {Place} from '../user-error.js';
import type {ProseReference, ProseSentence} from './types.js';

/** Nodes whose text is prose an author wrote (list items hold paragraphs). */
const proseContainers = new Set(['paragraph', 'heading', 'tableCell']);
const disableComment = /^<!--\s*stet-lint-disable\s+([\s\S]*?)\s*-->$/;

/**
 * The author's sentences, with report positions: text of paragraphs,
 * headings and table cells. Code, inline code, HTML, front matter and the
 * ```stet blocks are not prose; `{{references}}` are kept but masked.
 */
export function proseSentences(tree: Root, source: string): ProseSentence[] {
  const lines = source.split(/\r?\n/);
  const sentences: ProseSentence[] = [];
  visit(tree, (node, index, parent) => {
    if (!proseContainers.has(node.type)) return;
    const disabled = disabledBefore(parent, index);
    const pieces: Piece[] = [];
    collect(node as Parents, pieces, lines);
    sentences.push(...splitSentences(pieces, disabled));
  });
  return sentences;
}

/** Sentences of a plain string (a generated sentence), placed at line 1. */
export function sentencesOfText(text: string, blockIds: readonly string[] = []): ProseSentence[] {
  const piece: Piece = {text, locate: (offset) => ({line: 1, column: offset + 1})};
  return splitSentences([piece], new Set()).map((sentence) => ({
    ...sentence,
    blockIds: [...new Set([...sentence.blockIds, ...blockIds])],
  }));
}

interface Piece {
  readonly text: string;
  readonly locate: (offset: number) => Place;
}

function disabledBefore(parent: Parents | undefined, index: number | undefined): Set<string> {
  const previous = parent && index !== undefined && index > 0 ? parent.children[index - 1] : undefined;
  if (previous?.type !== 'html') return new Set();
  const ids = disableComment.exec((previous as Html).value.trim())?.[1];
  return new Set(ids ? ids.split(/[\s,]+/).filter(Boolean) : []);
}

function collect(node: Parents, pieces: Piece[], lines: readonly string[]): void {
  for (const child of node.children as Nodes[]) {
    if (child.type === 'text') pieces.push({text: child.value, locate: textLocator(child, lines)});
    else if (child.type === 'inlineCode') pieces.push({text: '#'.repeat(Math.max(1, child.value.length)), locate: startOf(child)});
    else if (child.type === 'break' || child.type === 'html') pieces.push({text: ' ', locate: startOf(child)});
    else if (child.type === 'image' || child.type === 'imageReference' || child.type === 'footnoteReference') continue;
    else if ('children' in child) collect(child, pieces, lines);
  }
}

function startOf(node: Nodes): (offset: number) => Place {
  const start = node.position?.start ?? {line: 1, column: 1};
  return () => ({line: start.line, column: start.column});
}

/**
 * Report place of a character of a text node. Later lines of a node lose
 * their indentation (list items, block quotes) in the tree, so each is found
 * again in its source line; escapes before a character shift it slightly.
 */
function textLocator(node: Text, lines: readonly string[]): (offset: number) => Place {
  const start = node.position?.start ?? {line: 1, column: 1};
  const valueLines = node.value.split('\n');
  const lineStarts = valueLines.map((line, k) => {
    if (k === 0) return start.column;
    const sourceLine = lines[start.line - 1 + k] ?? '';
    const probe = line.slice(0, Math.min(12, line.search(/\\|$/)));
    const found = probe ? sourceLine.indexOf(probe) : -1;
    return found >= 0 ? found + 1 : sourceLine.length - sourceLine.trimStart().length + 1;
  });
  return (offset) => {
    const before = node.value.slice(0, offset);
    const k = before.split('\n').length - 1;
    const inLine = offset - (before.lastIndexOf('\n') + 1);
    return {line: start.line + k, column: (lineStarts[k] ?? 1) + inLine};
  };
}

const abbreviation = /\b(?:e\.g|i\.e|vs|cf|etc|al|approx|Fig|No|Dr|Mr|Ms|St)\.$/;

function splitSentences(pieces: readonly Piece[], disabled: ReadonlySet<string>): ProseSentence[] {
  const text = pieces.map((piece) => piece.text).join('');
  const starts: number[] = [];
  let offset = 0;
  for (const piece of pieces) {
    starts.push(offset);
    offset += piece.text.length;
  }
  const locate = (at: number): Place => {
    let i = starts.length - 1;
    while (i > 0 && starts[i]! > at) i--;
    const piece = pieces[i];
    return piece ? piece.locate(at - starts[i]!) : {line: 1, column: 1};
  };
  const {masked, references} = mask(text);
  const sentences: ProseSentence[] = [];
  let begin = 0;
  const end = /[.!?]["”’)\]]*(?=\s+["“(\[#{A-Z0-9]|\s*$)/g;
  for (const match of masked.matchAll(end)) {
    const stop = match.index + match[0].length;
    if (abbreviation.test(masked.slice(Math.max(0, match.index - 8), match.index + 1))) continue;
    push(begin, stop);
    begin = stop;
  }
  push(begin, text.length);
  return sentences;

  function push(from: number, to: number): void {
    while (from < to && /\s/.test(text[from]!)) from++;
    while (to > from && /\s/.test(text[to - 1]!)) to--;
    if (from >= to) return;
    const own = references
      .filter((reference) => reference.start >= from && reference.end <= to)
      .map((reference) => ({...reference, start: reference.start - from, end: reference.end - from}));
    sentences.push({
      text: text.slice(from, to),
      masked: masked.slice(from, to),
      references: own,
      blockIds: [...new Set(own.map((reference) => reference.id))],
      placeOf: (at) => locate(from + at),
      disabled,
    });
  }
}

/** Blank out references and quoted phrases (mentions, not claims). */
function mask(text: string): {masked: string; references: ProseReference[]} {
  const references: ProseReference[] = [];
  let masked = text.replace(new RegExp(referencePattern.source, 'g'), (whole, id: string, dotted: string, at: number) => {
    references.push({id, path: dotted ? dotted.slice(1).split('.') : [], start: at, end: at + whole.length});
    return '#'.repeat(whole.length);
  });
  masked = masked.replace(/“[^”\n]{1,120}”|"[^"\n]{1,120}"/g, (whole) => whole[0] + '#'.repeat(whole.length - 2) + whole.at(-1));
  return {masked, references};
}
