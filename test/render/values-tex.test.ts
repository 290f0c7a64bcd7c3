import {mkdir, mkdtemp, readFile, stat, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {beforeAll, describe, expect, it} from 'vitest';
import type {CompiledReport} from '../../src/compile-report.js';
import {plainText} from '../../src/interpret/symbol-marks.js';
import {escapeLatex} from '../../src/render/escape-latex.js';
import {formatField} from '../../src/render/format-field.js';
import {referenceableValues} from '../../src/render/values-tex.js';
import {compileFiles, fixtureFiles} from '../helpers/render-fixture.js';
import {hasPdflatex, latexProblems, pdfText, runPdflatex} from '../helpers/pdflatex.js';

describe('NAME.values.tex', () => {
  let report: CompiledReport;
  let values: string;
  beforeAll(async () => {
    report = await compileFiles(fixtureFiles(), ['md', 'tex']);
    values = report.files.get('report.values.tex')!;
  });

  it('defines \\stetval and one macro per referenceable field, formatted as {{id.field}}', () => {
    expect(values).toContain('\\DeclareRobustCommand\\stetval[2]');
    const block = report.data!.blocks.get('lean-rich')!;
    const fields = new Map(referenceableValues(block));
    for (const field of ['compact', 'p', 'p_adjusted', 'statistic', 'statistic.value', 'df', 'estimate', 'estimate.value', 'estimate.ci',
      'effect', 'effect.value', 'effect.ci', 'n', 'groups.lean.mean', 'groups.rich.sd', 'groups.rich.n', 'decision', 'sentence',
      'sensitivity.min_detectable_effect_80', 'rows.used']) {
      expect(fields.has(field), field).toBe(true);
    }
    expect(fields.get('p')).toBe(formatField(block, ['p']));
    expect(fields.get('groups.lean.mean')).toBe(formatField(block, ['groups', 'lean', 'mean']));
    expect(fields.get('')).toBe(block.compact);
    expect(fields.get('sentence')).toBe(block.result.sentence);
    // The p symbol in italics, as in the Markdown.
    const pText = plainText(fields.get('p')!);
    expect(values).toContain(`\\stetdefine{lean-rich}{p}{\\textit{p}${escapeLatex(pText.slice(1))}}\n`);
    // The Markdown's {{lean-rich.p}} shows the same text.
    expect(report.files.get('report.md')).toContain(`The welch test gave _p_${pText.slice(1)}.`);
  });

  it('defines values of every block, including method-specific ones', () => {
    for (const id of report.data!.blocks.keys()) expect(values).toContain(`\\stetdefine{${id}}{}{`);
    expect(values).toContain('\\stetdefine{water}{coefficients.1.p}{');
    expect(values).toContain('\\stetdefine{mixes}{posthoc.0.p_adjusted}{');
  });

  if (!hasPdflatex) console.warn('pdflatex not found: the test that compiles a chapter with values.tex and a table does not run.');

  it.runIf(hasPdflatex)('compiles with pdflatex: a chapter shows the current p and inputs a table', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'stet-chapter-'));
    await mkdir(path.join(dir, 'tables'));
    for (const [file, text] of report.files) if (file.endsWith('.tex')) await writeFile(path.join(dir, file), text);
    const chapter = String.raw`\documentclass{article}
\usepackage{booktabs}
\input{report.values.tex}
\pdfcompresslevel=0 \pdfobjcompresslevel=0
\begin{document}
The mixes differ (\stetval{lean-rich}{}). In short, \stetval{lean-rich}{p};
lean mixes averaged \stetval{lean-rich}{groups.lean.mean} MPa.
\stetval{lean-rich}{sentence}
Unknown: \stetval{lean_rich}{no_such_field}.
\section{Mixes: \stetval{lean-rich}{p}}
Table~\ref{tab:lean-rich} and Table~\ref{tab:mixes}.
${[...report.data!.blocks.keys()].map((id) => `\\input{tables/${id}.tex}`).join('\n')}
\end{document}
`;
    await writeFile(path.join(dir, 'chapter.tex'), chapter);
    const run = await runPdflatex(dir, 'chapter.tex');
    console.log(`pdflatex compiled the chapter in ${run.ms.toFixed(0)} ms`);
    expect(run.status, run.log.slice(-3000)).toBe(0);
    expect(latexProblems(run.log)).toEqual([]);
    expect(run.log).toContain('stet: no value lean_rich.no_such_field');
    expect((await stat(path.join(dir, 'chapter.pdf'))).size).toBeGreaterThan(1000);
    const p = plainText(formatField(report.data!.blocks.get('lean-rich')!, ['p'])!);
    // The typeset text, from the PDF's uncompressed content streams.
    const typeset = pdfStrings(await readFile(path.join(dir, 'chapter.pdf'), 'latin1'));
    expect(typeset).toContain(`In short, ${p}`.replace(/\s+/g, ''));
    expect(typeset).toContain(`Mixes: ${p}`.replace(/\s+/g, ''));
    const text = pdfText(path.join(dir, 'chapter.pdf'));
    if (text === undefined) console.warn('pdftotext not found: the PDF is read by its own text operators instead.');
    else expect(text.replace(/\s+/g, ' ')).toContain(p);
  });
});

/**
 * The strings of a PDF's text operators (`(…) Tj`, `[(…) -333 (…)] TJ`),
 * joined without spaces: TeX sets spaces as glue, not as characters.
 */
function pdfStrings(pdf: string): string {
  const strings: string[] = [];
  for (const [, operand = ''] of pdf.matchAll(/(\[(?:[^\]\\]|\\.)*\]|\((?:[^)\\]|\\.)*\))\s*T[Jj]/g)) {
    for (const [, inner = ''] of operand.matchAll(/\(((?:[^)\\]|\\.)*)\)/g)) strings.push(inner.replace(/\\(.)/g, '$1'));
  }
  return strings.join('');
}
