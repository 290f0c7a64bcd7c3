import {readFile} from 'node:fs/promises';
import path from 'node:path';
import remarkFrontmatter from 'remark-frontmatter';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import {unified} from 'unified';
import type {Root} from 'mdast';
import {VFile} from 'vfile';
import type {VFileMessage} from 'vfile-message';
import {reportError} from './document/report-error.js';
import {readPlanHistory, type PlanHistory} from './lock/plan-history.js';
import type {BlockCache} from './cache/block-cache.js';
import {familyChartPath} from './charts/family-charts.js';
import {lintReport} from './lint/lint-report.js';
import remarkStet, {type StetData} from './remark-stet.js';
import {appendixFiles} from './render/appendix-files.js';
import {familyFigureName} from './render/family-nodes.js';
import {htmlPage} from './render/html-page.js';
import {resultsJson} from './render/results-json.js';
import {tableFiles} from './render/table-files.js';
import {toHtmlBody} from './render/to-html.js';
import {toMarkdown} from './render/to-markdown.js';
import {UserError} from './user-error.js';
import {version} from './version.js';

/** Output formats of `--to`; charts and CSV tables come with every build. */
export const outputFormats = ['md', 'html', 'json', 'tex'] as const;
export type OutputFormat = (typeof outputFormats)[number];
export const defaultFormats: ReadonlySet<OutputFormat> = new Set(['md', 'html', 'json']);

/** Options of `compileReport` and `buildReport`; every field optional. */
export interface CompileOptions {
  /** Output folder (default: `out/` beside the report). */
  out?: string | undefined;
  /** Allow data files outside the report's folder (default: false). */
  allowOutside?: boolean | undefined;
  /** Clock for the provenance footer (default: now). */
  now?: (() => Date) | undefined;
  /** Which documents to render (default: md, html, json). */
  formats?: ReadonlySet<OutputFormat> | undefined;
  /** An HTML template file with `<!--stet:NAME-->` slots (default: stet's own). */
  template?: string | undefined;
  /** Keep the author's raw HTML unsanitised in the HTML output (default: false). */
  allowHtml?: boolean | undefined;
  /** Reuse unchanged blocks and charts (`stet watch`); output bytes are the same. */
  cache?: BlockCache | undefined;
}

/** A report compiled in memory: what a build would write, not yet written. */
export interface CompiledReport {
  readonly ok: boolean;
  /** Errors and warnings, with places, in document order. */
  readonly messages: readonly VFileMessage[];
  /** Output files by path relative to `outDir` (empty when compilation failed). */
  readonly files: ReadonlyMap<string, string>;
  readonly outDir: string;
  /** The report's absolute path and base name (NAME in NAME.html). */
  readonly reportPath: string;
  readonly name: string;
  /** What the plugin computed; absent when it failed. */
  readonly data?: StetData | undefined;
  /** The lock and ledger the sentences disclosed; absent when they could not be read. */
  readonly history?: PlanHistory | undefined;
}

/**
 * Compile a report in memory:
 *
 *   read → parse (remark) → remarkStet (resolve data, compute, interpret)
 *        → lint the author's prose against the results (errors fail it)
 *        → render Markdown, HTML, JSON, charts
 *
 * Nothing is written; `buildReport` writes, `stet check` compares.
 */
export async function compileReport(reportPath: string, options: CompileOptions = {}): Promise<CompiledReport> {
  const absolute = path.resolve(reportPath);
  const outDir = path.resolve(options.out ?? path.join(path.dirname(absolute), 'out'));
  const name = path.basename(absolute, path.extname(absolute));
  const file = new VFile({path: reportPath, value: await readReport(absolute, reportPath)});
  const formats = options.formats ?? defaultFormats;
  const history = await readPlanHistory(absolute).catch((error: unknown) => void reportError(file, error));
  for (const warning of history?.ledger.warnings ?? []) file.message(warning, {ruleId: 'ledger-line', source: 'stet'});

  // 1. Parse and run the plugin.
  const parser = unified().use(remarkParse).use(remarkGfm).use(remarkFrontmatter, ['yaml']).use(remarkStet, {
    allowOutside: options.allowOutside,
    disclose: history?.disclose,
    cache: options.cache,
  });
  const parsed = parser.parse(file);
  // The lint reads the author's prose as written, before blocks and references are replaced.
  const source = structuredClone(parsed);
  const tree = (await parser.run(parsed, file)) as Root;
  if (file.data.stet && !file.messages.some((message) => message.fatal)) lintReport(source, file, file.data.stet);
  const messages = [...file.messages].sort((a, b) => (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0));
  const data = file.data.stet;
  const failed = {ok: false, messages, files: new Map<string, string>(), outDir, reportPath: absolute, name, data, history};
  if (messages.some((message) => message.fatal) || !data) return failed;

  // 2. Render every output in memory.
  const title = data.settings.title ?? name;
  const files = new Map<string, string>();
  const builtAt = (options.now ?? (() => new Date()))().toISOString();
  if (formats.has('md')) files.set(`${name}.md`, toMarkdown(tree, data.settings.passthrough));
  if (formats.has('html')) {
    const moreCharts = new Map([...data.familyCharts].map(([family, chart]) => [familyFigureName(family), chart]));
    const body = await toHtmlBody(tree, data.charts, {allowHtml: options.allowHtml, moreCharts});
    const page = {title, body, front: data.settings.passthrough, datasets: data.datasets, version, builtAt, templatePath: options.template};
    files.set(`${name}.html`, await htmlPage(page));
  }
  if (formats.has('json')) files.set(`${name}.results.json`, resultsJson(data, path.basename(absolute), version));
  for (const [id, chart] of data.charts) {
    for (const [name, drawn] of [[id, chart] as const, ...chart.extra.map((e) => [`${id}-${e.suffix}`, e] as const)]) {
      files.set(`charts/${name}.svg`, drawn.svg);
      files.set(`charts/${name}.vl.json`, drawn.vlSpec);
    }
  }
  for (const [family, chart] of data.familyCharts) {
    files.set(`${familyChartPath(family)}.svg`, chart.svg);
    files.set(`${familyChartPath(family)}.vl.json`, chart.vlSpec);
  }
  for (const [file, text] of tableFiles(data, formats, name, path.basename(absolute))) files.set(file, text);
  for (const [file, text] of await appendixFiles({data, formats, name, title, version, builtAt, templatePath: options.template})) files.set(file, text);

  return {...failed, ok: true, files};
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
