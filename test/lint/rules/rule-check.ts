import {lintSentences} from '../../../src/lint/lint-report.js';
import {sentencesOfText} from '../../../src/lint/prose-sentences.js';
import {lintRules} from '../../../src/lint/rules/index.js';
import type {LintContext} from '../../../src/lint/types.js';
import {corpusContext} from '../corpus-report.js';

/** The corpus report's results, computed once per test file. */
export async function ruleChecker(ruleId: string) {
  const fixture = await corpusContext();
  const rule = lintRules.find((candidate) => candidate.id === ruleId);
  if (!rule) throw new Error(`no rule ${ruleId}`);
  /** Findings of this rule in one sentence: `column:text` of each (columns 1-based). */
  const check = (text: string, context: LintContext = fixture.context) =>
    lintSentences(sentencesOfText(text), context, [rule]).map((finding) => `${finding.start.column}:${text.slice(finding.start.column - 1, finding.end.column - 1)}`);
  const suggestions = (text: string) => lintSentences(sentencesOfText(text), fixture.context, [rule]).map((finding) => finding.suggestion);
  return {...fixture, rule, check, suggestions};
}
