import {significanceClaims} from '../significance-claims.js';
import type {LintContext, LintRule, ProseSentence} from '../types.js';
import {affirmedHits, clauseEnd, clauseStart, hits, isNegated, isSupposed} from '../wording-scan.js';

/** Claims that groups are equal, or that there is nothing there. */
const equality: readonly RegExp[] = [
  // Not the null hypothesis itself: "the null hypothesis of no difference was not rejected".
  /(?<!\b(?:hypothes[ie]s|null|H0|H₀)\s+(?:of|that\s+there\s+(?:is|was|are|were))\s+)\bno\s+(?:real\s+|actual\s+|true\s+|meaningful\s+)?(?:difference|effect|association|relationship|correlation|link|change)s?\b(?!\s+(?:was|were)\s+(?:detected|found))/,
  /\b(?:is|are|was|were|be|stay(?:s|ed)?|remain(?:s|ed)?|seem(?:s|ed)?|appear(?:s|ed)?|look(?:s|ed)?)\s+(?:therefore\s+|thus\s+|essentially\s+|practically\s+|basically\s+|effectively\s+|just\s+|really\s+)?(?:the\s+same|equal|equivalent|identical|interchangeable|indistinguishable|comparable)\b(?!\s+(?:to\s+(?:the\s+)?(?:reported|stated|printed|shown)\s+precision|(?:to\s+)?within\b|up\s+to\s+rounding))/,
  /\b(?:performs?|performed|behaves?|behaved)\s+(?:equally|the\s+same|identically)\b/,
  /\b(?:give|gives|gave|produce[sd]?|yield(?:s|ed)?|show(?:s|ed)?|result(?:s|ed)?\s+in)\s+(?:essentially\s+|practically\s+|basically\s+|effectively\s+|virtually\s+)?(?:identical|equivalent|equal|indistinguishable|the\s+same)\s+(?!(?:decision|conclusion|result|answer|verdict|outcome|p-values?)\b)\w+/,
  /\b(?:is|are|was|were|be|been|seem(?:s|ed)?|appear(?:s|ed)?|perform(?:s|ed)?|behave[sd]?|work(?:s|ed)?|deliver(?:s|ed)?|do|did|does)\s+(?:\w+\s+)?equally\s+\w+/,
  /\b(?:is|are|was|were|remain(?:s|ed)?|stay(?:s|ed)?|be|been)\s+(?:\w+\s+)?(?:unchanged|unaffected|unaltered)\b/,
  /\b(?:left|leaves?|leaving|kept|keeps?)\s+(?:[\w'’-]+\s+){0,4}?(?:unchanged|unaffected|unaltered)\b/,
  // These carry their own negation ("did not differ", "did not change the readings").
  /\b(?:did|do|does|has|have|had)\s*(?:not|n['’]t)\s+(?:differ|change[ds]?|affect(?:ed)?|alter(?:ed)?|influence[ds]?|shift(?:ed)?|impact(?:ed)?|move[ds]?)\b(?![^.;,]{0,40}?\b(?:statistically\s+)?significantly)/,
];
/** Patterns of `equality` that hold their own "not": read for an outer negation only. */
const ownNegation = new Set([equality.length - 1]);
/** "The data show that there is no difference": wrong after any test but an equivalence test. */
const absence = /\b(?:shows?|showed|shown|reveal(?:s|ed)?|indicates?|indicated)\s+(?:that\s+)?there\s+(?:is|was|are|were)\s+no\s+(?:\w+\s+)?(?:difference|effect|association|relationship|correlation|link|change)s?\b/;
/** An equality of spreads ("equal variances assumed") is a model assumption, not the finding. */
const spreadWords = /\b(?:variances?|spreads?|SDs?|standard deviations?|dispersion)\b/i;

export const noDifferenceClaim: LintRule = {
  id: 'no-difference-claim',
  severity: 'warning',
  explanation: 'a non-significant result does not show that there is no difference; it may be too small to detect',
  suggestion: 'Write “no statistically significant difference was detected; this does not show that they are equal”, and cite `{{ID.sensitivity.min_detectable_effect_80}}`.',
  checkSentence(sentence, context) {
    if (citesEquivalence(sentence, context)) return [];
    const text = sentence.masked;
    // An outer negation ("this does not show that the readings did not change") or a
    // supposition ("if the pumps were equal …") makes the claim someone else's.
    const claims = aboutNonSignificance(sentence, context)
      ? equality.flatMap((pattern, i) => (ownNegation.has(i) ? hits(text, pattern).filter((hit) => !isNegated(text, hit.start, 6)) : affirmedHits(text, pattern, 6)))
      : [];
    const found = [...claims, ...affirmedHits(text, absence, 6)]
      .filter((hit) => !isSupposed(text, hit.start) && !spreadWords.test(text.slice(clauseStart(text, hit.start), clauseEnd(text, hit.end))))
      .sort((a, b) => a.start - b.start);
    return found.filter((hit, i) => !found.slice(0, i).some((other) => hit.start < other.end)).map((hit) => ({
      start: hit.start,
      end: hit.end,
      message: `“${sentence.text.slice(hit.start, hit.end)}” claims equality from a non-significant result`,
    }));
  },
};

/** The sentence cites a non-significant block or says so. */
function aboutNonSignificance(sentence: ProseSentence, context: LintContext): boolean {
  const cited = sentence.blockIds.map((id) => context.blocks.get(id)?.result);
  if (cited.some((result) => result?.decision === 'fail-to-reject')) return true;
  return significanceClaims(sentence.masked).some((hit) => hit.claim === 'not-significant');
}

/** An equivalence test (`tost`) can support "equivalent"; the rule leaves its sentences alone. */
function citesEquivalence(sentence: ProseSentence, context: LintContext): boolean {
  return sentence.blockIds.some((id) => context.blocks.get(id)?.result.method === 'tost');
}
