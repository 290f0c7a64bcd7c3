import {parse} from 'csv-parse/sync';
import {beforeAll, describe, expect, it} from 'vitest';
import type {CompiledReport} from '../../src/compile-report.js';
import {compileFiles} from '../helpers/render-fixture.js';

/** Data whose level and column names are markup in HTML, CSV and LaTeX. */
const script = '<script>alert(1)</script>';
const files = {
  'report.md': `---
title: Names that are markup
---

# Escaping

\`\`\`stet
id: names
test: welch-t
data: names.csv
y: "a&b"
by: group
caption: "Cap <b>bold</b> & 50% #1 $5 ~ _ ^ \\\\ {}"
\`\`\`
`,
  'names.csv': [
    'group,a&b',
    ...[1.5, 2.5, 3.1, 2.2].map((v) => `${script},${v}`),
    ...[4.5, 5.25, 3.9, 4.8].map((v) => `"B, ""quoted""",${v}`),
  ].join('\n'),
};

describe('data-derived names in every output', () => {
  let report: CompiledReport;
  beforeAll(async () => {
    report = await compileFiles(files, ['md', 'html', 'json', 'tex']);
  });

  it('are escaped in the HTML report and the HTML appendix', () => {
    for (const file of ['report.html', 'report.appendix.html']) {
      const html = report.files.get(file)!;
      expect(html, file).not.toContain('<script');
      expect(html, file).not.toContain('<b>bold');
      expect(html, file).toMatch(/(&#x3C;|&lt;)script>alert\(1\)(&#x3C;|&lt;)\/script>/);
      expect(html, file).toMatch(/a&#x26;b|a&amp;b/);
      expect(html, file).not.toMatch(/a&b/);
    }
  });

  it('are escaped in the Markdown appendix', () => {
    const md = report.files.get('report.appendix.md')!;
    expect(md).toContain('| \\<script>alert(1)\\</script> | 4 |');
    expect(md).not.toMatch(/(^|[^\\])<script/);
  });

  it('are quoted in the CSV and read back as written', () => {
    const text = report.files.get('tables/names.csv')!;
    expect(text).toContain('"B, ""quoted"""');
    const rows = parse(text, {columns: true}) as Record<string, string>[];
    const levels = new Set(rows.filter((row) => row['section'] === 'group').map((row) => row['level']));
    expect(levels).toEqual(new Set([script, 'B, "quoted"']));
  });

  it('are escaped in the LaTeX table and values', () => {
    const tex = report.files.get('tables/names.tex')!;
    expect(tex).toContain('\\textless{}script\\textgreater{}alert(1)\\textless{}/script\\textgreater{}');
    expect(tex).toContain('\\caption{Cap \\textless{}b\\textgreater{}bold\\textless{}/b\\textgreater{} \\& 50\\% \\#1 \\$5 \\textasciitilde{} \\_ \\textasciicircum{} \\textbackslash{} \\{\\}}');
    // Outside comments and stet's own math (H₀) no %, #, $ or _ is left bare (& separates cells).
    const body = tex.split('\n').filter((line) => !line.startsWith('%')).join('\n').replace(/\\ensuremath\{[^{}]*\}/g, '');
    expect(body).not.toMatch(/(^|[^\\])[%#$_]/m);
    const values = report.files.get('report.values.tex')!;
    expect(values).toContain('a\\&b');
    expect(values).not.toContain('<script');
  });
});
