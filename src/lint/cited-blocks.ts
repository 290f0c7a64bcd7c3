import type {InterpretedBlock} from '../interpret/result-record.js';
import type {LintContext, ProseReference, ProseSentence} from './types.js';

/** Where a sentence turns from one finding to another. */
const turn = /;|\b(?:but|whereas|while|although|though|however|yet|unlike)\b/gi;

/**
 * The tested block a phrase at `at` speaks about: the nearest one cited in its
 * part of the sentence (parts split where the argument turns, "A was
 * significant but B was not"), else the one block an unbroken sentence is
 * about. References to
 * one comparison of a block (`posthoc`, `coefficients`) are not about the
 * block's decision and are left out.
 */
export function blocksAt(sentence: ProseSentence, at: number, context: LintContext): InterpretedBlock[] {
  const turns = [...sentence.masked.matchAll(turn)].map((match) => match.index).filter((index) => index > 0);
  // "Although A, B": the opening clause ends at its comma.
  const opening = /^\s*(?:although|though|while|whereas|unlike)\b[^,]*,/i.exec(sentence.masked);
  if (opening) turns.push(opening[0].length);
  const bounds = [0, ...turns.sort((a, b) => a - b), sentence.masked.length];
  let from = 0;
  let to = sentence.masked.length;
  for (let i = 0; i + 1 < bounds.length; i++) {
    if (at >= bounds[i]! && at < bounds[i + 1]!) [from, to] = [bounds[i]!, bounds[i + 1]!];
  }
  const referenced = new Set(sentence.references.map((reference) => reference.id));
  const cited = sentence.references.filter((reference) => !['posthoc', 'coefficients'].includes(reference.path[0] ?? ''));
  const near = cited.filter((reference) => reference.start >= from && reference.end <= to);
  const implicit = sentence.blockIds.filter((id) => !referenced.has(id));
  const anywhere = new Set([...cited.map((reference) => reference.id), ...implicit]);
  // Without a reference in its own part, a phrase is about the sentence's one
  // block only when the sentence does not turn ("A was not significant, but B …")
  // or cites nothing (a sentence stet wrote for that block).
  const single = anywhere.size === 1 && (bounds.length === 2 || sentence.references.length === 0);
  const distinct = near.length > 0 ? [nearest(near, at).id] : single ? [...anywhere] : [];
  return distinct
    .map((id) => context.blocks.get(id))
    .filter((block): block is InterpretedBlock => block?.result.decision !== undefined);
}

/** The reference closest to a phrase: "A ({{a.p}}) was significant and B ({{b.p}}) was not". */
function nearest(references: readonly ProseReference[], at: number): ProseReference {
  const distance = (reference: ProseReference) => (at < reference.start ? reference.start - at : Math.max(0, at - reference.end));
  return references.reduce((best, reference) => (distance(reference) < distance(best) ? reference : best));
}
