import {mkdir, readFile, readdir, writeFile} from 'node:fs/promises';
import path from 'node:path';
import {beforeAll, describe, expect, it} from 'vitest';
import {createBlockCache, type BlockCache} from '../../src/cache/block-cache.js';
import {compileReport} from '../../src/compile-report.js';
import {copySample} from '../helpers/sample-copy.js';

const now = () => new Date('2026-01-02T03:04:05Z');

async function compile(dir: string, cache?: BlockCache) {
  cache?.beginBuild();
  const compiled = await compileReport(path.join(dir, 'report.md'), {now, cache});
  const counts = await cache?.endBuild();
  expect(compiled.messages.filter((m) => m.fatal).map(String)).toEqual([]);
  return {files: compiled.files, counts, compiled};
}

describe('the block cache', () => {
  let dir: string;
  let cacheDir: string;
  let blocksOf: Map<string, number>;

  beforeAll(async () => {
    dir = await copySample();
    cacheDir = path.join(dir, '.stet', 'cache');
    const cold = await compile(dir);
    const results = JSON.parse(cold.files.get('report.results.json')!) as {blocks: Record<string, {data: string}>};
    blocksOf = new Map();
    for (const block of Object.values(results.blocks)) blocksOf.set(block.data, (blocksOf.get(block.data) ?? 0) + 1);
  });

  it('changes no byte of any output: cold, first cached, memory-cached and disk-cached builds agree', async () => {
    const cold = await compile(dir);
    const cache = createBlockCache({dir: cacheDir});
    const first = await compile(dir, cache);
    const second = await compile(dir, cache);
    const fromDisk = await compile(dir, createBlockCache({dir: cacheDir}));
    const total = [...blocksOf.values()].reduce((a, b) => a + b, 0);
    expect(first.counts).toMatchObject({computed: total, reused: 0});
    expect(second.counts).toMatchObject({computed: 0, reused: total, chartsRendered: 0});
    expect(fromDisk.counts).toMatchObject({computed: 0, reused: total, chartsRendered: 0});
    expect(second.counts!.chartsReused).toBeGreaterThan(0);
    for (const build of [first, second, fromDisk]) expect(build.files).toEqual(cold.files);
  });

  it('recomputes only the blocks that read an edited dataset, and the result is the cold build', async () => {
    const cache = createBlockCache({dir: cacheDir});
    await compile(dir, cache);
    const file = path.join(dir, 'data', 'cylinders.csv');
    const text = await readFile(file, 'utf8');
    const edited = text.replace(/^(C002,Northfield,2026-09-02,28,)38\.6,/m, '$141.6,');
    expect(edited).not.toBe(text);
    await writeFile(file, edited);
    const cached = await compile(dir, cache);
    const cold = await compile(dir);
    expect(cached.counts).toMatchObject({computed: blocksOf.get('cylinders'), reused: [...blocksOf].filter(([d]) => d !== 'cylinders').reduce((a, [, n]) => a + n, 0)});
    expect(blocksOf.get('cylinders')).toBeGreaterThan(0);
    expect(cached.files).toEqual(cold.files);
  });

  it('recomputes nothing after a prose edit that moves every block, and still writes the cold build', async () => {
    const cache = createBlockCache({dir: cacheDir});
    await compile(dir, cache);
    const report = path.join(dir, 'report.md');
    const text = await readFile(report, 'utf8');
    // After the front matter: every block moves down three lines.
    const edited = text.replace(/^---\n([\s\S]*?)\n---\n/, (whole) => `${whole}\nA new paragraph of prose.\n\n`);
    expect(edited).not.toBe(text);
    await writeFile(report, edited);
    const cached = await compile(dir, cache);
    const cold = await compile(dir);
    expect(cached.counts).toMatchObject({computed: 0, chartsRendered: 0});
    expect(cached.files).toEqual(cold.files);
  });

  it('forgets, on disk too, the entries the last build did not use', async () => {
    const cache = createBlockCache({dir: cacheDir});
    await mkdir(path.join(cacheDir, 'blocks'), {recursive: true});
    await writeFile(path.join(cacheDir, 'blocks', `${'0'.repeat(64)}.json`), '{}');
    await compile(dir, cache);
    const names = await readdir(path.join(cacheDir, 'blocks'));
    expect(names).not.toContain(`${'0'.repeat(64)}.json`);
    expect(names.length).toBe([...blocksOf.values()].reduce((a, b) => a + b, 0));
  });

  it('recomputes a damaged disk entry instead of failing', async () => {
    await compile(dir, createBlockCache({dir: cacheDir}));
    for (const name of await readdir(path.join(cacheDir, 'blocks'))) await writeFile(path.join(cacheDir, 'blocks', name), '{"not":');
    const cold = await compile(dir);
    const damaged = await compile(dir, createBlockCache({dir: cacheDir}));
    expect(damaged.counts!.reused).toBe(0);
    expect(damaged.files).toEqual(cold.files);
  });
});
