import type {Root} from 'mdast';
import path from 'node:path';
import remarkFrontmatter from 'remark-frontmatter';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import {unified} from 'unified';
import {VFile} from 'vfile';
import {lintReport, lintSource} from '../../src/lint/lint-report.js';
import type {LintContext} from '../../src/lint/types.js';
import remarkStet, {type StetData} from '../../src/remark-stet.js';

/**
 * Run the plugin (without charts) and the lint on a report held in memory,
 * as if it were the file `name` in `dir` (its data paths resolve there).
 */
export async function lintMarkdown(markdown: string, dir: string, name = 'report.md') {
  const file = new VFile({path: path.join(dir, name), value: markdown});
  const parser = unified().use(remarkParse).use(remarkGfm).use(remarkFrontmatter, ['yaml']).use(remarkStet, {charts: false});
  const parsed = parser.parse(file);
  const source = structuredClone(parsed);
  await parser.run(parsed, file);
  const data = file.data.stet;
  const errors = file.messages.filter((message) => message.fatal);
  if (!data || errors.length > 0) throw new Error(`fixture report failed: ${errors.map((message) => message.reason).join('; ')}`);
  lintReport(source as Root, file, data);
  const findings = file.messages.filter((message) => message.source === lintSource);
  return {findings, data, context: contextOf(data, markdown)};
}

export function contextOf(data: StetData, source: string): LintContext {
  return {settings: data.settings, blocks: data.blocks, specs: [...data.blocks.values()].map((block) => block.computed.spec), source};
}

/** `line:column rule` of each finding, for compact expectations. */
export function placed(findings: readonly {line?: number | undefined; column?: number | undefined; ruleId?: string | undefined}[]): string[] {
  return findings.map((message) => `${message.line}:${message.column} ${message.ruleId}`);
}
