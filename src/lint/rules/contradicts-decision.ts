import {formatP} from '../format-p.js';
import {blocksAt} from '../cited-blocks.js';
import {significanceClaims} from '../significance-claims.js';
import type {LintRule, SentenceFinding} from '../types.js';

export const contradictsDecision: LintRule = {
  id: 'contradicts-decision',
  severity: 'error',
  explanation: 'the prose calls a result significant (or not) when the cited block decided the opposite',
  suggestion: 'Describe the result as the block decided it, or cite `{{ID.sentence}}`.',
  checkSentence(sentence, context) {
    const findings: SentenceFinding[] = [];
    for (const hit of significanceClaims(sentence.masked)) {
      for (const block of blocksAt(sentence, hit.start, context)) {
        const {result} = block;
        const id = block.computed.spec.id;
        const rejected = result.decision === 'reject';
        if ((hit.claim === 'significant') === rejected) continue;
        const decided = rejected ? 'was statistically significant' : 'was not statistically significant';
        findings.push({
          start: hit.start,
          end: hit.end,
          message: `“${sentence.text.slice(hit.start, hit.end)}” contradicts block \`${id}\`, which ${decided} (${formatP(result.p_adjusted ?? result.p)} at α = ${result.alpha})`,
          suggestion: rejected
            ? `Block \`${id}\` rejected its null hypothesis; say so, or cite \`{{${id}.sentence}}\`.`
            : `Block \`${id}\` did not reject its null hypothesis: write “no statistically significant difference was detected”, or cite \`{{${id}.sentence}}\`.`,
        });
      }
    }
    return findings;
  },
};
