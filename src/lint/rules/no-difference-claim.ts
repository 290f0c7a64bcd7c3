import {significanceClaims} from '../significance-claims.js';
import type {LintContext, LintRule, ProseSentence} from '../types.js';
import {affirmedHits, hits} from '../wording-scan.js';

/** Claims that groups are equal, or that there is nothing there. */
const equality: readonly RegExp[] = [
  /\bno\s+(?:real\s+|actual\s+|true\s+|meaningful\s+)?(?:difference|effect|association|relationship|correlation|link|change)s?\b(?!\s+(?:was|were)\s+(?:detected|found))/,
  /\b(?:is|are|was|were|be|stay(?:s|ed)?|remain(?:s|ed)?|seem(?:s|ed)?|appear(?:s|ed)?|look(?:s|ed)?)\s+(?:therefore\s+|thus\s+|essentially\s+|practically\s+|basically\s+|effectively\s+|just\s+|really\s+)?(?:the\s+same|equal|equivalent|identical|interchangeable|indistinguishable|comparable)\b(?!\s+(?:to\s+(?:the\s+)?(?:reported|stated|printed|shown)\s+precision|(?:to\s+)?within\b|up\s+to\s+rounding))/,
  /\b(?:performs?|performed|behaves?|behaved)\s+(?:equally|the\s+same|identically)\b/,
  /\b(?:did|do|does)\s+not\s+differ\b(?!\s+(?:statistically\s+)?significantly)/,
];

export const noDifferenceClaim: LintRule = {
  id: 'no-difference-claim',
  severity: 'warning',
  explanation: 'a non-significant result does not show that there is no difference; it may be too small to detect',
  suggestion: 'Write “no statistically significant difference was detected; this does not show that they are equal”, and cite `{{ID.sensitivity.min_detectable_effect_80}}`.',
  checkSentence(sentence, context) {
    if (!aboutNonSignificance(sentence, context)) return [];
    // `didNotDiffer` carries its own negation; the others must be affirmed.
    const found = equality.flatMap((pattern, i) => (i === 3 ? hits(sentence.masked, pattern) : affirmedHits(sentence.masked, pattern, 6)));
    return found.map((hit) => ({
      start: hit.start,
      end: hit.end,
      message: `“${sentence.text.slice(hit.start, hit.end)}” claims equality from a non-significant result`,
    }));
  },
};

/** The sentence cites a non-significant block (other than an equivalence test) or says so. */
function aboutNonSignificance(sentence: ProseSentence, context: LintContext): boolean {
  const cited = sentence.blockIds.map((id) => context.blocks.get(id)?.result);
  if (cited.some((result) => result?.method === 'tost')) return false;
  if (cited.some((result) => result?.decision === 'fail-to-reject')) return true;
  return significanceClaims(sentence.masked).some((hit) => hit.claim === 'not-significant');
}
