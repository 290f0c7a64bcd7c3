import {mkdtemp, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import fc from 'fast-check';
import {describe, expect, it} from 'vitest';
import {escapeLatex} from '../../src/render/escape-latex.js';
import {hasPdflatex, latexProblems, runPdflatex} from '../helpers/pdflatex.js';

const specials = ['#', '$', '%', '&', '~', '_', '^', '\\', '{', '}'];

/** Any text, with LaTeX's specials and stet's own Unicode much more likely than by chance. */
const text = fc.string({
  unit: fc.oneof(
    {weight: 3, arbitrary: fc.constantFrom(...specials, '<', '>', '|', '"', "'", '`', '-', '\n', '\u00a0')},
    {weight: 2, arbitrary: fc.constantFrom('χ', '²', '±', '−', '–', '—', 'α', 'η', '₀', '∞', 'é', 'ñ', 'ø', 'ß', 'ł', '中', '😀', 'Å', 'ı̇')},
    {weight: 3, arbitrary: fc.string({unit: 'binary', minLength: 1, maxLength: 1})},
    {weight: 2, arbitrary: fc.string({unit: 'binary-ascii', minLength: 1, maxLength: 1})},
  ),
  maxLength: 40,
});

/**
 * What remains once every construct the escaper emits is removed: must hold
 * no special character, or TeX would read it as markup.
 */
function strayMarkup(escaped: string): string {
  return escaped
    .replace(/\\ensuremath\{[^{}]*\}/g, '')
    .replace(/\\[`'^~=."uvHrc]\{\\?[A-Za-z]?\}/g, '')
    .replace(/\{\\[A-Za-z]+\}/g, '')
    .replace(/\\[A-Za-z]+\{\}/g, '')
    .replace(/\\[#$%&_{}]/g, '')
    .replace(/[-']\{\}/g, '');
}

describe('escapeLatex', () => {
  it('escapes the ten special characters', () => {
    expect(escapeLatex('# $ % & ~ _ ^ \\ { }')).toBe(
      '\\# \\$ \\% \\& \\textasciitilde{} \\_ \\textasciicircum{} \\textbackslash{} \\{ \\}',
    );
  });

  it('writes the Unicode of stet’s wording as LaTeX', () => {
    expect(escapeLatex('χ²(2) = 4.1')).toBe('\\ensuremath{\\chi}\\ensuremath{^2}(2) = 4.1');
    expect(escapeLatex('−1.2 ± 0.3')).toBe('\\ensuremath{-}1.2 \\ensuremath{\\pm} 0.3');
    expect(escapeLatex('Benjamini–Hochberg, H₀, α = .05')).toBe('Benjamini--Hochberg, H\\ensuremath{_0}, \\ensuremath{\\alpha} = .05');
    expect(escapeLatex('Cramér’s V')).toBe("Cram\\'{e}r's V");
  });

  it('keeps characters pdflatex cannot typeset visible as code points', () => {
    expect(escapeLatex('中 😀')).toBe('[U+4E2D] [U+1F600]');
  });

  it('never lets a value end a row or a paragraph', () => {
    expect(escapeLatex('a\nb\r\n\tc')).toBe('a b   c');
  });

  it('leaves only printable ASCII and no unescaped special character, whatever the input', () => {
    fc.assert(
      fc.property(text, (input) => {
        const escaped = escapeLatex(input);
        expect(escaped).toMatch(/^[\x20-\x7e]*$/);
        const stray = strayMarkup(escaped);
        for (const special of specials.filter((s) => s !== '~')) expect(stray).not.toContain(special);
        // A tie is the one bare special, and only for a no-break space.
        expect(stray.split('~').length - 1).toBe(input.normalize('NFC').split('\u00a0').length - 1);
      }),
      {numRuns: 2000},
    );
  });

  if (!hasPdflatex) console.warn('pdflatex not found: the test that compiles escaped text with pdflatex does not run.');

  it.runIf(hasPdflatex)('compiles with pdflatex in text, table cells, captions and macro bodies', async () => {
    const samples = fc.sample(text, {numRuns: 300});
    const body = samples
      .map((s, i) => {
        const e = escapeLatex(s);
        return `\\def\\v${roman(i)}{${e}}\n${e}\\par\n\\begin{tabular}{ll}${e} & \\v${roman(i)} \\tabularnewline\\end{tabular}\\par`;
      })
      .join('\n');
    const captions = samples.slice(0, 40).map((s) => `\\begin{table}[h]\\caption{${escapeLatex(s)}}\\end{table}`).join('\n');
    const dir = await mkdtemp(path.join(tmpdir(), 'stet-latex-'));
    await writeFile(path.join(dir, 'strings.tex'), `\\documentclass{article}\n\\begin{document}\n\\sloppy\n${body}\n${captions}\n\\end{document}\n`);
    const run = await runPdflatex(dir, 'strings.tex');
    expect(run.status, run.log.slice(-2000)).toBe(0);
    expect(latexProblems(run.log).filter((line) => !line.startsWith('Overfull'))).toEqual([]);
  });
});

/** Macro names take letters only. */
function roman(i: number): string {
  return [...String(i)].map((d) => 'abcdefghij'[Number(d)]).join('');
}
