import {readFile} from 'node:fs/promises';
import path from 'node:path';
import remarkFrontmatter from 'remark-frontmatter';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import {unified} from 'unified';
import type {Root} from 'mdast';
import {VFile} from 'vfile';
import type {VFileMessage} from 'vfile-message';
import remarkStet from './remark-stet.js';
import {htmlPage} from './render/html-page.js';
import {resultsJson} from './render/results-json.js';
import {toHtmlBody} from './render/to-html.js';
import {toMarkdown} from './render/to-markdown.js';
import {UserError} from './user-error.js';
import {version} from './version.js';
import {writeAtomically} from './write/write-atomically.js';

/** Options of `buildReport`; every field optional. */
export interface BuildOptions {
  /** Output folder (default: `out/` beside the report). */
  out?: string | undefined;
  /** Allow data files outside the report's folder (default: false). */
  allowOutside?: boolean | undefined;
  /** Clock for the provenance footer (default: now). */
  now?: (() => Date) | undefined;
}

export interface BuildResult {
  readonly ok: boolean;
  /** Errors and warnings, with places, in document order. */
  readonly messages: readonly VFileMessage[];
  /** Absolute paths written (empty when the build failed). */
  readonly written: readonly string[];
  readonly outDir: string;
}

/**
 * Build a report:
 *
 *   read → parse (remark) → remarkStet (resolve data, compute, interpret)
 *        → render Markdown, HTML, JSON, charts → write atomically
 *
 * A build with any error writes nothing.
 */
export async function buildReport(reportPath: string, options: BuildOptions = {}): Promise<BuildResult> {
  const absolute = path.resolve(reportPath);
  const outDir = path.resolve(options.out ?? path.join(path.dirname(absolute), 'out'));
  const file = new VFile({path: reportPath, value: await readReport(absolute, reportPath)});

  // 1. Parse and run the plugin.
  const parser = unified().use(remarkParse).use(remarkGfm).use(remarkFrontmatter, ['yaml']).use(remarkStet, {
    allowOutside: options.allowOutside,
  });
  const tree = (await parser.run(parser.parse(file), file)) as Root;
  const messages = [...file.messages].sort((a, b) => (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0));
  const data = file.data.stet;
  if (messages.some((message) => message.fatal) || !data) return {ok: false, messages, written: [], outDir};

  // 2. Render every output in memory.
  const name = path.basename(absolute, path.extname(absolute));
  const title = data.settings.title ?? name;
  const files = new Map<string, string>();
  files.set(`${name}.md`, toMarkdown(tree, data.settings.passthrough));
  const body = await toHtmlBody(tree, data.charts);
  const builtAt = (options.now ?? (() => new Date()))().toISOString();
  files.set(`${name}.html`, await htmlPage({title, body, datasets: data.datasets, version, builtAt}));
  files.set(`${name}.results.json`, resultsJson(data, path.basename(absolute), version));
  for (const [id, chart] of data.charts) files.set(`charts/${id}.svg`, chart.svg);

  // 3. Write.
  return {ok: true, messages, written: await writeAtomically(outDir, files), outDir};
}

async function readReport(absolute: string, written: string): Promise<string> {
  try {
    return await readFile(absolute, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code !== 'ENOENT' && code !== 'EISDIR') throw error;
    throw new UserError(code === 'ENOENT' ? 'report not found' : 'report is a folder, not a file', {
      ruleId: 'report-missing',
      file: written,
      hint: 'Give the path of a Markdown report, e.g. `stet build report.md`.',
    });
  }
}
