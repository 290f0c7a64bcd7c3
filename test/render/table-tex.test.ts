import {describe, expect, it} from 'vitest';
import {compileFiles, fixtureFiles} from '../helpers/render-fixture.js';

describe('tables/ID.tex', () => {
  it('is a booktabs table float with caption and label, only with --to tex', async () => {
    const withTex = await compileFiles(fixtureFiles(), ['md', 'tex']);
    const tex = withTex.files.get('tables/lean-rich.tex')!;
    expect(tex).toMatch(/\\begin\{table\}\[htbp\][\s\S]*\\end\{table\}\n$/);
    expect(tex).toContain('\\caption{Strength of lean and rich mixes.}');
    expect(tex).toContain('\\label{tab:lean-rich}');
    for (const rule of ['\\toprule', '\\midrule', '\\bottomrule']) expect(tex).toContain(rule);
    expect(tex).not.toContain('siunitx');
    const withoutTex = await compileFiles(fixtureFiles(), ['md']);
    expect([...withoutTex.files.keys()].filter((file) => file.endsWith('.tex'))).toEqual([]);
  });

  it('holds the same cells as the Markdown tables, escaped for LaTeX', async () => {
    const report = await compileFiles(fixtureFiles(), ['md', 'tex']);
    const tex = report.files.get('tables/mixes.tex')!;
    // Descriptives as in the Markdown: `| lean | 8 | 26.11 | 1.03 | …`.
    const markdownRow = /\| lean \| 8 \| ([^|]+) \| ([^|]+) \|/.exec(report.files.get('report.md')!)!;
    expect(tex).toContain(`lean & 8 & ${markdownRow[1]!.trim()} & ${markdownRow[2]!.trim()} &`);
    // The one-row test table turned on its side; p below .001 and η² escaped.
    expect(tex).toContain('\\raggedright p & \\textless{} .001 \\tabularnewline');
    expect(tex).toContain('\\ensuremath{\\eta}\\ensuremath{^2} [95\\% CI]');
    // Post-hoc rows keep the true minus sign as LaTeX.
    expect(tex).toContain('standard \\ensuremath{-} rich & \\ensuremath{-}2.2');
  });
});
