import path from 'node:path';
import type {VFileMessage} from 'vfile-message';
import {createManifest, manifestName} from './check/manifest.js';
import {compileReport, defaultFormats, type CompiledReport, type CompileOptions} from './compile-report.js';
import {recordEvaluations} from './ledger/record-evaluations.js';
import {writeAtomically} from './write/write-atomically.js';

export type BuildOptions = CompileOptions;

export interface BuildResult {
  readonly ok: boolean;
  /** Errors and warnings, with places, in document order. */
  readonly messages: readonly VFileMessage[];
  /** Absolute paths written (empty when the build failed); the build record not included. */
  readonly written: readonly string[];
  readonly outDir: string;
}

/**
 * Build a report: compile it in memory, then write every output atomically
 * with the build record `stet check` reads, then append what was evaluated
 * to the ledger. A build with any error writes nothing.
 */
export async function buildReport(reportPath: string, options: BuildOptions = {}): Promise<BuildResult> {
  const compiled = await compileReport(reportPath, options);
  const {ok, messages, outDir} = compiled;
  if (!ok) return {ok, messages, written: [], outDir};
  return {ok, messages, written: await writeBuild(compiled, options), outDir};
}

/**
 * Write a compiled report as a build: outputs and the build record
 * atomically, then the ledger. `stet watch` writes through here too, so
 * `check` and the ledger see every build, however it was started.
 * @returns The absolute paths written, the build record not included.
 */
export async function writeBuild(compiled: CompiledReport, options: BuildOptions): Promise<string[]> {
  const manifest = await createManifest(compiled, {
    formats: options.formats ?? defaultFormats,
    allowOutside: options.allowOutside ?? false,
    template: options.template,
    allowHtml: options.allowHtml ?? false,
  });
  const written = await writeAtomically(compiled.outDir, new Map([...compiled.files, [manifestName, manifest]]));
  await recordEvaluations(compiled, (options.now ?? (() => new Date()))());
  return written.filter((file) => path.basename(file) !== manifestName);
}
