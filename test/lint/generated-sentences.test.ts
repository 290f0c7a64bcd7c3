import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {compileReport} from '../../src/compile-report.js';
import {lintSentences} from '../../src/lint/lint-report.js';
import {proseSentences, sentencesOfText} from '../../src/lint/prose-sentences.js';
import {lintRules} from '../../src/lint/rules/index.js';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import {unified} from 'unified';
import {contextOf} from './lint-fixture.js';

const sample = new URL('../../samples/concrete/report.md', import.meta.url).pathname;
// Every number in stet's own sentences comes from a block result by construction.
const wordingRules = lintRules.filter((rule) => rule.id !== 'hand-typed-statistic');

describe('stet\'s own sentences pass its lint', async () => {
  const compiled = await compileReport(sample, {formats: new Set(['md']), out: path.join(path.dirname(sample), 'out')});
  const data = compiled.data!;
  const context = contextOf(data, '');

  it('the sample builds without lint findings', () => {
    expect(compiled.ok).toBe(true);
    expect(compiled.messages.map((message) => `${message.line}:${message.column} ${message.ruleId}: ${message.reason}`)).toEqual([]);
  });

  it('no rule fires on any block\'s generated sentence, read as about that block', () => {
    expect(data.blocks.size).toBeGreaterThan(5);
    for (const [id, block] of data.blocks) {
      const findings = lintSentences(sentencesOfText(block.result.sentence, [id]), context, wordingRules);
      expect(findings.map((finding) => `${id}: ${finding.rule}: ${finding.message}`)).toEqual([]);
    }
    // The same check does catch a misreading planted in a generated sentence.
    const [id, block] = [...data.blocks].find(([, b]) => b.result.decision === 'fail-to-reject' && /does not show that/.test(b.result.sentence))!;
    const planted = block.result.sentence.replace(/This does not show that/, 'This shows that');
    expect(lintSentences(sentencesOfText(planted, [id]), context, wordingRules).map((finding) => finding.rule)).toContain('no-difference-claim');
  });

  it('no rule fires on the prose of the built Markdown', () => {
    const markdown = compiled.files.get('report.md')!;
    const sentences = proseSentences(unified().use(remarkParse).use(remarkGfm).parse(markdown), markdown);
    expect(sentences.length).toBeGreaterThan(20);
    expect(lintSentences(sentences, context, wordingRules).map((finding) => `${finding.start.line}: ${finding.rule}: ${finding.message}`)).toEqual([]);
  });
});
