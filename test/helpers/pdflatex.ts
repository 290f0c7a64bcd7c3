import {spawnSync} from 'node:child_process';
import {readFile} from 'node:fs/promises';
import path from 'node:path';

function available(command: string, flag: string): boolean {
  return spawnSync(command, [flag], {stdio: 'ignore'}).status === 0;
}

/** pdflatex from TeX Live (CI installs texlive-latex-base and -recommended). */
export const hasPdflatex = available('pdflatex', '--version');
/** pdftotext from poppler-utils, optional. */
export const hasPdftotext = available('pdftotext', '-v');

export interface LatexRun {
  readonly status: number | null;
  readonly log: string;
  readonly ms: number;
}

/** `pdflatex -interaction=nonstopmode -halt-on-error FILE` in `dir`. */
export async function runPdflatex(dir: string, file: string): Promise<LatexRun> {
  const start = performance.now();
  const run = spawnSync('pdflatex', ['-interaction=nonstopmode', '-halt-on-error', file], {cwd: dir, encoding: 'utf8', timeout: 60_000});
  const ms = performance.now() - start;
  const log = await readFile(path.join(dir, file.replace(/\.tex$/, '.log')), 'utf8').catch(() => run.stdout ?? '');
  return {status: run.status, log, ms};
}

/** Text of a PDF by pdftotext, or undefined when poppler-utils is absent. */
export function pdfText(pdf: string): string | undefined {
  if (!hasPdftotext) return undefined;
  return spawnSync('pdftotext', ['-layout', pdf, '-'], {encoding: 'utf8'}).stdout;
}

/** Lines of a LaTeX log that report an error or a box too wide. */
export function latexProblems(log: string): string[] {
  return log.split('\n').filter((line) => /^!|Overfull \\hbox|Undefined control sequence|Missing character/.test(line));
}
