import {readFile, writeFile} from 'node:fs/promises';
import path from 'node:path';
import {bench, describe} from 'vitest';
import {createBlockCache} from '../../src/cache/block-cache.js';
import {compileReport} from '../../src/compile-report.js';
import {writeAtomically} from '../../src/write/write-atomically.js';
import {copySample} from '../helpers/sample-copy.js';

/**
 * What `stet watch` saves: a cold build of the concrete sample against a
 * rebuild after one dataset changed, with the block cache warm (as in a
 * watch session: only the blocks reading that dataset recompute).
 * Each iteration edits one cylinder, alternating two values so every
 * iteration really changes the data.
 */
const dir = await copySample();
const report = path.join(dir, 'report.md');
const data = path.join(dir, 'data', 'cylinders.csv');
const original = await readFile(data, 'utf8');
const edited = original.replace(/^(C002,Northfield,2026-09-02,28,)38\.6,/m, '$139.1,');
if (edited === original) throw new Error('the sample changed: update the edited cell');
const now = () => new Date('2026-01-02T03:04:05Z');
const cache = createBlockCache({dir: path.join(dir, '.stet', 'cache')});
let flip = false;

async function build(withCache: boolean): Promise<void> {
  if (withCache) cache.beginBuild();
  const compiled = await compileReport(report, {now, cache: withCache ? cache : undefined});
  if (withCache) await cache.endBuild();
  if (!compiled.ok) throw new Error('the sample failed to build');
  await writeAtomically(compiled.outDir, compiled.files);
}

describe('rebuild of samples/concrete', () => {
  bench('cold build', async () => {
    await build(false);
  }, {time: 4000, warmupIterations: 2});

  bench('rebuild after editing one dataset (cache)', async () => {
    flip = !flip;
    await writeFile(data, flip ? edited : original);
    await build(true);
  }, {time: 4000, warmupIterations: 2, setup: async () => build(true)});

  bench('rebuild after editing prose only (cache)', async () => {
    await build(true);
  }, {time: 4000, warmupIterations: 2, setup: async () => build(true)});
});
