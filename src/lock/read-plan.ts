import {readFile} from 'node:fs/promises';
import type {Code, Root, Yaml} from 'mdast';
import remarkFrontmatter from 'remark-frontmatter';
import remarkParse from 'remark-parse';
import {unified} from 'unified';
import {visit} from 'unist-util-visit';
import {VFile} from 'vfile';
import type {VFileMessage} from 'vfile-message';
import {reportError} from '../document/report-error.js';
import type {BlockSpec} from '../spec/block-spec.js';
import {parseBlock} from '../spec/parse-block.js';
import {defaultSettings, parseSettings, type DocumentSettings} from '../spec/parse-settings.js';
import {UserError} from '../user-error.js';

/** A report's declared blocks, read without touching its data. */
export interface DeclaredPlan {
  readonly settings: DocumentSettings;
  readonly specs: readonly BlockSpec[];
  /** Errors in the front matter or blocks (fatal) as positioned messages. */
  readonly messages: readonly VFileMessage[];
}

/**
 * Parse the front matter and every ```stet block. A plan is locked before
 * the data exist, so nothing here loads a data file.
 */
export async function readPlan(reportPath: string): Promise<DeclaredPlan> {
  const text = await readFile(reportPath, 'utf8').catch((error: NodeJS.ErrnoException) => {
    if (error.code !== 'ENOENT' && error.code !== 'EISDIR') throw error;
    throw new UserError(error.code === 'ENOENT' ? 'report not found' : 'report is a folder, not a file', {
      ruleId: 'report-missing',
      file: reportPath,
      hint: 'Give the path of a Markdown report, e.g. `stet lock report.md`.',
    });
  });
  const file = new VFile({path: reportPath, value: text});
  const tree = unified().use(remarkParse).use(remarkFrontmatter, ['yaml']).parse(file) as Root;
  const report = (error: unknown) => reportError(file, error);
  const yaml = tree.children.find((node): node is Yaml => node.type === 'yaml');
  let settings = defaultSettings;
  if (yaml) {
    try {
      settings = parseSettings(yaml.value, {line: (yaml.position?.start.line ?? 1) + 1, column: 1});
    } catch (error) {
      report(error);
    }
  }
  const specs: BlockSpec[] = [];
  visit(tree, 'code', (node: Code) => {
    if (node.lang !== 'stet') return;
    const fence = {line: node.position?.start.line ?? 1, column: node.position?.start.column ?? 1};
    try {
      specs.push(parseBlock(node.value, {line: fence.line + 1, column: fence.column}, fence, settings));
    } catch (error) {
      report(error);
    }
  });
  return {settings, specs, messages: file.messages};
}
