import type {VFileMessage} from 'vfile-message';
import {compileReport, type CompileOptions} from './compile-report.js';
import {writeAtomically} from './write/write-atomically.js';

export type BuildOptions = CompileOptions;

export interface BuildResult {
  readonly ok: boolean;
  /** Errors and warnings, with places, in document order. */
  readonly messages: readonly VFileMessage[];
  /** Absolute paths written (empty when the build failed). */
  readonly written: readonly string[];
  readonly outDir: string;
}

/**
 * Build a report: compile it in memory, then write every output atomically.
 * A build with any error writes nothing.
 */
export async function buildReport(reportPath: string, options: BuildOptions = {}): Promise<BuildResult> {
  const compiled = await compileReport(reportPath, options);
  const {ok, messages, outDir} = compiled;
  if (!ok) return {ok, messages, written: [], outDir};
  return {ok, messages, written: await writeAtomically(outDir, compiled.files), outDir};
}
