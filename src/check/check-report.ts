import {readFile} from 'node:fs/promises';
import path from 'node:path';
import type {VFileMessage} from 'vfile-message';
import {countSpecifications, readLedger} from '../ledger/ledger.js';
import {readLock} from '../lock/lock-file.js';
import {sha256} from '../spec/spec-fingerprint.js';
import {version} from '../version.js';
import {explainInputs} from './explain-inputs.js';
import {compareOutputs} from './compare-outputs.js';
import {hashTemplates, manifestName, readManifest, templateFile, type BuildManifest} from './manifest.js';
import {outputHash} from './output-hash.js';

/** Options of `checkReport`; every field optional. */
export interface CheckOptions {
  /** Output folder (default: `out/` beside the report). */
  out?: string | undefined;
  /** Allow data files outside the report's folder (default: false). */
  allowOutside?: boolean | undefined;
}

/** One reason the output is stale: `subject: reason`. */
export interface Finding {
  /** A block (`block supplier`), a file (absolute path) or the report. */
  readonly subject: string;
  readonly reason: string;
  /** Output findings make the output stale; input findings explain why. */
  readonly kind: 'input' | 'output';
}

export interface CheckResult {
  /** True when every output is what a build would write now. */
  readonly fresh: boolean;
  /** False when the hashes alone showed nothing changed. */
  readonly compiled: boolean;
  readonly findings: readonly Finding[];
  /** Messages of the in-memory compile (errors make the result stale). */
  readonly messages: readonly VFileMessage[];
  readonly outDir: string;
}

/**
 * Is the output in `outDir` what a build of the report would write now?
 *
 *   read the build record → hash report, data, templates; lock and ledger
 *   → all equal and every output untouched: fresh, nothing compiled
 *   → otherwise compile in memory, compare file by file, explain
 *
 * Writes nothing (the ledger included).
 */
export async function checkReport(reportPath: string, options: CheckOptions = {}): Promise<CheckResult> {
  const absolute = path.resolve(reportPath);
  const outDir = path.resolve(options.out ?? path.join(path.dirname(absolute), 'out'));
  const manifest = await readManifest(outDir);

  // 1. Fast path: hashes only.
  if (manifest && (await unchanged(absolute, outDir, manifest, options.allowOutside ?? false))) {
    return {fresh: true, compiled: false, findings: [], messages: [], outDir};
  }

  // 2. Compile in memory as the last build did, and compare.
  // Loaded only now: the fast path above never needs the compiler.
  const {compileReport} = await import('../compile-report.js');
  const compiled = await compileReport(absolute, {
    out: outDir,
    allowOutside: options.allowOutside,
    ...(manifest ? {formats: new Set(manifest.formats), template: templateFile(absolute, manifest.page.template)?.file, allowHtml: manifest.page.allow_html} : {}),
  });
  if (!compiled.ok) return {fresh: false, compiled: true, findings: [], messages: compiled.messages, outDir};
  const outputs = await compareOutputs(outDir, compiled.files, manifest);
  const inputs = manifest
    ? await explainInputs(compiled, manifest)
    : [{subject: path.join(outDir, manifestName), reason: 'missing: no record of a build here (run `stet build`)', kind: 'output' as const}];
  const findings = [...inputs, ...outputs];
  return {fresh: !findings.some((f) => f.kind === 'output'), compiled: true, findings, messages: compiled.messages, outDir};
}

async function unchanged(reportPath: string, outDir: string, manifest: BuildManifest, allowOutside: boolean): Promise<boolean> {
  const reportDir = path.dirname(reportPath);
  if (manifest.stet !== version) return false;
  if (sha256(await readFile(reportPath)) !== manifest.report.sha256) return false;
  if (manifest.formats.includes('html') && !sameRecord(await hashTemplates(templateFile(reportPath, manifest.page.template)), manifest.templates)) return false;
  for (const dataset of Object.values(manifest.datasets)) {
    const file = path.resolve(reportDir, dataset.file);
    const relative = path.relative(reportDir, file);
    if (!allowOutside && (relative.startsWith('..') || path.isAbsolute(relative))) return false;
    if ((await hashFile(file)) !== dataset.sha256) return false;
  }
  // The report is unchanged, so each block's recorded specification still holds.
  const [lock, ledger] = await Promise.all([readLock(reportPath).catch(() => null), readLedger(reportDir)]);
  if (lock === null) return false;
  for (const [id, block] of Object.entries(manifest.blocks)) {
    if (!block.disclosure) continue;
    const lockedHash = lock?.blocks[id]?.hash;
    const plan = lock ? (lockedHash === block.disclosure.plan_hash ? 'confirmatory' : 'exploratory') : null;
    const count = countSpecifications(ledger, manifest.report.file, id, block.disclosure.specification);
    if (plan !== block.disclosure.plan || count !== block.disclosure.specifications) return false;
  }
  for (const [file, hash] of Object.entries(manifest.outputs)) {
    const content = await readFile(path.join(outDir, file), 'utf8').catch(() => undefined);
    if (content === undefined || outputHash(content) !== hash) return false;
  }
  return true;
}

export async function hashFile(file: string): Promise<string | undefined> {
  try {
    return sha256(await readFile(file));
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
    throw error;
  }
}

function sameRecord(a: Readonly<Record<string, string>>, b: Readonly<Record<string, string>>): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  return [...keys].every((key) => a[key] === b[key]);
}
