import {beforeAll, describe, expect, it} from 'vitest';
import type {CompiledReport} from '../../src/compile-report.js';
import {compileFiles, fixtureFiles} from '../helpers/render-fixture.js';

type Json = {blocks: Record<string, any>};

describe('the appendix', () => {
  let report: CompiledReport;
  let md: string;
  let html: string;
  let json: Json;
  beforeAll(async () => {
    report = await compileFiles(fixtureFiles(), ['md', 'html', 'json']);
    md = report.files.get('report.appendix.md')!;
    html = report.files.get('report.appendix.html')!;
    json = JSON.parse(report.files.get('report.results.json')!) as Json;
  });

  it('has a section for every block, in document order', () => {
    const ids = Object.keys(json.blocks);
    const headings = [...md.matchAll(/^## A(\d+)\. ([a-z0-9_-]+): /gm)].map((m) => [Number(m[1]), m[2]]);
    expect(headings).toEqual(ids.map((id, i) => [i + 1, id]));
    for (const id of ids) expect(html).toContain(`<h2 id="appendix-${id}">A${ids.indexOf(id) + 1}. ${id}: `);
  });

  it('numbers tables A1, A2, … and figures A1, A2, … without gaps', () => {
    const tables = [...md.matchAll(/\*\*Table A(\d+)\.\*\*/g)].map((m) => Number(m[1]));
    expect(tables).toEqual(tables.map((_, i) => i + 1));
    expect(tables.length).toBeGreaterThanOrEqual(15);
    const figures = [...md.matchAll(/\*\*Figure A(\d+)\.\*\*/g)].map((m) => Number(m[1]));
    // One figure per block with a chart (the block's main chart).
    const charted = report.data!.charts.size;
    expect(charted).toBeGreaterThanOrEqual(3);
    expect(figures).toEqual(Array.from({length: charted}, (_, i) => i + 1));
    // Every numbered table caption is followed by a table in the HTML.
    expect(html.match(/<strong>Table A\d+\.<\/strong>[^<]*<\/p>\n<table>/g)).toHaveLength(tables.length);
  });

  it('lists every assumption check of every block as a row', () => {
    for (const [id, block] of Object.entries(json.blocks)) {
      const start = md.indexOf(`. ${id}: `);
      const end = md.indexOf('\n## A', start);
      const section = md.slice(start, end < 0 ? undefined : end);
      for (const check of block.assumptions as {check: string; group?: string}[]) {
        expect(section, `${id} ${check.check} ${check.group}`).toMatch(new RegExp(`\\| ${check.check} \\| ${check.group ?? '—'} \\| `));
      }
    }
  });

  it('gives method, filter, rows left out, family and adjustment, sensitivity and warnings', () => {
    expect(md).toContain('- **Method:** Student’s t test `student-t`');
    expect(md).toContain('- **Rows kept by:** `water < 0.55`');
    expect(md).toContain('- **Rows:** 12 used; 0 left out for a missing value; 6 left out by the filter; 6 in levels not analysed');
    expect(md).toContain('- **Multiple testing:** family pairs, Holm-adjusted across 2 tests');
    expect(md).toContain('- **Computation:** without continuity correction');
    expect(md).toMatch(/- \*\*Sensitivity:\*\* smallest effect detectable with 80% power \d/);
    expect(md).toContain(`- ${json.blocks['curing'].warnings[0]}`);
  });

  it('shows post-hoc, coefficient and ANOVA tables', () => {
    expect(md).toContain('Post-hoc comparisons of block mixes.');
    expect(md).toContain('Regression coefficients of block water.');
    expect(md).toMatch(/\| within \| [\d.]+ \| 21 \| [\d.]+ \|/);
  });

  it('inlines each block’s chart in the HTML and uses the page template', () => {
    expect(html).toContain('<figure class="stet-chart" id="fig-lean-rich"><svg');
    expect(html.match(/<figure class="stet-chart"/g)).toHaveLength(report.data!.charts.size);
    expect(html).toContain('<title>Appendix: Renderer fixture</title>');
    expect(html).toContain('class="stet-caution"');
    expect(md).toContain('![Box plot of strength');
  });

  it('is written with md or html and not without them', async () => {
    const jsonOnly = await compileFiles(fixtureFiles(), ['json']);
    expect([...jsonOnly.files.keys()].filter((file) => file.includes('appendix'))).toEqual([]);
    const htmlOnly = await compileFiles(fixtureFiles(), ['html']);
    expect([...htmlOnly.files.keys()].filter((file) => file.includes('appendix'))).toEqual(['report.appendix.html']);
  });
});
