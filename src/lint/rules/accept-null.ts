import type {LintRule} from '../types.js';
import {affirmedHits, isSupposed} from '../wording-scan.js';

/** Accepting, proving or confirming the null, or proving that nothing is there. */
const patterns: readonly RegExp[] = [
  /\b(?:accept(?:s|ed|ing)?|prov(?:e|es|ed|en|ing)|confirm(?:s|ed|ing)?|verif(?:y|ies|ied)|support(?:s|ed|ing)?|favou?r(?:s|ed|ing)?)\s+(?:that\s+)?(?:the\s+)?(?:null(?:\s+hypothes[ie]s)?|H0|H₀|H_0)(?![\w])/,
  /\bnull(?:\s+hypothes[ie]s)?\s+(?:is|was|can be|could be|must be|should be)\s+(?:therefore\s+|thus\s+)?(?:accepted|proven|proved|confirmed|verified)\b/,
  /\b(?:so|therefore|thus|hence|(?:shows?|means?|proves?|demonstrates?|confirms?|establish(?:es)?|indicates?)\s+that)\s+the\s+null(?:\s+hypothes[ie]s)?\s+(?:is|was|must be)\s+(?:true|correct|right)\b/,
  /\b(?:prov(?:e|es|ed|en|ing)|demonstrat(?:e|es|ed|ing)|establish(?:es|ed|ing)?)\s+(?:that\s+)?there\s+(?:is|was|are|were)\s+no\s+\w+/,
  /\b(?:prov(?:e|es|ed|en|ing)|demonstrat(?:e|es|ed|ing)|establish(?:es|ed|ing)?|confirm(?:s|ed|ing)?)\s+(?:that\s+)?(?:there\s+(?:is|was|are|were)\s+)?(?:no|zero)\s+(?:\w+\s+)?(?:effect|difference|association|relationship|correlation|change)\b/,
  /\b(?:prov(?:e|es|ed|en|ing)|demonstrat(?:e|es|ed|ing)|establish(?:es|ed|ing)?)\s+(?:that\s+)?(?:the\s+)?[\w\s'’-]{0,40}?\b(?:are|is|were|was)\s+(?:equal|the same|identical|equivalent)\b/,
  /\b(?:prov(?:e|es|ed|en|ing)|demonstrat(?:e|es|ed|ing)|establish(?:es|ed|ing)?)\s+that\s+[^.;]{0,50}?\b(?:unchanged|unaffected|(?:does|do|did)\s+not\s+(?:change|affect|differ|matter|influence))\b/,
  // "establish that rebalancing has no effect on …": any subject between the verb and the nothing.
  /\b(?:prov(?:e|es|ed|en|ing)|demonstrat(?:e|es|ed|ing)|establish(?:es|ed|ing)?|confirm(?:s|ed|ing)?|verif(?:y|ies|ied))\s+that\s+[^.;]{0,50}?\b(?:has|have|had|makes?|made|exerts?|exerted)\s+no\s+(?:\w+\s+)?(?:effect|difference|influence|impact|association|relationship)\b/,
  // "we conclude that H0 is true", "the data show the null of equal means holds".
  /\b(?:conclud(?:e|es|ed|ing)|shows?|showed|shown|means?|meant|proves?|demonstrates?|confirms?|establish(?:es)?|indicates?|suggests?|know|find|found)\s+(?:that\s+)?(?:the\s+)?(?:null(?:\s+hypothes[ie]s)?|H0|H₀|H_0)(?:\s+of\s+[^.;,()]{1,40}?)?\s+(?:is|was|must be)\s+(?:true|correct|right|valid)\b/,
  /\b(?:shows?|showed|shown|proves?|proved|proven|demonstrates?|demonstrated|confirms?|confirmed|finds?|found)\s+(?:the\s+)?(?:null(?:\s+hypothes[ie]s)?|H0|H₀|H_0)(?:\s+of\s+[^.;,()]{1,40}?)?\s+to\s+be\s+(?:true|correct|right|valid)\b/,
  // "the null hypothesis (of equal wait times) holds / stands / is true", outside a supposition.
  /\b(?:null(?:\s+hypothes[ie]s)?|H0|H₀|H_0)(?:\s+of\s+[^.;,()]{1,40}?)?\s+(?:holds|held|stands|stood|(?:is|was)\s+(?:therefore\s+|thus\s+)?(?:accepted|proven|proved|confirmed|verified|established))\b/,
];

export const acceptNull: LintRule = {
  id: 'accept-null',
  severity: 'warning',
  explanation: 'a test can reject the null hypothesis or fail to reject it; it never accepts or proves it',
  suggestion: 'Write “we fail to reject the null hypothesis”, and say how large an effect the test could have detected.',
  checkSentence(sentence) {
    const found = patterns.flatMap((pattern) => affirmedHits(sentence.masked, pattern, 6)).filter((hit) => !isSupposed(sentence.masked, hit.start));
    // Patterns overlap ("confirms the null … is true"): one finding per place.
    return found.filter((hit, i) => !found.slice(0, i).some((other) => hit.start < other.end && other.start < hit.end)).map((hit) => ({
      start: hit.start,
      end: hit.end,
      message: `“${sentence.text.slice(hit.start, hit.end)}” accepts or proves the null hypothesis; a test cannot do that`,
    }));
  },
};
