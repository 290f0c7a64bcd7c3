import type {LintRule, ProseSentence} from '../types.js';
import {isNegated, hits} from '../wording-scan.js';

/** What the author concludes from significance alone: it matters, or it must be acted on. */
const consequence = String.raw`(?:matters?|important|importance|meaningful|relevan(?:t|ce)|substantial|consequential|noteworthy|worth acting on|practically significant|clinically significant|large enough|big enough|large|major|(?:must|should|needs? to|ha(?:s|ve) to)\s+(?:be\s+)?(?:act(?:ed)?(?:\s+on)?|addressed|fixed|changed|replaced|respond|intervene)|act on|warrants?\s+(?:action|a change|attention)|calls? for (?:action|a change))`;
const pattern = new RegExp(String.raw`\b(?:statistically\s+)?significant(?:ly)?\b[^.;]{0,50}?\b(?:so|therefore|thus|hence|which means|meaning|means|proving|proves|showing|shows|demonstrat(?:es|ing)|indicat(?:es|ing)|confirm(?:s|ing)|so that|and is|and so|making it|makes it)\b[^.;]{0,50}?\b(?:it|this|that|they|the \w+)?\s*${consequence}\b`);
/** "Because it is significant, it is large enough …", "Being significant, it is of practical importance": cause first. */
const because = new RegExp(String.raw`\b(?:because|since|as|being|given that)\b[^.;]{0,40}?\b(?:statistically\s+)?significant\b[^.;,]{0,30},\s*[^.;]{0,60}?\b${consequence}\b`);
/** A negation inside the inference ("because it is significant, it is not necessarily large") undoes it. */
const denied = /\b(?:not|never|no|nothing|non-?\s?significant|insignificant)\b|n['’]t\b/i;
/** Words and references that put the size of the effect beside the claim. */
const sizeWords = /\b(?:effect size|Hedges|Cohen|interval|CI|smallest effect)\b|\b(?:by|of)\s+[−-]?\d/;

export const significanceAsImportance: LintRule = {
  id: 'significance-as-importance',
  severity: 'warning',
  explanation: 'statistical significance says the data are unlikely under the null, not that the effect is large enough to matter',
  suggestion: 'Say why the size matters: cite `{{ID.estimate}}` (with its interval) against the smallest effect of interest.',
  checkSentence(sentence) {
    if (mentionsSize(sentence)) return [];
    return [...hits(sentence.masked, pattern), ...hits(sentence.masked, because)]
      .filter((hit) => !isNegated(sentence.masked, hit.start, 4) && !denied.test(hit.match[0]) && !/\bnon-$|\bin$/.test(sentence.masked.slice(Math.max(0, hit.start - 4), hit.start)))
      .map((hit) => ({
        start: hit.start,
        end: hit.end,
        message: `“${sentence.text.slice(hit.start, hit.end)}” takes statistical significance as proof that the effect matters`,
      }));
  },
};

function mentionsSize(sentence: ProseSentence): boolean {
  const sized = sentence.references.some((reference) => reference.path.length === 0 || ['estimate', 'effect'].includes(reference.path[0]!));
  return sized || sizeWords.test(sentence.masked);
}
