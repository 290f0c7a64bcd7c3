import type {LintRule} from '../types.js';
import {affirmedHits} from '../wording-scan.js';

const pattern = /\b(?:observed|post[- ]?hoc|retrospective|achieved|a posteriori)\s+(?:statistical\s+)?power\b/;

export const observedPower: LintRule = {
  id: 'observed-power',
  severity: 'warning',
  explanation: 'power computed from the observed effect only restates the p-value',
  suggestion: 'Declare `smallest-effect` and cite `{{ID.sensitivity.power_at_smallest_effect}}`: the power to detect the smallest effect that matters.',
  checkSentence(sentence) {
    return affirmedHits(sentence.masked, pattern, 6).map((hit) => ({
      start: hit.start,
      end: hit.end,
      message: `“${sentence.text.slice(hit.start, hit.end)}” adds nothing to the p-value it is computed from`,
    }));
  },
};
