import type {LintRule} from '../types.js';
import {affirmedHits} from '../wording-scan.js';

const pattern = /\b(?:(?:very\s+)?highly|very|extremely|hugely|strongly|vastly|massively|overwhelmingly)\s+(?:statistically\s+)?significant(?:ly)?\b|\b(?:more|less)\s+(?:statistically\s+)?significant\s+than\b/;

export const significanceAsSize: LintRule = {
  id: 'significance-as-size',
  severity: 'warning',
  explanation: 'a smaller p-value is not a larger effect; the size of an effect is the estimate and its interval',
  suggestion: 'Drop the intensifier; report the size with `{{ID.estimate}}` and `{{ID.effect}}`.',
  checkSentence(sentence) {
    return affirmedHits(sentence.masked, pattern, 3).map((hit) => ({
      start: hit.start,
      end: hit.end,
      message: `“${sentence.text.slice(hit.start, hit.end)}” grades significance as if it measured the size of the effect`,
    }));
  },
};
