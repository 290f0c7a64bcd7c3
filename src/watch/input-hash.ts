import {createHash} from 'node:crypto';
import {readFile, readdir} from 'node:fs/promises';
import path from 'node:path';

/**
 * The sha256 (hex) of each file's bytes, or `missing`: what decides whether
 * anything changed, whatever the editor's file events looked like. Same
 * form as a loaded dataset's `sha256`, so the two can be compared.
 */
export async function hashFiles(files: readonly string[]): Promise<Map<string, string>> {
  const unique = [...new Set(files)];
  const hashes = await Promise.all(unique.map(async (file) => {
    const content = await readFile(file).catch(() => undefined);
    return content === undefined ? 'missing' : createHash('sha256').update(content).digest('hex');
  }));
  return new Map(unique.map((file, i) => [file, hashes[i]!]));
}

/** The regular files directly inside a folder (a template folder's files). */
export async function filesIn(folder: string): Promise<string[]> {
  const entries = await readdir(folder, {withFileTypes: true}).catch(() => []);
  return entries.filter((entry) => entry.isFile()).map((entry) => path.join(folder, entry.name));
}
