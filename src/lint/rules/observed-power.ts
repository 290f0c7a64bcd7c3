import type {LintRule} from '../types.js';
import {affirmedHits} from '../wording-scan.js';

const pattern = /\b(?:observed|post[- ]?hoc|retrospective|achieved|a posteriori|post-(?:study|experiment))\s+(?:statistical\s+)?power\b/;
/** Power worked out from the data in hand: "power calculated from the observed effect", "a power analysis on the collected data". */
const fromData = /\bpower(?:\s+analys[ie]s)?\s+(?:\w+\s+){0,3}?(?:from|using|at|on|with|for|of)\s+(?:the\s+|our\s+)?(?:observed|obtained|measured|estimated|sample|collected|actual|study['’]s|realised|realized)\s+(?:\w+\s+){0,2}?(?:effect|difference|data|estimate|results?|means?)\b|\bpower(?:\s+analys[ie]s)?\s+(?:\w+\s+){0,3}?(?:after|once)\s+(?:the\s+)?(?:study|experiment|trial|data\s+(?:were|was)\s+collected|data\s+collection|tests?\s+(?:was|were)\s+run)\b/;

export const observedPower: LintRule = {
  id: 'observed-power',
  severity: 'warning',
  explanation: 'power computed from the observed effect only restates the p-value',
  suggestion: 'Declare `smallest-effect` and cite `{{ID.sensitivity.power_at_smallest_effect}}`: the power to detect the smallest effect that matters.',
  checkSentence(sentence) {
    const named = affirmedHits(sentence.masked, pattern, 6);
    const described = affirmedHits(sentence.masked, fromData, 6).filter((hit) => !named.some((other) => hit.start < other.end && other.start < hit.end));
    return [...named, ...described].map((hit) => ({
      start: hit.start,
      end: hit.end,
      message: `“${sentence.text.slice(hit.start, hit.end)}” adds nothing to the p-value it is computed from`,
    }));
  },
};
