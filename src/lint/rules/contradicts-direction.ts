import type {InterpretedBlock} from '../../interpret/result-record.js';
import {blocksAt} from '../cited-blocks.js';
import type {LintRule, ProseSentence, SentenceFinding} from '../types.js';
import {clauseEnd, clauseStart, hits, isNegated} from '../wording-scan.js';

const up = /\b(?:higher|greater|larger|bigger|stronger|more|increased?|increases|increasing|rose|rise|rises|gained|above|exceed(?:s|ed|ing)?|longer|heavier|taller|wider|thicker|deeper|louder|hotter|warmer)\b/gi;
const down = /\b(?:lower|smaller|weaker|less|fewer|decreased?|decreases|decreasing|fell|falls|dropped|declined?|below|shorter|lighter|narrower|thinner|shallower|quieter|cooler|colder)\b/gi;
/** Words that take the other group straight after them: "South was below North", "North's times exceeded South's". */
const direct = /^(?:above|below|exceed(?:s|ed|ing)?)$/i;
/** Quantity words that may count something other than the outcome. */
const quantityWords = /^(?:more|less|fewer)$/i;
/** Sentences about spread compare SDs, not the estimate. */
const spreadWords = /\b(?:variab\w*|spread|SDs?|standard deviations?|variances?|scatter|dispersion|consisten\w*|uniform\w*|range|spreads)\b/i;

/**
 * A direction word that disagrees with the sign of the cited estimate. Only
 * comparisons that name both groups are read, in three shapes: "B … higher …
 * than … A", "B … above (or exceeded) … A" and "rose from A to B"; the estimate's name says which way it
 * subtracts (`difference in means (B - A)`).
 */
export const contradictsDirection: LintRule = {
  id: 'contradicts-direction',
  severity: 'error',
  explanation: 'the prose says one group is higher (or lower) when the cited estimate points the other way',
  suggestion: 'Turn the comparison round, or cite `{{ID.estimate}}` and let its sign speak.',
  checkSentence(sentence, context) {
    const text = sentence.masked;
    if (spreadWords.test(text)) return [];
    const findings: SentenceFinding[] = [];
    for (const word of [...hits(text, up).map((hit) => ({...hit, sign: 1})), ...hits(text, down).map((hit) => ({...hit, sign: -1}))]) {
      if (isNegated(text, word.start, 3)) continue;
      for (const block of blocksAt(sentence, word.start, context)) {
        const groups = comparedGroups(block);
        if (!groups || groups.value === 0) continue;
        if (quantityWords.test(word.match[0]) && !namesOutcome(sentence, block)) continue;
        const order = claimedOrder(text, word.start, word.end, groups.names);
        if (!order) continue;
        // `order` is [bigger-or-later, other] as the sentence reads for an upward word.
        const claimedSign = word.sign * (order[0] === groups.names[0] ? 1 : -1);
        if (claimedSign === Math.sign(groups.value)) continue;
        const [second, first] = groups.names;
        findings.push({
          start: word.start,
          end: word.end,
          message: `“${sentence.text.slice(word.start, word.end)}” contradicts block \`${block.computed.spec.id}\`: its ${block.result.estimate!.name} is ${groups.value > 0 ? 'positive' : 'negative'}, so ${second} was ${groups.value > 0 ? 'higher' : 'lower'} than ${first}`,
          suggestion: `Check which group is which: block \`${block.computed.spec.id}\` estimates ${second} − ${first}; cite \`{{${block.computed.spec.id}.estimate}}\`.`,
        });
      }
    }
    return findings;
  },
};

/** For `difference in means (B - A)`: [B, A] and the value; other estimates have no groups. */
function comparedGroups(block: InterpretedBlock): {names: [string, string]; value: number} | undefined {
  const estimate = block.result.estimate;
  if (!estimate || !/mean|median|Hodges/i.test(estimate.name)) return undefined;
  const match = /\(([^()]+?) - ([^()]+)\)\s*$/.exec(estimate.name);
  return match ? {names: [match[1]!.trim(), match[2]!.trim()], value: estimate.value} : undefined;
}

/**
 * Which named group the sentence puts first: in "G1 … higher … than … G2"
 * and "higher in G1 than in G2" it is G1; in "rose from G2 to G1" it is G1.
 * Undefined unless both groups are named in the comparison.
 */
function claimedOrder(text: string, start: number, end: number, names: readonly [string, string]): [string, string] | undefined {
  const from = clauseStart(text, start);
  if (direct.test(text.slice(start, end))) {
    const later = firstNamed(text.slice(end, Math.min(clauseEnd(text, end + 1), end + 40)), names);
    const earlier = later && lastNamed(text.slice(from, start), names.filter((name) => name !== later));
    return later && earlier ? [earlier, later] : undefined;
  }
  const than = /\bthan\b/i.exec(text.slice(end));
  if (than && !/[;,]/.test(text.slice(end, end + than.index))) {
    const thanAt = end + than.index + than[0].length;
    const after = text.slice(thanAt, Math.min(clauseEnd(text, thanAt + 1), thanAt + 40));
    const later = firstNamed(after, names);
    const earlier = lastNamed(text.slice(from, end + than.index), names.filter((name) => name !== later));
    if (later && earlier) return [earlier, later];
  }
  const fromTo = /\bfrom\s+(?:the\s+)?(.{1,40}?)\s+to\s+(?:the\s+)?(.{1,40}?)(?=[\s,.;)]|$)/i.exec(text.slice(end, clauseEnd(text, end + 1)));
  if (fromTo) {
    const a = firstNamed(fromTo[1]!, names);
    const b = firstNamed(fromTo[2]!, names);
    if (a && b && a !== b) return [b, a];
  }
  return undefined;
}

function namePattern(name: string): RegExp {
  return new RegExp(`(?<![\\w-])${name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}(?![\\w-])`, 'gi');
}

function firstNamed(text: string, names: readonly string[]): string | undefined {
  let best: {name: string; at: number} | undefined;
  for (const name of names) {
    const at = text.search(namePattern(name));
    if (at >= 0 && (!best || at < best.at)) best = {name, at};
  }
  return best?.name;
}

function lastNamed(text: string, names: readonly string[]): string | undefined {
  let best: {name: string; at: number} | undefined;
  for (const name of names) {
    const all = [...text.matchAll(namePattern(name))];
    const at = all.at(-1)?.index;
    if (at !== undefined && (!best || at > best.at)) best = {name, at};
  }
  return best?.name;
}

/** Whether the sentence names the block's outcome ("more slump"), so a quantity word is about it. */
function namesOutcome(sentence: ProseSentence, block: InterpretedBlock): boolean {
  const {spec, names} = block.computed;
  const words = [...String(spec.y).split(/[_\s-]+/), ...names.outcome.split(/\s+/)].filter((word) => word.length >= 4 && !/^(?:mean|the|with)$/i.test(word));
  return words.some((word) => namePattern(word).test(sentence.masked));
}
