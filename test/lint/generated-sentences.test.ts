import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {compileReport} from '../../src/compile-report.js';
import {lintSentences} from '../../src/lint/lint-report.js';
import {proseSentences, sentencesOfText} from '../../src/lint/prose-sentences.js';
import {lintRules} from '../../src/lint/rules/index.js';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import {unified} from 'unified';
import {contextOf, lintMarkdown} from './lint-fixture.js';

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
    // The same check does catch misreadings and contradictions planted in sentences of this shape.
    const planted = (text: string, id: string) => lintSentences(sentencesOfText(text, [id]), context, wordingRules).map((finding) => finding.rule);
    expect(planted('Welch’s t test detected no statistically significant difference (p = .416). The population means are equal.', 'supplier-7d')).toEqual(['no-difference-claim']);
    expect(planted('Welch’s t test found a statistically significant difference in mean slump (p = .431).', 'slump')).toEqual(['contradicts-decision']);
    expect(planted('Mean compressive strength was 2.8 MPa higher in Quarrybank than in Northfield.', 'supplier-28d')).toEqual(['contradicts-direction']);
  });

  it('no rule fires on the prose of the built Markdown', () => {
    const markdown = compiled.files.get('report.md')!;
    const sentences = proseSentences(unified().use(remarkParse).use(remarkGfm).parse(markdown), markdown);
    expect(sentences.length).toBeGreaterThan(20);
    expect(lintSentences(sentences, context, wordingRules).map((finding) => `${finding.start.line}: ${finding.rule}: ${finding.message}`)).toEqual([]);
  });
});

// Every other method on the sample's data: blocks chosen so that some reject
// and some do not; each generated sentence is linted as about its block.
const otherMethods = `---
stet:
  datasets:
    cylinders: data/cylinders.csv
    deliveries: data/deliveries.csv
    regimes: data/regimes.csv
    slabs: {file: data/slabs.csv, delimiter: ";", decimal: ","}
---
${[
  ['mann-whitney', 'cylinders', 'where: age_days == 28\ny: strength_mpa\nby: supplier'],
  ['tost', 'cylinders', 'where: age_days == 7\ny: strength_mpa\nby: supplier\nsmallest-effect: 2'],
  ['tost', 'cylinders', 'where: age_days == 7\ny: strength_mpa\nby: supplier\nsmallest-effect: 0.3'],
  ['anova', 'regimes', 'y: strength_mpa\nby: regime'],
  ['kruskal-wallis', 'regimes', 'y: strength_mpa\nby: regime'],
  ['levene', 'regimes', 'y: strength_mpa\nby: regime'],
  ['brown-forsythe', 'regimes', 'y: strength_mpa\nby: regime'],
  ['chi-square', 'deliveries', 'y: check\nby: supplier'],
  ['fisher-exact', 'deliveries', 'y: check\nby: supplier'],
  ['binomial', 'deliveries', 'y: check\nsuccess: fail\nmu: 0.1'],
  ['one-proportion', 'deliveries', 'y: check\nsuccess: fail\nmu: 0.2'],
  ['chi-square-gof', 'deliveries', 'y: supplier\nexpected: {Northfield: 0.5, Quarrybank: 0.5}'],
  ['spearman', 'regimes', 'x: water_cement\ny: strength_mpa'],
  ['kendall', 'regimes', 'x: water_cement\ny: strength_mpa'],
  ['linear-regression', 'regimes', 'x: water_cement\ny: strength_mpa'],
  ['shapiro-wilk', 'cylinders', 'where: age_days == 28\ny: strength_mpa'],
  ['wilcoxon-signed-rank', 'slabs', 'y: [untreated, treated]'],
  ['sign-test', 'slabs', 'y: [untreated, treated]'],
  ['one-sample-t', 'cylinders', 'where: age_days == 28 and supplier == "Quarrybank"\ny: strength_mpa\nmu: 35'],
  ['welch-t', 'cylinders', 'where: age_days == 7\ny: slump_mm\nby: supplier\nsmallest-effect: 5'],
].map(([method, data, body], i) => `\n\`\`\`stet\nid: m${i}\ntest: ${method}\ndata: ${data}\n${body}\n\`\`\`\n`).join('')}`;

describe('stet\'s sentences for every other method pass its lint', async () => {
  const {data, context} = await lintMarkdown(otherMethods, path.dirname(sample));

  it('no rule fires on any of them', () => {
    const decisions = new Set([...data.blocks.values()].map((block) => block.result.decision));
    expect(decisions).toEqual(new Set(['reject', 'fail-to-reject']));
    for (const [id, block] of data.blocks) {
      const findings = lintSentences(sentencesOfText(block.result.sentence, [id]), context, wordingRules);
      expect(findings.map((finding) => `${id} (${block.result.method}): ${finding.rule}: ${finding.message}`)).toEqual([]);
    }
  });
});

