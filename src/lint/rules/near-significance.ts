import type {LintRule} from '../types.js';
import {hits} from '../wording-scan.js';

const pattern = /\b(?:(?:marginally|almost|nearly|borderline|quasi-?|weakly|barely|approaching|near-?|(?:close|near)\s+to(?:\s+being)?|suggestively)\s*(?:statistically\s+)?significant|marginal(?:ly)?\s+(?:statistical\s+)?significance|borderline\s+significance|(?:approach(?:es|ed|ing)?|nearly reach(?:es|ed|ing)?|verge of|close to|edge of)\s+(?:statistical\s+)?significance|trend(?:s|ed|ing)?\s+(?:toward|towards|to)\s+(?:statistical\s+)?significance|tendency\s+(?:toward|towards)\s+(?:statistical\s+)?significance|significant\s+at\s+(?:the\s+)?(?:10|ten)\s*(?:%|per\s?cent)\s+level|(?:just|narrowly|barely)\s+(?:missed|failed to reach|fell short of)\s+(?:statistical\s+)?significance)\b/;
/** "fell just short of significance", "almost reached significance", "was trending", "a non-significant trend". */
const more = /\b(?:(?:fell|falls?|falling|came|comes|was|were|is|are)\s+(?:just\s+|narrowly\s+|slightly\s+|only\s+|barely\s+)?(?:short|shy)\s+of\s+(?:statistical\s+)?significance|(?:almost|nearly|just about)\s+(?:reach|achiev|attain)(?:es|ed|ing|e)?\s+(?:statistical\s+)?significance|(?:was|were|is|are)\s+trending\b(?!\s+(?:up|down|upward|downward|higher|lower|over|since|for|in|on)\b)|(?:statistical|non-?\s?significant|insignificant)\s+trends?|significant\s+at\s+(?:the\s+)?0?\.10?\s+level|tend(?:s|ed|ing)?\s+(?:to\s+be|toward|towards)\s+(?:statistical(?:ly)?\s+)?significan(?:t|ce)|(?:cusp|brink|threshold|border|verge)\s+of\s+(?:statistical\s+)?significance|bordering\s+on\s+(?:statistical\s+)?significan(?:t|ce)|(?:slightly|somewhat|partially|partly|mildly)\s+(?:statistically\s+)?significant)\b/;

export const nearSignificance: LintRule = {
  id: 'near-significance',
  severity: 'warning',
  explanation: 'a p-value above alpha is not “almost” significant; the decision was fixed before the data',
  suggestion: 'Report the result as not statistically significant at the declared alpha, with `{{ID.p}}` and the interval of the estimate.',
  checkSentence(sentence) {
    return [...hits(sentence.masked, pattern), ...hits(sentence.masked, more)].map((hit) => ({
      start: hit.start,
      end: hit.end,
      message: `“${sentence.text.slice(hit.start, hit.end)}” treats a non-significant result as nearly significant`,
    }));
  },
};
