import type {Root} from 'mdast';
import type {VFile} from 'vfile';
import type {StetData} from '../remark-stet.js';
import type {Place} from '../user-error.js';
import {proseSentences} from './prose-sentences.js';
import {lintRules} from './rules/index.js';
import type {LintContext, LintRule, LintSeverity, ProseSentence, SentenceFinding} from './types.js';

/** Messages of `stet lint` carry this source, apart from the build's own. */
export const lintSource = 'stet-lint';

/** One finding, placed; what `--format json` prints (with the file). */
export interface LintFinding {
  readonly rule: string;
  readonly severity: LintSeverity;
  readonly start: Place;
  readonly end: Place;
  readonly message: string;
  readonly suggestion: string;
}

/**
 * Lint a report: the author's prose in `tree` (the source as parsed, before
 * blocks and references are replaced) against the computed results in
 * `data`. Findings become messages on `file` with source `stet-lint`;
 * errors are fatal, so a build with a contradiction writes nothing.
 */
export function lintReport(tree: Root, file: VFile, data: StetData): void {
  const source = String(file.value);
  const context: LintContext = {
    settings: data.settings,
    blocks: data.blocks,
    specs: [...data.blocks.values()].map((block) => block.computed.spec),
    source,
  };
  const rules = lintRules.filter((rule) => !data.settings.lintOff.has(rule.id));
  const findings = [...lintSentences(proseSentences(tree, source), context, rules), ...lintDocument(context, rules)];
  for (const finding of findings) {
    const message = file.message(finding.message, {place: {start: finding.start, end: finding.end}, ruleId: finding.rule, source: lintSource});
    message.fatal = finding.severity === 'error';
    message.note = finding.suggestion;
  }
}

/** Run the sentence rules; exported so tests can lint stet's own sentences. */
export function lintSentences(sentences: readonly ProseSentence[], context: LintContext, rules: readonly LintRule[] = lintRules): LintFinding[] {
  const findings: LintFinding[] = [];
  for (const sentence of sentences) {
    for (const rule of rules) {
      if (!rule.checkSentence || sentence.disabled.has(rule.id)) continue;
      for (const found of withoutOverlaps(rule.checkSentence(sentence, context))) {
        findings.push({
          rule: rule.id,
          severity: rule.severity,
          start: sentence.placeOf(found.start),
          end: sentence.placeOf(found.end),
          message: found.message,
          suggestion: found.suggestion ?? withBlockId(rule.suggestion, sentence),
        });
      }
    }
  }
  return findings;
}

/** One finding per stretch of text: a rule's patterns may overlap ("chance … due to chance"). */
function withoutOverlaps(findings: readonly SentenceFinding[]): SentenceFinding[] {
  const kept: SentenceFinding[] = [];
  for (const found of [...findings].sort((a, b) => a.start - b.start)) {
    if (!kept.some((other) => found.start < other.end && other.start < found.end)) kept.push(found);
  }
  return kept;
}

/** The general suggestion's `{{ID…}}`, with the block the sentence cites. */
function withBlockId(suggestion: string, sentence: ProseSentence): string {
  const id = sentence.blockIds[0];
  return id === undefined ? suggestion : suggestion.replaceAll('{{ID', `{{${id}`);
}

function lintDocument(context: LintContext, rules: readonly LintRule[]): LintFinding[] {
  return rules.flatMap((rule) =>
    (rule.checkDocument?.(context) ?? []).map((found) => ({
      rule: rule.id,
      severity: rule.severity,
      start: found.place,
      end: found.place,
      message: found.message,
      suggestion: found.suggestion ?? rule.suggestion,
    })),
  );
}
