import {randomBytes} from 'node:crypto';
import {mkdir, rename, rm, writeFile} from 'node:fs/promises';
import path from 'node:path';

/**
 * Write a set of files so that readers never see a half-built output: every
 * file is first written into a staging folder inside `outDir`, then renamed
 * into place (rename is atomic within one file system). If any write
 * fails, nothing is renamed and the previous output stays as it was.
 *
 * @param files Paths relative to `outDir`, with their contents.
 * @returns The absolute paths written.
 */
export async function writeAtomically(outDir: string, files: ReadonlyMap<string, string>): Promise<string[]> {
  await mkdir(outDir, {recursive: true});
  const staging = path.join(outDir, `.stet-staging-${process.pid}-${randomBytes(4).toString('hex')}`);
  try {
    for (const [relative, content] of files) {
      const target = path.join(staging, relative);
      await mkdir(path.dirname(target), {recursive: true});
      await writeFile(target, content);
    }
    const written: string[] = [];
    for (const relative of files.keys()) {
      const destination = path.join(outDir, relative);
      await mkdir(path.dirname(destination), {recursive: true});
      await rename(path.join(staging, relative), destination);
      written.push(destination);
    }
    return written;
  } finally {
    await rm(staging, {recursive: true, force: true});
  }
}
