import {clauseStart, hits, isNegated} from './wording-scan.js';

/** What a phrase says about a test's outcome. */
export type Claim = 'significant' | 'not-significant';

export interface ClaimHit {
  readonly start: number;
  readonly end: number;
  readonly claim: Claim;
}

/** Phrases that say the result was not significant, however they are negated. */
const notSignificant = /\b(?:not\s+(?:statistically\s+)?significant(?:ly)?|non-?\s?significant|insignificant|no\s+(?:statistically\s+)?significant|(?:did\s+not|didn['’]t|failed\s+to|does\s+not|do\s+not)\s+reach\s+(?:statistical\s+)?significance|fail(?:s|ed)?\s+to\s+reject|(?:is|was|were|are)\s+not\s+rejected|not\s+(?:be\s+)?rejected|p\s*>\s*0?\.\d+|(?:null(?:\s+hypothes[ie]s)?|H0|H₀)(?:\s+of\s+[^.;,()]{1,40}?)?\s+(?:is|was|were|has\s+been|had\s+been)\s+retained|retain(?:s|ed)?\s+(?:the\s+null|H0|H₀)|no\s+(?:statistical\s+)?evidence\s+(?:of|for)\b|p(?:-value)?\s+(?:was\s+|is\s+)?(?:above|over|greater than|larger than|exceed(?:s|ed)|>)\s*(?:the\s+)?(?:alpha|α|significance level))/;
/** Phrases that say the result was significant, unless negated. */
const significant = /\b(?:(?:statistically\s+)?significant(?:ly)?(?!\s+(?:portion|number|amount|part|share|proportion|fraction|time|cost|effort|level)\b)|(?:reached|reaches|achieved|attained)\s+(?:statistical\s+)?significance|(?:we\s+)?reject(?:s|ed)?\s+(?:the\s+null|H0|H₀)|p(?:-value)?\s+(?:was\s+|is\s+|fell\s+)?(?:below|under|less than|smaller than|<)\s*(?:the\s+)?(?:alpha|α|significance level)|(?:null(?:\s+hypothes[ie]s)?|H0|H₀)(?:\s+of\s+[^.;,()]{1,40}?)?\s+(?:is|was|were|has\s+been|had\s+been)\s+(?:therefore\s+|thus\s+)?rejected)/;

const nearly = /(?:\b(?:marginally|almost|nearly|borderline|approaching|quasi-?|barely|weakly|suggestively|slightly|somewhat|partially|partly|mildly|bordering\s+on|tend(?:s|ed)?\s+to\s+be|(?:close|near)\s+to(?:\s+being)?)\s+(?:statistically\s+)?|\bnear-?)$/i;

/** "Significant at the 10% level" swaps alpha after the fact; near-significance flags it. */
const looserAlpha = /^\s+at\s+(?:the\s+|an?\s+)?(?:(?:10|ten)\s*(?:%|per\s?cent)|0?\.10?)\s+level\b/i;

/**
 * Every claim a sentence makes about significance, in order. A negated
 * "significant" ("no statistically significant difference", "did not differ
 * significantly") counts as a claim of non-significance.
 */
export function significanceClaims(masked: string): ClaimHit[] {
  const negative = hits(masked, notSignificant).map((hit) => ({start: hit.start, end: hit.end, claim: 'not-significant' as const}));
  const inside = (at: number) => negative.some((hit) => at >= hit.start && at < hit.end);
  const positive = hits(masked, significant)
    .filter((hit) => !inside(hit.start) && !/non-$/.test(masked.slice(Math.max(0, hit.start - 4), hit.start)))
    // "Marginally significant" claims neither; near-significance flags it.
    .filter((hit) => !nearly.test(masked.slice(Math.max(0, hit.start - 32), hit.start)) && !looserAlpha.test(masked.slice(hit.end)))
    .map((hit) => ({
      start: hit.start,
      end: hit.end,
      claim: isNegated(masked, hit.start, 6) || failedBefore(masked, hit.start) ? ('not-significant' as const) : ('significant' as const),
    }));
  return [...negative, ...positive].sort((a, b) => a.start - b.start);
}

/** "failed to find a significant …", "could not detect any significant …". */
function failedBefore(masked: string, at: number): boolean {
  const clause = masked.slice(clauseStart(masked, at), at);
  return /\b(?:fail(?:s|ed)?\s+to|unable\s+to|lack\s+of|absence\s+of)\b/i.test(clause);
}
