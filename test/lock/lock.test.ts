import {readFile, writeFile} from 'node:fs/promises';
import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {buildReport} from '../../src/build-report.js';
import {createLock, readLock, writeLock} from '../../src/lock/lock-file.js';
import {planDifferences} from '../../src/lock/plan-diff.js';
import {readPlan} from '../../src/lock/read-plan.js';
import {edit, smallWorkspace} from '../helpers/small-report.js';

interface Results {
  blocks: Record<string, {sentence: string; plan?: string}>;
}

async function lockNow(report: string, when = '2026-03-01T00:00:00Z'): Promise<void> {
  const plan = await readPlan(report);
  expect(plan.messages).toEqual([]);
  await writeLock(report, createLock('report.md', plan.specs, plan.settings.adjust, new Date(when), await readLock(report)));
}

async function build(report: string): Promise<{results: Results; markdown: string}> {
  const result = await buildReport(report);
  expect(result.messages.map(String)).toEqual([]);
  const out = path.join(path.dirname(report), 'out');
  return {
    results: JSON.parse(await readFile(path.join(out, 'report.results.json'), 'utf8')) as Results,
    markdown: await readFile(path.join(out, 'report.md'), 'utf8'),
  };
}

const plans = (results: Results) => Object.fromEntries(Object.entries(results.blocks).map(([id, b]) => [id, b.plan]));

describe('the plan lock', () => {
  it('labels nothing when there is no lock', async () => {
    const {results, markdown} = await build(await smallWorkspace());
    expect(plans(results)).toEqual({rigs: undefined, nominal: undefined});
    expect(markdown).not.toMatch(/onfirmatory|xploratory|Plan:/);
  });

  it('labels every locked block confirmatory, in the JSON, the sentence and beside the table', async () => {
    const report = await smallWorkspace();
    await lockNow(report);
    const {results, markdown} = await build(report);
    expect(plans(results)).toEqual({rigs: 'confirmatory', nominal: 'confirmatory'});
    expect(results.blocks['rigs']!.sentence).toMatch(/ Confirmatory: this comparison is as declared in the locked analysis plan\.$/);
    expect(markdown).toContain('Plan: confirmatory (as locked in stet.lock).');
  });

  it('labels a changed block and an added block exploratory, the others confirmatory', async () => {
    const report = await smallWorkspace();
    await lockNow(report);
    await edit(report, 'mu: 10', 'mu: 10\nalpha: 0.10 # a screening check, looser on purpose');
    await edit(report, 'Rig A against', '```stet\nid: spread\ntest: levene\ndata: loads\ny: load_kn\nby: rig\nlevels: [A, B]\nchart: none\n```\n\nRig A against');
    const {results} = await build(report);
    expect(plans(results)).toEqual({rigs: 'confirmatory', nominal: 'exploratory', spread: 'exploratory'});
    expect(results.blocks['nominal']!.sentence).toContain('Exploratory: this comparison is not in the locked analysis plan, or changed since the plan was locked.');
  });

  it('ignores presentation: a caption or chart change stays confirmatory', async () => {
    const report = await smallWorkspace();
    await lockNow(report);
    await edit(report, 'mu: 10\nchart: none', 'mu: 10\nchart: histogram\ncaption: Loads of rig A.');
    expect(plans((await build(report)).results)['nominal']).toBe('confirmatory');
  });

  it('lists differences field by field, additions and removals', async () => {
    const report = await smallWorkspace();
    await lockNow(report);
    await edit(report, 'mu: 10', 'mu: 10.5\nalternative: greater');
    await edit(report, 'id: rigs', 'id: rigs-ab');
    const plan = await readPlan(report);
    expect(planDifferences((await readLock(report))!, plan.specs, plan.settings.adjust)).toEqual([
      'rigs-ab: not in the lock (added since)',
      'nominal: alternative two-sided → greater',
      'nominal: mu 10 → 10.5',
      'rigs: in the lock but no longer in the report',
    ]);
  });

  it('writes the same bytes for the same plan, keeping the time an unchanged block was locked', async () => {
    const report = await smallWorkspace();
    await lockNow(report, '2026-03-01T00:00:00Z');
    const first = await readFile(path.join(path.dirname(report), 'stet.lock'), 'utf8');
    await lockNow(report, '2026-04-01T00:00:00Z');
    expect(await readFile(path.join(path.dirname(report), 'stet.lock'), 'utf8')).toBe(first);
    await edit(report, 'mu: 10', 'mu: 11');
    await lockNow(report, '2026-04-01T00:00:00Z');
    const lock = (await readLock(report))!;
    expect(lock.blocks['rigs']!.locked_at).toBe('2026-03-01T00:00:00.000Z');
    expect(lock.blocks['nominal']!.locked_at).toBe('2026-04-01T00:00:00.000Z');
    expect(Object.keys(JSON.parse(first) as object)).toEqual(['blocks', 'report', 'stet-lock']);
  });

  it('refuses a lock file that is not a lock, with a positioned error', async () => {
    const report = await smallWorkspace();
    await writeFile(path.join(path.dirname(report), 'stet.lock'), '{"blocks": 3}');
    const result = await buildReport(report);
    expect(result.ok).toBe(false);
    expect(result.messages.map((m) => m.ruleId)).toEqual(['lock-invalid']);
  });
});
