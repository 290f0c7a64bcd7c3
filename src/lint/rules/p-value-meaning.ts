import type {LintRule} from '../types.js';
import {affirmedHits} from '../wording-scan.js';

/**
 * p described as the probability of a hypothesis, or of the result being
 * chance. A p-value is the probability of data at least this extreme if the
 * null hypothesis were true.
 */
const patterns: readonly RegExp[] = [
  /\b(?:probability|chance|likelihood|odds|risk)\s+(?:that|of)\s+(?:the\s+)?(?:null|alternative|research)?\s*(?:hypothesis|null)\s+(?:is|was|being|were)\s+(?:true|false|correct|wrong|right)\b/,
  /\b(?:probability|chance|likelihood|odds)\s+(?:that|of)\s+(?:the\s+|this\s+|our\s+)?(?:result|finding|difference|effect|association|observed \w+)s?\s+(?:is|was|are|were|being)\s+(?:due to|caused by|produced by|a product of|down to)\s+(?:random\s+|pure\s+|mere\s+)?chance\b/,
  /\b(?:probability|chance|likelihood|odds)\s+(?:that|of)\s+(?:the\s+|this\s+|our\s+)?(?:result|finding|difference|effect|association)s?\s+(?:is|was|are|were|being)\s+(?:real|true|a fluke|random|genuine)\b/,
  /\b\d+(?:\.\d+)?\s*%\s+(?:probability|chance|likelihood)\s+(?:of\s+being|that\s+(?:it|this|the\s+\w+)\s+(?:is|was))\s+(?:real|true|genuine|a fluke)\b/,
  /\b(?:probability|chance|likelihood|odds)\s+(?:that|of)\s+(?:the\s+|this\s+|our\s+)?[\w\s-]{0,30}?\b(?:arose|arises|arise|occurred|happened|came about|appeared)\s+(?:by|through|from)\s+(?:random\s+|pure\s+|mere\s+)?chance\b/,
  /\b\d+(?:\.\d+)?\s*%\s+(?:sure|certain|probability|chance)\s+that\s+[^.;]{0,40}?\b(?:real(?:ly)?|truly|true|genuine(?:ly)?|exists?)\b/,
  /\b(?:be|is|was|are|were|being)\s+(?:just\s+|only\s+|merely\s+|simply\s+)?(?:a\s+)?(?:random\s+|chance\s+|statistical\s+)?flukes?\b/,
  /\b(?:is|was|are|were|be|being)\s+(?:probably\s+|likely\s+|clearly\s+)?(?:just\s+|only\s+|simply\s+|entirely\s+|merely\s+)?(?:due to|caused by|down to|explained by)\s+(?:random\s+|pure\s+|mere\s+)?chance(?:\s+alone)?\b/,
  // "a 3% chance that we are wrong", "a 3% probability of being mistaken".
  /\b\d+(?:\.\d+)?\s*%\s+(?:chance|probability|risk|likelihood)\s+(?:that\s+)?(?:we\s+are|we['’]re|(?:the|our)\s+\w+\s+(?:is|was)|of\s+being)\s+(?:wrong|mistaken|incorrect|in error|a false positive)\b/,
  // "the likelihood that the drop happened randomly", "the possibility that the gap is a coincidence".
  /\b(?:probability|chance|likelihood|odds|possibility)\s+(?:that|of)\s+(?:the\s+|this\s+|our\s+)?[\w\s-]{0,40}?\b(?:(?:is|was|are|were|be|being|arose|arises|arise|occurred|happened|came about|appeared)\s+(?:just\s+|only\s+|merely\s+|simply\s+)?(?:randomly|at random|by (?:accident|coincidence|luck)|(?:a|an)\s+(?:coincidence|fluke|accident of sampling))|(?:(?:is|was|are|were|being)\s+)?(?:due to|caused by|produced by|down to)\s+(?:random\s+|pure\s+|mere\s+)?(?:chance|luck|coincidence))\b/,
  // "the null hypothesis has only a 0.1% probability of being correct".
  /\b(?:null|alternative|H0|H₀|H1|H₁)(?:\s+hypothes[ie]s)?\s+(?:has|had|carries|stands)\s+(?:only\s+|just\s+|a\s+|an\s+)*(?:\d+(?:\.\d+)?\s*%\s+|small\s+|low\s+|high\s+|tiny\s+)?(?:probability|chance|likelihood|odds)\s+of\s+being\s+(?:true|false|correct|wrong|right)\b/,
  /\b\d+(?:\.\d+)?\s*%\s+(?:sure|certain|probability|chance|likely)\s+that\s+(?:the\s+|this\s+)?(?:\w+\s+)?(?:effect|difference|result|null|hypothesis|association)\b(?:\s+(?:is|was)\s+(?:real|true|genuine|due to (?:random\s+)?chance))?/,
];

export const pValueMeaning: LintRule = {
  id: 'p-value-meaning',
  severity: 'warning',
  explanation: 'p is the probability of data at least this extreme if the null hypothesis were true, not the probability of a hypothesis or of chance',
  suggestion: 'Write “if there were no difference, data at least this extreme would occur with probability p” — or simply cite `{{ID.p}}`.',
  checkSentence(sentence) {
    return patterns.flatMap((pattern) => affirmedHits(sentence.masked, pattern, 5)).map((hit) => ({
      start: hit.start,
      end: hit.end,
      message: `“${sentence.text.slice(hit.start, hit.end)}” misreads the p-value as a probability of a hypothesis or of chance`,
    }));
  },
};
