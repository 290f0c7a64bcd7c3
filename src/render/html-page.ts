import {readFile} from 'node:fs/promises';
import type {Dataset} from '../data/column.js';

/**
 * The standalone HTML page: the template from `templates/` with its CSS
 * inlined, the body, the caution note and the provenance footer. No fetch
 * of any kind: fonts come from the system stack, charts are inline SVG.
 */
export const caution =
  'Statistical significance is not a decision rule by itself. Follow applicable codes, standards and ' +
  'licensed professional judgement, and have critical analyses reviewed by a qualified statistician.';

export interface PageInput {
  readonly title: string;
  readonly body: string;
  readonly datasets: ReadonlyMap<string, Dataset>;
  readonly version: string;
  /** ISO 8601; the only part of the output that changes between identical builds. */
  readonly builtAt: string;
  /** Folder holding report.html and report.css (default: stet's own). */
  readonly templateDir?: URL | undefined;
}

const defaultTemplates = new URL('../../templates/', import.meta.url);

export async function htmlPage(input: PageInput): Promise<string> {
  const dir = input.templateDir ?? defaultTemplates;
  const [template, css] = await Promise.all([
    readFile(new URL('report.html', dir), 'utf8'),
    readFile(new URL('report.css', dir), 'utf8'),
  ]);
  const slots: Record<string, string> = {
    version: escapeHtml(input.version),
    title: escapeHtml(input.title),
    style: css.trimEnd(),
    body: input.body,
    caution: escapeHtml(caution),
    provenance: provenance(input),
  };
  // A function replacement, so `$` in the body is never a pattern.
  return template.replace(/<!--stet:([a-z]+)-->/g, (whole, name: string) => slots[name] ?? whole);
}

function provenance(input: PageInput): string {
  const rows = [...input.datasets.values()]
    .map((d) => `<tr><td>${escapeHtml(d.file)}</td><td>${d.rowCount}</td><td><code>${d.sha256}</code></td></tr>`)
    .join('\n');
  const table = rows
    ? `<table><thead><tr><th>Data file</th><th>Rows</th><th>SHA-256</th></tr></thead><tbody>\n${rows}\n</tbody></table>\n`
    : '';
  return `${table}<p>Built by stet ${escapeHtml(input.version)} on <time datetime="${input.builtAt}">${input.builtAt}</time>. ` +
    'Every number, table and chart above was computed from these files at build time.</p>';
}

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({'&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;'})[c]!);
}
