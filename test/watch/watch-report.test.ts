import {readFile, readdir, rename, rm, writeFile} from 'node:fs/promises';
import path from 'node:path';
import v8 from 'node:v8';
import vm from 'node:vm';
import {afterEach, describe, expect, it} from 'vitest';
import {watchReport, type BuildOutcome, type WatchSession} from '../../src/watch/watch-report.js';
import {snapshotFolder, workspace} from '../helpers/workspace.js';

const report = `---
title: Beams
stet:
  datasets:
    beams: data/beams.csv
    spare: other/spare.csv
---

# Beams

\`\`\`stet
id: load
test: welch-t
data: beams
y: load
by: mill
show: [sentence]
\`\`\`

Mill A averaged {{load.groups.A.mean}} kN.

\`\`\`stet
id: spare
test: one-sample-t
data: spare
y: v
mu: 0
show: [sentence]
\`\`\`
`;

/** Two mills; `shift` moves mill B's loads (invented numbers). */
function beams(shift: number, firstA = 10.1): string {
  const a = [firstA, 9.8, 10.4, 10.0, 9.7, 10.2];
  const b = [10.3, 9.9, 10.6, 10.1, 9.6, 10.4].map((v) => Math.round((v + shift) * 100) / 100);
  return `mill,load\n${a.map((v) => `A,${v}`).join('\n')}\n${b.map((v) => `B,${v}`).join('\n')}\n`;
}
const spare = 'v\n0.3\n-0.1\n0.4\n0.2\n-0.2\n0.5\n';

interface Harness {
  dir: string;
  session: WatchSession;
  outcomes: BuildOutcome[];
  /** Wait for the next build, then make sure no further build follows. */
  nextBuild(): Promise<BuildOutcome>;
  results(): Promise<{blocks: Record<string, Record<string, any>>}>;
}

const sessions: WatchSession[] = [];
afterEach(async () => {
  await Promise.all(sessions.splice(0).map((session) => session.close()));
});

async function start(debounceMs = 100): Promise<Harness> {
  const dir = await workspace({'report.md': report, 'data/beams.csv': beams(0), 'other/spare.csv': spare, 'theme/report.css': 'p {}'});
  const outcomes: BuildOutcome[] = [];
  const session = await watchReport(path.join(dir, 'report.md'), {
    debounceMs,
    onBuild: (o) => outcomes.push(o),
    now: () => new Date(0),
    templateDirs: [path.join(dir, 'theme')],
  });
  sessions.push(session);
  expect(outcomes).toHaveLength(1);
  expect(outcomes[0]!.ok).toBe(true);
  return {
    dir,
    session,
    outcomes,
    async nextBuild() {
      const before = outcomes.length;
      await waitFor(() => outcomes.length > before);
      // Quiet for several debounce periods: no second build from one edit.
      await new Promise((resolve) => setTimeout(resolve, debounceMs * 4 + 200));
      await session.settled();
      expect(outcomes.length - before).toBe(1);
      return outcomes.at(-1)!;
    },
    async results() {
      return JSON.parse(await readFile(path.join(dir, 'out', 'report.results.json'), 'utf8'));
    },
  };
}

async function waitFor(condition: () => boolean, timeout = 10_000): Promise<void> {
  const started = Date.now();
  while (!condition()) {
    if (Date.now() - started > timeout) throw new Error('timed out waiting');
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
}

const meanOfA = async (h: Harness) => (await h.results()).blocks['load']!['groups'].A.mean as number;

describe('watching a report', () => {
  it('rebuilds once after an edit of a dataset', async () => {
    const h = await start();
    await writeFile(path.join(h.dir, 'data/beams.csv'), beams(0, 11.3));
    const outcome = await h.nextBuild();
    expect(outcome.ok && outcome.report.counts).toMatchObject({computed: 1, reused: 1});
    expect(await meanOfA(h)).toBeCloseTo((11.3 + 9.8 + 10.4 + 10.0 + 9.7 + 10.2) / 6, 12);
    expect(outcome.ok && outcome.report.changed.map((c) => `${c.block}.${c.field}`)).toContain('load.groups.A.mean');
  });

  it('rebuilds once after an atomic save (write a temporary file, rename it over), with the final content', async () => {
    const h = await start();
    const temporary = path.join(h.dir, 'data/.beams.csv.swp-x');
    await writeFile(temporary, beams(0, 12.5));
    await rename(temporary, path.join(h.dir, 'data/beams.csv'));
    await h.nextBuild();
    expect(await meanOfA(h)).toBeCloseTo((12.5 + 9.8 + 10.4 + 10.0 + 9.7 + 10.2) / 6, 12);
  });

  it('rebuilds after a file is deleted and written again', async () => {
    const h = await start();
    await rm(path.join(h.dir, 'data/beams.csv'));
    await writeFile(path.join(h.dir, 'data/beams.csv'), beams(0, 13.1));
    const outcome = await h.nextBuild();
    expect(outcome.ok).toBe(true);
    expect(await meanOfA(h)).toBeCloseTo((13.1 + 9.8 + 10.4 + 10.0 + 9.7 + 10.2) / 6, 12);
  });

  it('turns a burst of 50 writes into one rebuild that reads the last', async () => {
    const h = await start();
    for (let i = 1; i <= 50; i++) await writeFile(path.join(h.dir, 'data/beams.csv'), beams(0, 10 + i / 10));
    await h.nextBuild();
    expect(await meanOfA(h)).toBeCloseTo((15 + 9.8 + 10.4 + 10.0 + 9.7 + 10.2) / 6, 12);
  });

  it('does not rebuild when a save leaves the bytes as they were, or an unrelated file changes', async () => {
    const h = await start();
    await writeFile(path.join(h.dir, 'data/beams.csv'), beams(0));
    await writeFile(path.join(h.dir, 'notes.txt'), 'not an input');
    await new Promise((resolve) => setTimeout(resolve, 600));
    await h.session.settled();
    expect(h.outcomes).toHaveLength(1);
  });

  it('rebuilds when a template file changes, recomputing no block', async () => {
    const h = await start();
    await writeFile(path.join(h.dir, 'theme/report.css'), 'p { color: black }');
    const outcome = await h.nextBuild();
    expect(outcome.ok && outcome.report.counts).toMatchObject({computed: 0, reused: 2});
  });

  it('recomputes no block after a prose edit', async () => {
    const h = await start();
    await writeFile(path.join(h.dir, 'report.md'), report.replace('# Beams', '# Beams\n\nA new paragraph.'));
    const outcome = await h.nextBuild();
    expect(outcome.ok && outcome.report.counts).toMatchObject({computed: 0, reused: 2});
  });

  it('alerts when an edit of the data flips a conclusion', async () => {
    const h = await start();
    expect((await h.results()).blocks['load']!['decision']).toBe('fail-to-reject');
    await writeFile(path.join(h.dir, 'data/beams.csv'), beams(3));
    const outcome = await h.nextBuild();
    expect((await h.results()).blocks['load']!['decision']).toBe('reject');
    expect(outcome.ok && outcome.report.flips).toContainEqual({block: 'load', kind: 'decision', detail: 'fail-to-reject → reject'});
  });

  it('keeps the last good output on an error and recovers when the data is fixed', async () => {
    const h = await start();
    const out = path.join(h.dir, 'out');
    const good = await snapshotFolder(out);
    await writeFile(path.join(h.dir, 'data/beams.csv'), beams(0).replace('A,9.8', 'A,nine'));
    const failed = await h.nextBuild();
    expect(failed.ok).toBe(false);
    expect(!failed.ok && failed.messages.map((m) => `${m.reason} [${m.ruleId}]`).join('\n')).toMatch(/nine/);
    expect(await snapshotFolder(out)).toEqual(good);
    await writeFile(path.join(h.dir, 'data/beams.csv'), beams(0, 10.9));
    const fixed = await h.nextBuild();
    expect(fixed.ok).toBe(true);
    expect(await meanOfA(h)).toBeCloseTo((10.9 + 9.8 + 10.4 + 10.0 + 9.7 + 10.2) / 6, 12);
  });

  it('keeps watching when the output cannot be written, and writes it once it can', async () => {
    const dir = await workspace({'report.md': report, 'data/beams.csv': beams(0), 'other/spare.csv': spare, 'blocked': 'a file, not a folder'});
    const outcomes: BuildOutcome[] = [];
    const session = await watchReport(path.join(dir, 'report.md'), {out: path.join(dir, 'blocked'), onBuild: (o) => outcomes.push(o)});
    sessions.push(session);
    expect(outcomes.map((o) => o.ok)).toEqual([false]);
    await rm(path.join(dir, 'blocked'));
    // No input changed, but the failed write is retried on the next event.
    await writeFile(path.join(dir, 'notes.txt'), 'any event');
    await waitFor(() => outcomes.length > 1);
    await session.settled();
    expect(outcomes.at(-1)!.ok).toBe(true);
    expect(JSON.parse(await readFile(path.join(dir, 'blocked', 'report.results.json'), 'utf8')).blocks.load.groups.A.mean)
      .toBeCloseTo((10.1 + 9.8 + 10.4 + 10.0 + 9.7 + 10.2) / 6, 12);
  });

  it('watches a dataset that an edit of the report adds, in a folder not watched before', async () => {
    const h = await start();
    await writeFile(path.join(h.dir, 'report.md'), `${report}\n\`\`\`stet\nid: extra\ntest: one-sample-t\ndata: more/extra.csv\ny: v\nmu: 0\nshow: [sentence]\n\`\`\`\n`);
    // The block's data does not exist yet: an error, then its creation fixes it.
    const failed = await h.nextBuild();
    expect(failed.ok).toBe(false);
    await writeFile(path.join(h.dir, 'other/spare.csv'), spare); // unchanged bytes in a watched folder
    const {mkdir} = await import('node:fs/promises');
    await mkdir(path.join(h.dir, 'more'));
    await writeFile(path.join(h.dir, 'more/extra.csv'), spare);
    // A new folder beside the report is an event of the report's folder: the build retries.
    const built = await h.nextBuild();
    expect(built.ok).toBe(true);
    await writeFile(path.join(h.dir, 'more/extra.csv'), 'v\n1\n2\n3\n4\n');
    await h.nextBuild();
    expect((await h.results()).blocks['extra']!['groups'].all.mean).toBe(2.5);
  });

  it('stays bounded over 200 edit cycles: heap and open files', async () => {
    v8.setFlagsFromString('--expose-gc');
    const gc = vm.runInNewContext('gc') as () => void;
    const h = await start(5);
    const fds = async () => (await readdir('/proc/self/fd').catch(() => [])).length;
    const measure = async () => {
      await h.session.settled();
      gc();
      gc();
      return {heap: process.memoryUsage().heapUsed, fds: await fds()};
    };
    let warm = {heap: 0, fds: 0};
    let middle = {heap: 0, fds: 0};
    let allOk = true;
    for (let cycle = 1; cycle <= 200; cycle++) {
      h.outcomes.length = 0; // The harness would otherwise keep every build alive.
      await writeFile(path.join(h.dir, 'data/beams.csv'), beams(0, 10 + cycle / 1000));
      await waitFor(() => h.outcomes.length > 0);
      allOk &&= h.outcomes.every((o) => o.ok);
      if (cycle === 20) warm = await measure();
      if (cycle === 110) middle = await measure();
    }
    const end = await measure();
    const growth = {heapMiB: (end.heap - warm.heap) / 2 ** 20, fds: end.fds - warm.fds};
    const mib = (bytes: number) => (bytes / 2 ** 20).toFixed(2);
    console.log(`watch leak check, cycles 20/110/200: heap ${mib(warm.heap)} / ${mib(middle.heap)} / ${mib(end.heap)} MiB, open fds ${warm.fds} / ${middle.fds} / ${end.fds}`);
    expect(allOk).toBe(true);
    // 180 cycles: keeping one build's output, tree or cache entries per
    // cycle (tens of KiB each) would exceed this; the slack covers JIT code
    // and chokidar's bookkeeping, which level off.
    expect(growth.heapMiB).toBeLessThan(4);
    // Descriptors: chokidar's watches and vitest's own pipes are constant.
    if (warm.fds > 0) expect(growth.fds).toBeLessThanOrEqual(2);
  }, 60_000);
});
