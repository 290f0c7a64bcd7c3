import {readFile} from 'node:fs/promises';
import path from 'node:path';
import type {Finding} from './check-report.js';
import type {BuildManifest} from './manifest.js';
import {outputHash, withoutBuildTime} from './output-hash.js';

/**
 * Each output file against what a build would write now: missing, edited by
 * hand since the last build (its bytes differ from the recorded hash), out
 * of date, or no longer produced.
 */
export async function compareOutputs(outDir: string, expected: ReadonlyMap<string, string>, manifest: BuildManifest | undefined): Promise<Finding[]> {
  const findings: Finding[] = [];
  const finding = (file: string, reason: string) => findings.push({subject: path.join(outDir, file), reason, kind: 'output'});
  for (const [file, content] of expected) {
    const onDisk = await readText(path.join(outDir, file));
    if (onDisk === undefined) {
      finding(file, 'missing');
      continue;
    }
    const recorded = manifest?.outputs[file];
    if (recorded !== undefined && outputHash(onDisk) !== recorded) finding(file, 'edited by hand since the last build (a build will overwrite it)');
    else if (withoutBuildTime(onDisk) !== withoutBuildTime(content)) finding(file, 'out of date');
  }
  for (const file of Object.keys(manifest?.outputs ?? {}).sort()) {
    if (!expected.has(file) && (await readText(path.join(outDir, file))) !== undefined) finding(file, 'no longer produced by the report');
  }
  return findings;
}

async function readText(file: string): Promise<string | undefined> {
  try {
    return await readFile(file, 'utf8');
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
    throw error;
  }
}
