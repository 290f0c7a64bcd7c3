import {cp, mkdtemp, rm} from 'node:fs/promises';
import {tmpdir} from 'node:os';
import path from 'node:path';

const sample = new URL('../../samples/concrete/', import.meta.url).pathname;

/** A throwaway copy of the concrete sample (report and data, no outputs). */
export async function copySample(): Promise<string> {
  const dir = await mkdtemp(path.join(tmpdir(), 'stet-sample-copy-'));
  await cp(path.join(sample, 'report.md'), path.join(dir, 'report.md'));
  await cp(path.join(sample, 'data'), path.join(dir, 'data'), {recursive: true});
  await rm(path.join(dir, 'out'), {recursive: true, force: true});
  return dir;
}
