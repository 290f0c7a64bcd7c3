import {mkdtemp, mkdir, readFile, readdir, writeFile} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';
import {runCli} from '../../src/cli/run-cli.js';

/** A throwaway folder with a report and its data, for end-to-end tests. */
export async function workspace(files: Record<string, string>): Promise<string> {
  const dir = await mkdtemp(path.join(tmpdir(), 'stet-test-'));
  for (const [name, content] of Object.entries(files)) {
    await mkdir(path.dirname(path.join(dir, name)), {recursive: true});
    await writeFile(path.join(dir, name), content);
  }
  return dir;
}

export interface CliRun {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

/** Run the CLI in-process, as a user would from a shell. */
export async function cli(...argv: string[]): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const code = await runCli(argv, {stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), colour: false});
  return {code, stdout, stderr};
}

/** Every file under `dir` with its bytes, for before/after comparisons. */
export async function snapshotFolder(dir: string): Promise<Map<string, string>> {
  const result = new Map<string, string>();
  const entries = await readdir(dir, {recursive: true, withFileTypes: true}).catch(() => []);
  for (const entry of entries) {
    if (!entry.isFile()) continue;
    const full = path.join(entry.parentPath, entry.name);
    result.set(path.relative(dir, full), await readFile(full, 'utf8'));
  }
  return result;
}
