import {readFile} from 'node:fs/promises';
import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {compileReport} from '../../src/compile-report.js';
import {cli, snapshotFolder, workspace} from '../helpers/workspace.js';

const data = 'mix,strength\nA,30.1\nA,31.4\nA,29.8\nA,32.0\nB,33.2\nB,34.1\nB,32.9\nB,35.0\n';
const block = (id: string, extra = '') => `\`\`\`stet\nid: ${id}\ndata: d.csv\ntest: welch-t\ny: strength\nby: mix\n${extra}\`\`\`\n`;

async function html(report: string, options: Parameters<typeof compileReport>[1] = {}) {
  const dir = await workspace({'r.md': report, 'd.csv': data});
  const compiled = await compileReport(path.join(dir, 'r.md'), options);
  return {compiled, dir, html: compiled.files.get('r.html') ?? '', md: compiled.files.get('r.md') ?? ''};
}

describe('numbered figures and tables', () => {
  it('numbers floats in document order and resolves cross-references to links', async () => {
    const report = `# Mixes\n\nSee {{fig:second}} and {{tab:first}}.\n\n${block('first', 'caption: First mix comparison.\n')}\n${block('second')}`;
    const {html: page, md} = await html(report);
    expect(page).toContain('<a href="#fig-second">Figure 2</a> and <a href="#tab-first">Table 1</a>');
    expect(page).toMatch(/<p class="stet-caption stet-tab-caption" id="tab-first"><strong>Table 1\.<\/strong> First mix comparison\.<\/p>/);
    // Figure captions sit inside their figure, so the two never print on different pages.
    expect(page).toMatch(/<figure class="stet-chart" id="fig-second"><svg[^]*<\/svg><figcaption class="stet-caption"><strong>Figure 2\.<\/strong> Welch’s t test: strength by mix\.<\/figcaption><\/figure>/);
    expect(md).toContain('See [Figure 2](#fig-second) and [Table 1](#tab-first).');
    expect(md).toContain('**Table 1.** First mix comparison.');
  });

  it('reports a cross-reference to a block without that float at the reference', async () => {
    const report = `Intro.\n\nAs {{fig:first}} and {{tab:frist}} show.\n\n${block('first', 'show: [sentence, table]\n')}`;
    const {compiled} = await html(report);
    const errors = compiled.messages.filter((m) => m.fatal).map((m) => `${m.line}:${m.column} ${m.reason}`);
    expect(errors).toEqual([
      '3:4 cross-reference `{{fig:first}}`: no block `first` with a chart',
      '3:22 cross-reference `{{tab:frist}}`: no block `frist` with a results table',
    ]);
    expect(compiled.messages.find((m) => m.reason.includes('frist'))?.note).toMatch(/first/);
  });
});

describe('raw HTML in the report', () => {
  const hostile = [
    'Plain <b>bold</b> text.',
    '',
    '<script>alert(1)</script>',
    '',
    '<img src="x.png" onerror="alert(2)">',
    '',
    '<a href="javascript:alert(3)">link</a>',
    '',
    '<div id="fig-first" class="stet-caution" style="color:red">fake</div>',
    '',
  ].join('\n');

  it('is sanitised: no script, handler, javascript: URL, style or clobbering id', async () => {
    const {html: page} = await html(`${hostile}\n${block('first')}`);
    const body = page.slice(page.indexOf('<main'), page.indexOf('</main>'));
    expect(body).toContain('<b>bold</b>');
    expect(body).not.toMatch(/<script|onerror|javascript:|style="color/);
    expect(body).toContain('id="user-content-fig-first"');
    // stet's own figure keeps its id after sanitising.
    expect(body).toContain('<figure class="stet-chart" id="fig-first">');
  });

  it('is kept as written with --allow-html', async () => {
    const {html: page} = await html(`${hostile}\n${block('first')}`, {allowHtml: true});
    expect(page).toContain('<script>alert(1)</script>');
    expect(page).toContain('onerror="alert(2)"');
  });
});

describe('the page template', () => {
  it('shows the title block from the front matter', async () => {
    const front = '---\ntitle: Mix <trial>\nauthor: Site laboratory & partners\ndate: 2026-11-30\n---\n\n';
    const {html: page} = await html(`${front}Intro.\n\n${block('first')}`);
    expect(page).toContain('<header class="stet-title-block">\n<p class="stet-title">Mix &lt;trial&gt;</p>\n<p class="stet-author">Site laboratory &amp; partners</p>\n<p class="stet-date">2026-11-30</p>\n</header>');
    // A document that opens with its own heading keeps it, with the author and date under it.
    const {html: headed} = await html(`${front}# Mix trial\n\n${block('first')}`);
    expect(headed).not.toContain('class="stet-title"');
    expect(headed).toContain('<h1>Mix trial</h1>\n<header class="stet-title-block">\n<p class="stet-author">');
  });

  it('uses a user template given with --template, and refuses one without the caution', async () => {
    const dir = await workspace({
      'r.md': `Intro.\n\n${block('first')}`,
      'd.csv': data,
      'mine.html': '<html><body><h6><!--stet:title--></h6><!--stet:body--><small><!--stet:caution--></small></body></html>\n',
      'bare.html': '<html><body><!--stet:body--></body></html>\n',
    });
    const ok = await cli('build', path.join(dir, 'r.md'), '--template', path.join(dir, 'mine.html'));
    expect(ok.code).toBe(0);
    const page = await readFile(path.join(dir, 'out', 'r.html'), 'utf8');
    expect(page).toMatch(/^<html><body><h6>r<\/h6><p>Intro\.<\/p>[^]*<small>Statistical significance is not a decision rule/);

    const before = await snapshotFolder(path.join(dir, 'out'));
    const bad = await cli('build', path.join(dir, 'r.md'), '--template', path.join(dir, 'bare.html'));
    expect(bad.code).toBe(1);
    expect(bad.stderr).toMatch(/bare\.html:1:1: error: template lacks `<!--stet:caution-->` \[template\]\n {2}hint: /);
    expect(await snapshotFolder(path.join(dir, 'out'))).toEqual(before);
  });

  it('prints without splitting figures or tables and starts sections on a new page', async () => {
    const css = await readFile(new URL('../../templates/report.css', import.meta.url), 'utf8');
    const print = css.slice(css.indexOf('@media print'));
    expect(print).toMatch(/figure[^{]*\{[^}]*break-inside: avoid/);
    expect(print).toMatch(/h2 \{[^}]*break-before: page/);
  });
});

describe('the sample report', () => {
  it('builds with its cross-references resolved', async () => {
    const dir = await workspace({});
    const sample = new URL('../../samples/concrete/', import.meta.url).pathname;
    const out = path.join(dir, 'out');
    const compiled = await compileReport(path.join(sample, 'report.md'), {out});
    expect(compiled.ok).toBe(true);
    const md = compiled.files.get('report.md') ?? '';
    expect(md).not.toMatch(/\{\{/);
    expect(md).toMatch(/\[Figure \d\]\(#fig-/);
  });
});
