import type {OutputFormat} from '../compile-report.js';
import type {StetData} from '../remark-stet.js';
import {appendixTree} from './appendix.js';
import {htmlPage} from './html-page.js';
import {toHtmlBody} from './to-html.js';
import {toMarkdown} from './to-markdown.js';
import {appendixWords} from '../interpret/wording.js';

export interface AppendixInput {
  readonly data: StetData;
  readonly formats: ReadonlySet<OutputFormat>;
  /** NAME of the report; the appendix is NAME.appendix.md / .html. */
  readonly name: string;
  readonly title: string;
  readonly version: string;
  readonly builtAt: string;
  /** The user's page template (`--template`), as for the report. */
  readonly templatePath?: string | undefined;
}

/** `NAME.appendix.md` with `md`, `NAME.appendix.html` with `html`. */
export async function appendixFiles(input: AppendixInput): Promise<[string, string][]> {
  const {data, formats, name, title} = input;
  const files: [string, string][] = [];
  if (!formats.has('md') && !formats.has('html')) return files;
  const report = formats.has('html') ? `${name}.html` : `${name}.md`;
  const tree = appendixTree(data.blocks, data.charts, title, report);
  if (formats.has('md')) files.push([`${name}.appendix.md`, toMarkdown(tree, {})]);
  if (formats.has('html')) {
    // The appendix tree is stet's own (no raw HTML from the author), so nothing needs sanitising
    // and its anchors (`appendix-ID`) keep their ids.
    const body = await toHtmlBody(tree, data.charts, {allowHtml: true});
    const {version, builtAt, templatePath} = input;
    const page = await htmlPage({title: appendixWords.title(title), body, datasets: data.datasets, version, builtAt, templatePath});
    files.push([`${name}.appendix.html`, page]);
  }
  return files;
}
