import {createHash} from 'node:crypto';
import {readFile, readdir} from 'node:fs/promises';
import path from 'node:path';

/**
 * One sha256 over the content of every input of a build (files in order,
 * a missing file counted as missing), so a rebuild happens only when some
 * input's bytes changed — whatever the editor's events looked like.
 */
export async function hashInputs(files: readonly string[]): Promise<string> {
  const hash = createHash('sha256');
  for (const file of [...new Set(files)].sort()) {
    const content = await readFile(file).catch(() => undefined);
    hash.update(`${file}\0${content === undefined ? 'missing' : createHash('sha256').update(content).digest('hex')}\0`);
  }
  return hash.digest('hex');
}

/** The regular files directly inside a folder (a template folder's files). */
export async function filesIn(folder: string): Promise<string[]> {
  const entries = await readdir(folder, {withFileTypes: true}).catch(() => []);
  return entries.filter((entry) => entry.isFile()).map((entry) => path.join(folder, entry.name));
}
