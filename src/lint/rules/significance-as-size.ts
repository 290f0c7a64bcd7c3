import type {LintRule} from '../types.js';
import {affirmedHits, isDeniedAfter} from '../wording-scan.js';

const pattern = /\b(?:(?:very\s+)?highly|very|extremely|hugely|strongly|vastly|massively|overwhelmingly)\s+(?:statistically\s+)?significant(?:ly)?\b|\b(?:more|less)\s+(?:statistically\s+)?significant\s+than\b/;

/** A small p-value read as a large effect: "given how tiny the p-value is, the delay must be large". */
const smallP = /\b(?:small|tiny|low|minuscule|minute)(?:\s+the)?\s+(?:p|P)[- ]?values?\b[^.;]{0,60}?\b(?:large|big|huge|strong|substantial|sizeable|sizable|considerable|massive)\b|\bthe\s+(?:smaller|lower|tinier)\s+the\s+p[- ]?values?,?\s+the\s+(?:larger|bigger|stronger|greater)\b|\b(?:p|P)[- ]?values?\s+(?:is|was|were|are)\s+(?:so\s+|very\s+|extremely\s+)?(?:small|tiny|low|minuscule)\b[^.;]{0,60}?\b(?:large|big|huge|strong|substantial|sizeable|sizable|considerable|massive)\b|\bsignificance\s+(?:is|was)\s+(?:very\s+)?(?:strong|huge|enormous|overwhelming|massive)\b/;
/** A negation inside the span ("a small p-value does not mean a large effect") reverses it. */
const negation = /\b(?:not|never|no|nothing|neither)\b|n['’]t\b/i;

export const significanceAsSize: LintRule = {
  id: 'significance-as-size',
  severity: 'warning',
  explanation: 'a smaller p-value is not a larger effect; the size of an effect is the estimate and its interval',
  suggestion: 'Let p speak only to significance: drop the intensifier, and report the size with `{{ID.estimate}}` and `{{ID.effect}}`.',
  checkSentence(sentence) {
    const graded = affirmedHits(sentence.masked, pattern, 3).filter((hit) => !isDeniedAfter(sentence.masked, hit.end));
    const fromP = affirmedHits(sentence.masked, smallP, 3).filter((hit) => !negation.test(hit.match[0]) && !isDeniedAfter(sentence.masked, hit.end));
    return [...graded, ...fromP].map((hit) => ({
      start: hit.start,
      end: hit.end,
      message: `“${sentence.text.slice(hit.start, hit.end)}” grades significance as if it measured the size of the effect`,
    }));
  },
};
