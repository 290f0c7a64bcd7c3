import {readFile} from 'node:fs/promises';
import type {Dataset} from '../data/column.js';
import {UserError} from '../user-error.js';
import {escapeHtml} from './escape-html.js';

export {escapeHtml} from './escape-html.js';

/**
 * The standalone HTML page: a template with `<!--stet:NAME-->` slots, the
 * CSS inlined, the body, the caution note and the provenance footer. No
 * fetch of any kind: fonts come from the system stack, charts are inline
 * SVG.
 */
export const caution =
  'Statistical significance is not a decision rule by itself. Follow applicable codes, standards and ' +
  'licensed professional judgement, and have critical analyses reviewed by a qualified statistician.';

export interface PageInput {
  readonly title: string;
  readonly body: string;
  /** Front matter shown in the title block (author, date, …). */
  readonly front?: Readonly<Record<string, unknown>> | undefined;
  readonly datasets: ReadonlyMap<string, Dataset>;
  readonly version: string;
  /** ISO 8601; the only part of the output that changes between identical builds. */
  readonly builtAt: string;
  /** A user's template file (`--template`); default: stet's `templates/report.html`. */
  readonly templatePath?: string | undefined;
}

const defaultTemplates = new URL('../../templates/', import.meta.url);
/** Files of stet's own template, for watchers and provenance. */
export const defaultTemplateFiles = ['report.html', 'report.css'].map((name) => new URL(name, defaultTemplates).pathname);

/** Slots a template must have: the report itself, and the caution that goes with it. */
const requiredSlots = ['body', 'caution'];

export async function htmlPage(input: PageInput): Promise<string> {
  const [template, css] = await Promise.all([
    input.templatePath ? readTemplate(input.templatePath) : readFile(new URL('report.html', defaultTemplates), 'utf8'),
    readFile(new URL('report.css', defaultTemplates), 'utf8'),
  ]);
  const {header, body} = titleBlock(input);
  const slots: Record<string, string> = {
    version: escapeHtml(input.version),
    title: escapeHtml(input.title),
    style: css.trimEnd(),
    header,
    body,
    caution: escapeHtml(caution),
    provenance: provenance(input),
  };
  // A function replacement, so `$` in the body is never a pattern.
  return template.replace(/<!--stet:([a-z]+)-->/g, (whole, name: string) => slots[name] ?? whole);
}

async function readTemplate(templatePath: string): Promise<string> {
  let template: string;
  try {
    template = await readFile(templatePath, 'utf8');
  } catch {
    throw new UserError('template not found', {ruleId: 'template', file: templatePath, hint: 'Give the path of an HTML file with `<!--stet:body-->` and `<!--stet:caution-->` in it.'});
  }
  const missing = requiredSlots.filter((slot) => !template.includes(`<!--stet:${slot}-->`));
  if (missing.length > 0) {
    throw new UserError(`template lacks ${missing.map((slot) => `\`<!--stet:${slot}-->\``).join(' and ')}`, {
      ruleId: 'template',
      file: templatePath,
      place: {line: 1, column: 1},
      hint: 'Every report page carries its body and the caution note. Other slots: title, header, style, version, provenance.',
    });
  }
  return template;
}

/**
 * The title block: the title (unless the document opens with its own
 * top-level heading), then subtitle, author and date from the front matter.
 * When the body opens with an `<h1>`, those lines go right under it.
 */
function titleBlock(input: PageInput): {header: string; body: string} {
  const opening = /^\s*<h1[\s>][^]*?<\/h1>\n?/.exec(input.body);
  const lines = opening ? [] : [`<p class="stet-title">${escapeHtml(input.title)}</p>`];
  for (const key of ['subtitle', 'author', 'date']) {
    const value = input.front?.[key];
    if (typeof value === 'string' || typeof value === 'number') lines.push(`<p class="stet-${key}">${escapeHtml(String(value))}</p>`);
  }
  const block = lines.length ? `<header class="stet-title-block">\n${lines.join('\n')}\n</header>\n` : '';
  if (!opening) return {header: block, body: input.body};
  return {header: '', body: `${opening[0]}${block}${input.body.slice(opening[0].length)}`};
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
